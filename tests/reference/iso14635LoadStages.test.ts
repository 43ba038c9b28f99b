import { describe, expect, it } from 'vitest';
import { gearPairGeometry } from '../../app/engine/geometry/gearPair';
import { MATERIALS } from '../../app/engine/materials';
import { meshMechanics } from '../../app/engine/mesh/mechanics';
import { rpmToRadiansPerSecond, type NewtonMetres } from '../../app/engine/units';
import { FZG_PINION_SPEED_RPM, FZG_STAGE_PITCH_HERTZ_MPA, FZG_STAGE_TORQUE_NM, FZG_TYPE_A } from './fzgTestGears';

const steel = MATERIALS['steel-carburized'];
const geometry = gearPairGeometry(FZG_TYPE_A);
const duty = (torque: number) => ({
  pinionSpeed: rpmToRadiansPerSecond(FZG_PINION_SPEED_RPM),
  pinionTorque: torque as NewtonMetres,
  applicationFactor: 1,
  dynamicFactor: 1,
  faceLoadFactor: 1,
  transverseLoadFactor: 1,
});

describe('FZG type A pitch-point Hertz stress per load stage (ISO 14635-1 load-stage table [memory])', () => {
  FZG_STAGE_TORQUE_NM.forEach((torque, i) => {
    const published = FZG_STAGE_PITCH_HERTZ_MPA[i] as number;
    it(`stage ${i + 1}: T1 = ${torque} N·m → pC = ${published} N/mm² within 1 %`, () => {
      const m = meshMechanics(geometry, steel, steel, duty(torque), 201);
      const pC = m.pitchHertzWholeLoad / 1e6;
      expect(Math.abs(pC / published - 1), `computed ${pC.toFixed(1)} N/mm²`).toBeLessThan(0.01);
    });
  });

  it('the local (shared) stress at C is lower: C lies in two-pair contact on type A, so XΓ(C) < 1', () => {
    const m = meshMechanics(geometry, steel, steel, duty(302), 201);
    const share = m.loadShare[m.pitchIndex] as number;
    expect(share).toBeLessThan(1);
    expect(share).toBeGreaterThan(1 / 3);
    expect((m.hertzPressure[m.pitchIndex] as number) / m.pitchHertzWholeLoad).toBeCloseTo(Math.sqrt(share), 12);
  });
});

describe('FZG test speed (ISO 14635-1: A/8.3/90)', () => {
  it('pitch-line velocity on dw1 = 73.2 mm at 2170 rpm is 8.3 m/s', () => {
    const m = meshMechanics(geometry, steel, steel, duty(302), 201);
    expect(m.pitchLineVelocity).toBeCloseTo(8.3, 1);
  });
});

describe('velocities on dw1 and on d1 (ISO 21771)', () => {
  it('the FZG type A pinion at 2170 rpm: 8.32 m/s on dw1 = 73.2 mm, 8.18 m/s on d1 = 72 mm (v = ω d/2, arithmetic)', async () => {
    const { parseReviewValue } = await import('../../app/review/parse');
    const { run } = await import('../../app/review/run');
    const p = parseReviewValue({
      format: 'flankfilm.review', version: 1, title: 'FZG type A (ISO 14635-1)',
      gearPair: { normalModule_mm: 4.5, faceWidth_mm: 20, centerDistance_mm: 91.5, pinion: { teeth: 16, profileShift: 0.8532, tipDiameter_mm: 88.77, roughnessRa_um: 0.3, material: 'steel-carburized' }, wheel: { teeth: 24, profileShift: -0.5, tipDiameter_mm: 112.5, roughnessRa_um: 0.3, material: 'steel-carburized' } },
      loadCases: [{ name: 'stage 9', pinionSpeed_rpm: 2170, pinionTorque_Nm: 302, oilTemperature_C: 90, lubrication: 'dip' }],
      oils: [],
    });
    if (!p.ok) throw new Error(JSON.stringify(p.issues));
    const c = run(p.review).cases[0];
    expect(c?.pitchLineVelocity_mps).toBeCloseTo((2 * Math.PI * 2170 / 60) * 0.0732 / 2, 9);
    expect(c?.referenceLineVelocity_mps).toBeCloseTo((2 * Math.PI * 2170 / 60) * 0.072 / 2, 9);
    expect(c?.pitchHertzStress_MPa).toBeGreaterThan(1386 * 0.99); // stage 9 of the load-stage table [memory]
    expect(c?.pitchHertzStress_MPa).toBeLessThan(1386 * 1.01);
  });
});
