import { WarningSink, type EngineWarning } from '../diagnostics';
import { gearPairGeometry } from '../geometry/gearPair';
import type { GearPairGeometry } from '../geometry/types';
import { MATERIALS } from '../materials';
import { MICROPITTING_STAGES, micropittingStageNumber, type MicropittingFailureStage } from '../micropitting/failureStage';
import { lambdaGFAtRisk } from '../micropitting/lambdaGFAtRisk';
import { pairMaterialFactorWW } from '../micropitting/materialFactor';
import { micropittingSafety } from '../micropitting/micropittingSafety';
import { permissibleSpecificFilm } from '../micropitting/permissibleFilm';
import { C_GF_GEAR, C_GF_LUBRICATION, C_GF_OIL_TEMPERATURE, C_GF_PINION_SPEED, C_GF_ROUGHNESS_RA, cGfPinionTorque } from '../micropitting/testGear';
import type { Kelvin } from '../units';
import { filmAlongPath, type FilmAlongPath } from './film';
import { meshMechanics, type MeshMechanics } from './mechanics';
import { oilState } from './oilState';
import { temperaturesAlongPath } from './temperatures';
import type { CaseInput, EnginePolicy } from './types';

/** A micropitting stage the duty needs: 5 … 10, or beyond the test's scale. */
export type MicropittingStageNeed = number | '>10';

export interface MicropittingAssessment {
  /** The duty's least λGF in the area at risk (A…B, D…E). */
  readonly lambdaGFMin: number;
  readonly lambdaGFMinIndex: number;
  /** False when the path has no two-pair zone and the whole path was used. */
  readonly inRegion: boolean;
  /** WW used: the larger of pinion and wheel. */
  readonly materialFactor: number;
  /** λGFT of the C-GF test gear with this oil at stages 5 … 10 (index 0 = stage 5). */
  readonly lambdaGFTByStage: readonly number[];
  /** The oil's failure stage, null when unknown. */
  readonly failureStage: MicropittingFailureStage | null;
  /** λGFT, λGFP and Sλ at the oil's failure stage (null when the stage is unknown). */
  readonly lambdaGFT: number | null;
  readonly lambdaGFP: number | null;
  readonly safety: number | null;
  /** True for an oil rated '>10': Sλ is computed at stage 10 and is a lower bound. */
  readonly safetyAtLeast: boolean;
  /** The smallest failure stage with Sλ ≥ Sλ,min, or '>10'. */
  readonly requiredStage: MicropittingStageNeed;
}

/** The C-GF geometry, once. */
let cGfGeometry: GearPairGeometry | null = null;
const testGeometry = (): GearPairGeometry => (cGfGeometry ??= gearPairGeometry(C_GF_GEAR));
/** Test mechanics per (stage, path points): independent of the oil, so computed once. */
const testMechanics = new Map<string, MeshMechanics>();

/**
 * λGF,min of the C-GF test gear with the case's oil at a micropitting load stage: the test run through
 * the same chain as the duty (mechanics, friction and Blok flash temperature, bulk temperature θM, oil
 * at θM, ISO/TR 15144-1 local film, the least λGF in A…B and D…E), so the method reproduces its test.
 * The policy travels with it: a μ the policy gives applies to the test gear too (the same chain).
 */
export function testGearLambdaGF(input: CaseInput, stage: MicropittingFailureStage, sink: WarningSink): number {
  // The test depends on the oil and the policy only, not on the case: kept per oil model (which a
  // recompute reuses while the oil's data stay the same) and per policy.
  const oil = input.oil as NonNullable<CaseInput['oil']>;
  const key = policyKey(input.policy);
  let perOil = testResults.get(oil.model);
  if (!perOil) testResults.set(oil.model, (perOil = new Map()));
  let perPolicy = perOil.get(key);
  if (!perPolicy) perOil.set(key, (perPolicy = new Map()));
  const known = perPolicy.get(stage);
  if (known) {
    for (const w of known.warnings) sink.add(w);
    return known.value;
  }
  const own = new WarningSink();
  const value = computeTestGearLambdaGF(input, stage, own);
  for (const w of own.items) sink.add(w);
  perPolicy.set(stage, { value, warnings: own.items });
  return value;
}

/** Per oil model, per policy (policyKey), per stage: λGF,min of the test and the warnings met computing it. */
const testResults = new WeakMap<object, Map<string, Map<MicropittingFailureStage, { value: number; warnings: readonly EngineWarning[] }>>>();

const policyKeys = new WeakMap<EnginePolicy, string>();
/** Every policy input, as one string: the test gear runs through the same chain, so any of them may matter. */
function policyKey(p: EnginePolicy): string {
  let k = policyKeys.get(p);
  if (k === undefined) policyKeys.set(p, (k = JSON.stringify(p)));
  return k;
}

function computeTestGearLambdaGF(input: CaseInput, stage: MicropittingFailureStage, sink: WarningSink): number {
  const steel = MATERIALS['steel-carburized'];
  const geometry = testGeometry();
  const torque = cGfPinionTorque(stage);
  const duty = {
    name: `C-GF test, stage ${String(stage)}`,
    pinionSpeed: C_GF_PINION_SPEED,
    pinionTorque: torque,
    applicationFactor: 1,
    dynamicFactor: 1,
    faceLoadFactor: 1,
    transverseLoadFactor: 1,
    oilTemperature: C_GF_OIL_TEMPERATURE,
    lubrication: C_GF_LUBRICATION,
    pinionMeshes: 1,
    timeShare: 1,
  };
  const test: CaseInput = { ...input, geometry, pinion: steel, wheel: steel, roughnessRa1: C_GF_ROUGHNESS_RA, roughnessRa2: C_GF_ROUGHNESS_RA, duty, caseField: 'micropitting test (C-GF)' };
  const key = `${torque}|${input.policy.pathPoints}`;
  let m = testMechanics.get(key);
  if (!m) {
    m = meshMechanics(geometry, steel, steel, duty, input.policy.pathPoints);
    testMechanics.set(key, m);
  }
  const heat = temperaturesAlongPath(test, m, sink);
  const oil = input.oil as NonNullable<CaseInput['oil']>;
  const tFilm = Math.min(heat.bulkTemperature, oil.model.temperatureRange.max) as Kelvin;
  const film = filmAlongPath(test, m, oilState(test, tFilm, `${oil.field}.micropitting test temperature`), sink);
  return lambdaGFAtRisk(m.position, film.lambdaGF, geometry.points).value;
}

/**
 * Micropitting by ISO/TS 6336-22 for one case with one oil: the duty's λGF,min in the area at risk,
 * λGFT of the C-GF test at each stage 5 … 10, λGFP = 1.4 WW λGFT and Sλ = λGF,min/λGFP at the oil's
 * failure stage, and the smallest stage with Sλ ≥ Sλ,min. Warnings of the test-gear run are passed on
 * under one code, as they concern the oil at the test condition, not the duty.
 */
export function micropittingAssessment(input: CaseInput, m: MeshMechanics, film: FilmAlongPath, sink: WarningSink): MicropittingAssessment {
  const oil = input.oil as NonNullable<CaseInput['oil']>;
  const stageField = `${oil.field}.micropittingFailureStage`;
  const failureStage = oil.micropittingFailureStage ?? null;
  if (failureStage !== null) micropittingStageNumber(failureStage, stageField);
  const wW = pairMaterialFactorWW(input.pinion.micropittingFactorWW, input.wheel.micropittingFactorWW);
  const atRisk = lambdaGFAtRisk(m.position, film.lambdaGF, input.geometry.points);
  const testSink = new WarningSink();
  const lambdaGFTByStage = MICROPITTING_STAGES.map((s) => testGearLambdaGF(input, s, testSink));
  forwardTestWarnings(testSink.items, stageField, sink);
  const safetyAt = (stageIndex: number, warn?: WarningSink) =>
    micropittingSafety(atRisk.value, permissibleSpecificFilm(lambdaGFTByStage[stageIndex] as number, wW), `${input.caseField}`, warn);
  let requiredStage: MicropittingStageNeed = '>10';
  for (let k = 0; k < MICROPITTING_STAGES.length; k++) {
    if (safetyAt(k) >= input.policy.micropittingSafetyMin) {
      requiredStage = MICROPITTING_STAGES[k] as number;
      break;
    }
  }
  if (failureStage === null) {
    return { lambdaGFMin: atRisk.value, lambdaGFMinIndex: atRisk.index, inRegion: atRisk.inRegion, materialFactor: wW, lambdaGFTByStage, failureStage, lambdaGFT: null, lambdaGFP: null, safety: null, safetyAtLeast: false, requiredStage };
  }
  const k = Math.min(micropittingStageNumber(failureStage), 10) - MICROPITTING_STAGES[0];
  const lambdaGFT = lambdaGFTByStage[k] as number;
  const lambdaGFP = permissibleSpecificFilm(lambdaGFT, wW);
  return {
    lambdaGFMin: atRisk.value,
    lambdaGFMinIndex: atRisk.index,
    inRegion: atRisk.inRegion,
    materialFactor: wW,
    lambdaGFTByStage,
    failureStage,
    lambdaGFT,
    lambdaGFP,
    safety: safetyAt(k, sink),
    safetyAtLeast: failureStage === '>10',
    requiredStage,
  };
}

function forwardTestWarnings(items: readonly EngineWarning[], field: string, sink: WarningSink): void {
  if (items.length === 0) return;
  sink.add({
    code: 'micropitting.test-gear-extrapolation',
    severity: 'warning',
    field,
    message: `Computing this oil's λGFT on the C-GF test gear (90 °C, 8.3 m/s) met ${items.length === 1 ? 'a limit' : `${items.length} limits`}: ${items.map((w) => w.message).join(' ')}`,
  });
}
