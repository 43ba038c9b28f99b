import type { GearPairGeometry } from '../engine/geometry/types';
import type { Material } from '../engine/materials';
import { cellLambdaMin, prepareSweep, type SweepCase } from '../engine/sweep/operatingMap';
import type { OilModel } from '../engine/oil/oilModel';
import type { EnginePolicy } from '../engine/mesh/types';
import { ISO_VG_GRADES } from '../engine/oil/isoGrade';
import { cachedOilModel } from '../engine/oil/oilModelCache';
import { kv100ForViscosityIndex } from '../engine/oil/viscosityIndex';
import { centistokes, micrometres, type KilogramsPerCubicMetre, type SquareMetresPerSecond } from '../engine/units';
import { engineDutyOf } from './engineInputs';
import { usableOverCases } from './gradeLimits';
import type { ReviewOil } from './oils';
import type { GradeFinderResult, GradeFinderRow } from './results';
import type { PairReview } from './schema';

/**
 * Path points for the finder. A…E are always sampled exactly, so λ at A (where the film is thinnest:
 * least entrainment and radius) and the load steps at B and D are exact; the finder's λmin agrees
 * with the case analysis at the oil's own grade (tests/review/gradeFinder.test.ts).
 */
export const FINDER_PATH_POINTS = 41;

/** The grades worth offering for enclosed industrial gears (ISO 3448). */
export const CANDIDATE_GRADES = ISO_VG_GRADES.filter((g) => g >= 32 && g <= 1500);

/**
 * For each oil's base oil and VI: λmin per ISO VG over every load case, each at the hotter of its
 * own oil temperature and the top of policy.temperatureRange_C, and the lowest grade that meets
 * the λ target everywhere. A grade's KV100 follows from its KV40 (the grade mid-point) and the oil's VI
 * (ASTM D2270 inverted); α takes the base oil's default. Each grade is one cell of the operating
 * map's evaluator (engine/sweep), so the finder sees the same film, friction and heat as the cases.
 */
export function gradeFinder(review: PairReview, geometry: GearPairGeometry, pinion: Material, wheel: Material, policy: EnginePolicy, oils: readonly ReviewOil[]): GradeFinderResult[] {
  const tHigh = review.policy.temperatureRange_C[1];
  const roughnessRa1 = micrometres(review.gearPair.pinion.roughnessRa_um);
  const roughnessRa2 = micrometres(review.gearPair.wheel.roughnessRa_um);
  const finderPolicy = { ...policy, pathPoints: Math.min(policy.pathPoints, FINDER_PATH_POINTS) };
  const cases = review.loadCases.map((_, li) => prepareSweep({ geometry, pinion, wheel, roughnessRa1, roughnessRa2, duty: engineDutyOf(review, li), policy: finderPolicy, caseField: `loadCases[${li}]` }));
  // Only grades the lubrication method can use at every case's pitch-line velocity are offered.
  const usable = usableOverCases(
    review.loadCases.map((lc) => {
      const w1 = (2 * Math.PI * lc.pinionSpeed_rpm) / 60;
      return { name: lc.name, lubrication: lc.lubrication, pitchLineVelocity_mps: (w1 * geometry.workingDiameter1) / 2 };
    }),
  );
  // Oils that share base oil, VI and density share a table.
  const tables = new Map<string, GradeFinderRow[]>();
  return oils.map((oil) => {
    const vi = oil.model.viscosityIndex.value;
    const key = `${oil.baseOil}|${vi}|${oil.source.density15_kgm3}`;
    const table = (tables.get(key) ?? gradeTable(review, cases, oil, tHigh)).map((r) => ({ ...r, usable: r.isoVG <= usable.maxVG }));
    tables.set(key, table);
    const hit = table.find((r) => r.usable && r.lambdaMin >= policy.lambdaTarget);
    const heavier = table.some((r) => !r.usable);
    return {
      oil: oil.name,
      recommendedVG: hit?.isoVG ?? null,
      currentVG: oil.model.isoVG,
      table,
      usableMaxVG: usable.maxVG,
      leftOut: heavier ? `Grades above ISO VG ${usable.maxVG} are left out: ${usable.reason}.` : '',
      note: hit
        ? `ISO VG ${hit.isoVG} is the lowest grade (VI ${vi.toFixed(0)}, ${oil.baseOil}) with λmin ≥ ${policy.lambdaTarget} in every load case up to ${tHigh} °C.`
        : `No grade from VG ${CANDIDATE_GRADES[0]} to VG ${Math.min(usable.maxVG, CANDIDATE_GRADES[CANDIDATE_GRADES.length - 1] ?? usable.maxVG)} reaches λmin ≥ ${policy.lambdaTarget} in every load case up to ${tHigh} °C: smoother flanks, a cooler sump or a higher VI would.`,
    };
  });
}

/** λmin per candidate grade for one oil's base oil, VI and density, over every load case. */
function gradeTable(review: PairReview, cases: readonly SweepCase[], oil: ReviewOil, tHigh: number): GradeFinderRow[] {
  const vi = oil.model.viscosityIndex.value;
  const table: GradeFinderRow[] = [];
  const byGrade = gradeModelsOf(vi, oil);
  for (const vg of CANDIDATE_GRADES) {
    const model = gradeModel(byGrade, vg, vi, oil);
    if (model === null) continue; // this VI is not reachable at this grade within D2270's range
    let lambdaMin = Infinity;
    cases.forEach((sc, li) => {
      // The film thins as the oil warms, so the hotter of the case's own temperature and the top of the range governs.
      const t = Math.max(review.loadCases[li]?.oilTemperature_C ?? tHigh, tHigh);
      const l = cellLambdaMin(sc, model, t);
      if (l < lambdaMin) lambdaMin = l;
    });
    if (Number.isFinite(lambdaMin)) table.push({ isoVG: vg, lambdaMin, usable: true });
  }
  return table;
}

/** The grade models kept for the oil's field, base oil, density and VI. */
function gradeModelsOf(vi: number, oil: ReviewOil): Map<number, OilModel | null> {
  const key = `${oil.field}|${oil.baseOil}|${oil.source.density15_kgm3}|${vi}`;
  let byGrade = gradeModels.get(key);
  if (!byGrade) {
    if (gradeModels.size >= 256) gradeModels.clear();
    gradeModels.set(key, (byGrade = new Map()));
  }
  return byGrade;
}

/** The model of grade `vg` with the oil's VI, base oil and density (α the base oil's default), null when the VI is unreachable at that grade. */
function gradeModel(byGrade: Map<number, OilModel | null>, vg: number, vi: number, oil: ReviewOil): OilModel | null {
  let model = byGrade.get(vg);
  if (model === undefined) {
    let kv100: SquareMetresPerSecond | null;
    try {
      kv100 = kv100ForViscosityIndex(centistokes(vg), vi);
    } catch {
      kv100 = null; // ASTM D2270 reaches no KV100 for this VI at this grade
    }
    model = kv100 === null ? null : cachedOilModel({ kv40: centistokes(vg), kv100, density15: oil.source.density15_kgm3 as KilogramsPerCubicMetre, baseOil: oil.baseOil }, oil.field);
    byGrade.set(vg, model);
  }
  return model;
}

/** Grade models per oil field, base oil, density and VI, then per grade: a recompute asks for the same ones again. */
const gradeModels = new Map<string, Map<number, OilModel | null>>();
