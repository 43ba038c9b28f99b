import { describe, expect, it } from 'vitest';
import { gearPairGeometry } from '../../app/engine/geometry/gearPair';
import { MATERIALS } from '../../app/engine/materials';
import { analyseCase } from '../../app/engine/mesh/analyseCase';
import type { EnginePolicy } from '../../app/engine/mesh/types';
import { makeOilModel } from '../../app/engine/oil/oilModel';
import { celsiusToKelvin, centistokes, kelvinToCelsius, micrometres, rpmToRadiansPerSecond, type KilogramsPerCubicMetre, type NewtonMetres } from '../../app/engine/units';
import { policySchema } from '../../app/review/schema';
import { enginePolicyOf } from '../../app/review/engineInputs';
import { FZG_PINION_SPEED_RPM, FZG_STAGE_TORQUE_NM, FZG_TYPE_A, FZG_TYPE_C } from './fzgTestGears';

/**
 * The calibration the scuffing methods rest on: run on the FZG type A test gear at its test
 * condition (A/8.3/90: 2170 rpm, 90 °C oil, dip), a reference mineral oil (XW = XL = 1) reaches
 * the scuffing temperature of its failure stage at that stage — by definition of θS(S) in
 * ISO/TS 6336-20 and of θintS in ISO/TS 6336-21. The oil is an ISO VG 100 mineral oil, the
 * viscosity class the FZG A/8.3/90 reference oils belong to [memory]; Ra 0.3 µm is typical of
 * the ground test gears [memory].
 */
const geometry = gearPairGeometry(FZG_TYPE_A);
const steel = MATERIALS['steel-carburized'];
const policy: EnginePolicy = enginePolicyOf(policySchema.parse({}));
const model = makeOilModel({ kv40: centistokes(100), kv100: centistokes(11.1), density15: 880 as KilogramsPerCubicMetre, baseOil: 'mineral' }, 'oil');

function atStage(stage: number, gear = geometry) {
  return analyseCase({
    geometry: gear,
    pinion: steel,
    wheel: steel,
    roughnessRa1: micrometres(0.3),
    roughnessRa2: micrometres(0.3),
    duty: {
      name: `stage ${stage}`,
      pinionSpeed: rpmToRadiansPerSecond(FZG_PINION_SPEED_RPM),
      pinionTorque: FZG_STAGE_TORQUE_NM[stage - 1] as NewtonMetres,
      applicationFactor: 1,
      dynamicFactor: 1,
      faceLoadFactor: 1,
      transverseLoadFactor: 1,
      oilTemperature: celsiusToKelvin(90),
      lubrication: 'dip',
      pinionMeshes: 1,
      timeShare: 1,
    },
    oil: { name: 'reference', field: 'oil', model, baseOil: 'mineral', chemistry: 'r-and-o', fzgFailureStage: stage },
    policy,
    caseField: 'loadCases[0]',
  });
}

describe('FZG A/8.3/90 calibration of the flash temperature method (ISO/TS 6336-20)', () => {
  for (let stage = 5; stage <= 12; stage++) {
    const thetaS = 80 + 2.25 * stage * stage; // θS = 80 + (0.85 + 1.4·1)·1·S² °C (ISO/TS 6336-20 [memory])
    it(`stage ${stage}: θB,max within ±15 % of θS = ${thetaS} °C`, () => {
      const a = atStage(stage);
      const thetaB = kelvinToCelsius(a.heat?.contactMax ?? (0 as never));
      expect(Math.abs(thetaB / thetaS - 1), `θB,max = ${thetaB.toFixed(1)} °C`).toBeLessThan(0.15);
    });
  }
});

describe('FZG A/8.3/90: the integral temperature method reproduces its own test (ISO/TS 6336-21), with no calibration factor', () => {
  for (let stage = 5; stage <= 12; stage++) {
    const t1T = FZG_STAGE_TORQUE_NM[stage - 1] as number;
    // θintS = θMT + XWrelT·C2·θfla,int,T = (80 + 0.23 T1T) + 1 · 1.5 · 0.2 T1T (ISO/TS 6336-21 [memory]; mineral oil, XL = 1)
    const thetaIntS = 80 + 0.23 * t1T + 1.5 * 0.2 * t1T;
    it(`stage ${stage}: θint within ±15 % of θintS = ${thetaIntS.toFixed(1)} °C of a stage-${stage} oil`, () => {
      const a = atStage(stage);
      const thetaInt = kelvinToCelsius(a.scuffing?.integralTemperature ?? (0 as never));
      expect(Math.abs(thetaInt / thetaIntS - 1), `θint = ${thetaInt.toFixed(1)} °C`).toBeLessThan(0.15);
      expect(kelvinToCelsius(a.scuffing?.integralScuffingTemperature ?? (0 as never))).toBeCloseTo(thetaIntS, 6);
    });
  }
  it('stage 12: the Blok flash at E with the whole load, times Xε, is the test\'s own θfla,int,T = 0.2 · 534.5 = 106.9 K within ±10 % (ISO/TS 6336-21 [memory])', () => {
    const sc = atStage(12).scuffing;
    const flashInt = (sc?.flashAtTipFullLoad ?? 0) * (sc?.contactRatioFactor ?? 0);
    expect(Math.abs(flashInt / (0.2 * 534.5) - 1), `θfla,int = ${flashInt.toFixed(1)} K`).toBeLessThan(0.1);
  });
});

describe('FZG type C at 90 °C runs in the boundary regime (common practice: the test is designed for thin films)', () => {
  it('λmin < 1 at load stage 10 (the C/8.3/90 pitting test load) with a VG 100 mineral oil', () => {
    const a = atStage(10, gearPairGeometry(FZG_TYPE_C));
    expect(a.film?.lambdaMin ?? 9).toBeLessThan(1);
    expect(a.film?.caseRegime).toBe('boundary');
  });
});
