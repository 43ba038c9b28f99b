import { EngineInputError } from '../engine/diagnostics';
import { gearPairGeometry } from '../engine/geometry/gearPair';
import type { GearPairGeometry } from '../engine/geometry/types';
import { analyseCase, caseMechanics } from '../engine/mesh/analyseCase';
import { ENGINE_VERSION } from '../engine/version';
import { micrometres, radiansToDegrees, toMillimetres } from '../engine/units';
import { asPairReview, type PairReview, type Review } from './schema';
import type { CaseResult, GearResult, Results } from './results';
import { gearPairInput, materialOf } from './toEngine';
import { caseToResult } from './caseResult';
import { oilModelsOf, oilSummaries } from './oils';
import { overallVerdicts } from './overall';
import { gradeFinder } from './gradeFinder';
import { dutyNeed } from './need';
import { changeFindings } from './changes';
import { cautionSummary } from './cautionSummary';
import { engineDutyOf, enginePolicyOf } from './engineInputs';
import { runPlanetary } from './planetary/runPlanetary';

/**
 * Recompute a review: file → run() → results. Pure and deterministic; the same review gives
 * bit-identical results. Throws EngineInputError (field and limit named) for a review that the
 * schema accepts but the physics cannot (impossible geometry, say).
 */
export function run(review: Review): Results {
  const pair = asPairReview(review);
  if (!pair) return runPlanetary(review, runPair);
  return runPair(pair, gearPairGeometry(gearPairInput(pair.gearPair)));
}

/**
 * The per-pair pipeline: every load case × oil through the engine's mesh analysis, the verdicts
 * and the grade finder, for the given geometry (which a planetary stage computes per mesh).
 */
export function runPair(review: PairReview, geometry: GearPairGeometry): Results {
  const pinion = materialOf(review.gearPair.pinion.material);
  const wheel = materialOf(review.gearPair.wheel.material);
  const policy = enginePolicyOf(review.policy);
  const oils = oilModelsOf(review.oils);
  const cases: CaseResult[] = [];
  const roughnessRa1 = micrometres(review.gearPair.pinion.roughnessRa_um);
  const roughnessRa2 = micrometres(review.gearPair.wheel.roughnessRa_um);
  review.loadCases.forEach((lc, li) => {
    const duty = engineDutyOf(review, li);
    const oilList = oils.length > 0 ? oils : [null];
    const base = { geometry, pinion, wheel, roughnessRa1, roughnessRa2, duty, policy, caseField: `loadCases[${li}]` };
    const mechanics = inReviewTerms(li, () => caseMechanics(base)); // once per load case: the oils share it
    for (const oil of oilList) {
      const a = inReviewTerms(li, () => analyseCase({ ...base, oil }, mechanics));
      cases.push(caseToResult(review, lc, oil, oils, a));
    }
  });
  const grades = gradeFinder(review, geometry, pinion, wheel, policy, oils);
  return {
    flankfilm: ENGINE_VERSION,
    title: review.title,
    need: dutyNeed(review, cases, grades),
    changes: changeFindings(review, cases),
    cautions: cautionSummary(cases),
    gear: gearResult(geometry),
    oils: oilSummaries(oils),
    cases,
    verdicts: overallVerdicts(review, cases),
    gradeFinder: grades,
    assumptions: assumptionsOf(review),
  };
}

/** A field path of the review file (what an error must name), as opposed to an engine symbol. */
const REVIEW_FIELD = /^(gearPair|loadCases\[\d+\]|oils\[\d+\]|policy)(\.|$)/;

/**
 * An engine error about a derived quantity (a tooth load, a contact width: engine symbols)
 * becomes one that names the review fields it comes from and their limits; errors that already
 * name a review field pass unchanged.
 */
function inReviewTerms<T>(li: number, f: () => T): T {
  try {
    return f();
  } catch (e) {
    if (!(e instanceof EngineInputError) || REVIEW_FIELD.test(e.field)) throw e;
    const c = `loadCases[${li}]`;
    throw new EngineInputError(
      e.code,
      c,
      `${LOAD_CASE_LIMITS}`,
      `the speed, torque or power of this load case, with the face width and the materials, gives a contact the methods cannot use; ${LOAD_CASE_LIMITS} (${c}.pinionSpeed_rpm, ${c}.pinionTorque_Nm or ${c}.power_kW, gearPair.faceWidth_mm, gearPair.pinion.material and gearPair.wheel.material)`,
    );
  }
}

const LOAD_CASE_LIMITS = 'keep the speed from 0.1 to 100000 rpm, the torque from 0.001 to 1e8 N·m (or the power from 0.001 to 1e6 kW) and the face width from 0.5 to 5000 mm';

export function gearResult(g: GearPairGeometry): GearResult {
  const mm = toMillimetres;
  return {
    workingPressureAngle_deg: radiansToDegrees(g.workingPressureAngle),
    transversePressureAngle_deg: radiansToDegrees(g.transversePressureAngle),
    baseHelixAngle_deg: radiansToDegrees(g.baseHelixAngle),
    transverseContactRatio: g.transverseContactRatio,
    overlapRatio: g.overlapRatio,
    totalContactRatio: g.totalContactRatio,
    centerDistance_mm: mm(g.centerDistance),
    profileShift: { pinion: g.x1, wheel: g.x2 },
    referenceDiameter_mm: { pinion: mm(g.referenceDiameter1), wheel: mm(g.referenceDiameter2) },
    baseDiameter_mm: { pinion: mm(g.baseDiameter1), wheel: mm(g.baseDiameter2) },
    tipDiameter_mm: { pinion: mm(g.tipDiameter1), wheel: mm(g.tipDiameter2) },
    workingDiameter_mm: { pinion: mm(g.workingDiameter1), wheel: mm(g.workingDiameter2) },
    gearRatio: g.u,
    lineOfAction_mm: mm(g.lineOfAction),
    points_mm: { A: mm(g.points.A), B: mm(g.points.B), C: mm(g.points.C), D: mm(g.points.D), E: mm(g.points.E) },
    checks: g.checks.map((c) => ({ code: c.code, severity: c.severity, message: c.message })),
  };
}

function assumptionsOf(review: PairReview): string[] {
  const gp = review.gearPair;
  const out = [
    `ISO 6336-2 factors not computed by Flankfilm are inputs: Kv = ${gp.dynamicFactorKv}, KHβ = ${gp.faceLoadFactorKHbeta}, KHα = ${gp.transverseLoadFactorKHalpha}${gp.dynamicFactorKv === 1 && gp.faceLoadFactorKHbeta === 1 && gp.transverseLoadFactorKHalpha === 1 ? ' (all taken as 1)' : ''}.`,
    'Load sharing XΓ for unmodified flanks (no tip relief), ISO/TS 6336-20.',
    'Pitch-line velocity on the working pitch circle dw1.',
    'Hertz stress along the path: line contact in the normal plane, ρn = ρ/cos βb, with load sharing; the pitch-point figure “pC, whole load” carries the whole load on one pair, as load-stage tables quote it.',
  ];
  return out;
}
