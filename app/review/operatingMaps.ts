import { gearPairGeometry } from '../engine/geometry/gearPair';
import { textCell } from './csvCell';
import { mapAxes, operatingMap, VERDICT_CODES } from '../engine/sweep/operatingMap';
import { micrometres } from '../engine/units';
import { engineDutyOf, enginePolicyOf } from './engineInputs';
import { oilModelsOf } from './oils';
import type { VerdictCode } from './results';
import { asPairReview, type PairReview, type Review } from './schema';
import { gearPairInput, materialOf } from './toEngine';
import type { GearPairGeometry } from '../engine/geometry/types';
import { planetaryMeshReviews, type PlanetaryReview } from './planetary/meshReviews';
import { run } from './run';

export interface MapOptions {
  /** Cells along oil temperature (rows), default 60. */
  readonly temperatures?: number;
  /** Cells along load (columns), default 60. */
  readonly loads?: number;
  /** Load as a fraction of the case torque, default 10 %…150 %. */
  readonly loadRange?: readonly [number, number];
  /** Called after each map with (done, total); return false to cancel. */
  readonly progress?: (done: number, total: number) => boolean | void;
}

/** One map, JSON-ready: rows are oil temperatures, columns load fractions; null = unbounded safety. */
export interface OperatingMapResult {
  loadCase: string;
  oil: string;
  /** A planetary stage only: the mesh swept, the one that governs. */
  mesh?: 'sun-planet' | 'planet-ring';
  temperatures_C: number[];
  loadPercent: number[];
  lambdaMin: number[][];
  scuffingSafety: (number | null)[][];
  integralSafety: (number | null)[][];
  verdict: VerdictCode[][];
  /** λGF,min in the area at risk (ISO/TS 6336-22). */
  lambdaGFMin: number[][];
  /** Sλ; null when the oil's micropitting failure stage is not given. */
  micropittingSafety: number[][] | null;
  /** The oil's λGFP (null: stage not given), for a λGF,min = λGFP line. */
  lambdaGFP: number | null;
}

const DEFAULT_CELLS = 60;

/**
 * The oil temperature × load sweep (policy.temperatureRange_C × 10–150 % of each case's torque)
 * for every load case × oil. Returns null if cancelled through `progress`.
 */
export function operatingMaps(whole: Review, options: MapOptions = {}): OperatingMapResult[] | null {
  const { review, geometry, mesh } = sweptPair(whole);
  const pinion = materialOf(review.gearPair.pinion.material);
  const wheel = materialOf(review.gearPair.wheel.material);
  const policy = enginePolicyOf(review.policy);
  const oils = oilModelsOf(review.oils);
  const nT = options.temperatures ?? DEFAULT_CELLS;
  const nL = options.loads ?? DEFAULT_CELLS;
  const axes = mapAxes(review.policy.temperatureRange_C, nT, nL, options.loadRange ?? [0.1, 1.5]);
  const out: OperatingMapResult[] = [];
  const total = review.loadCases.length * oils.length;
  const roughnessRa1 = micrometres(review.gearPair.pinion.roughnessRa_um);
  const roughnessRa2 = micrometres(review.gearPair.wheel.roughnessRa_um);
  for (let li = 0; li < review.loadCases.length; li++) {
    for (const oil of oils) {
      const map = operatingMap({ geometry, pinion, wheel, roughnessRa1, roughnessRa2, duty: engineDutyOf(review, li), oil, policy, caseField: `loadCases[${li}]` }, axes);
      const grid = <T>(f: (k: number) => T): T[][] => Array.from({ length: nT }, (_, r) => Array.from({ length: nL }, (_, c) => f(r * nL + c)));
      const finiteOrNull = (x: number) => (Number.isFinite(x) ? x : null);
      out.push({
        loadCase: review.loadCases[li]?.name ?? '',
        oil: oil.name,
        ...(mesh ? { mesh } : {}),
        temperatures_C: Array.from(axes.temperatures_C),
        loadPercent: Array.from(axes.loadFractions, (f) => 100 * f),
        lambdaMin: grid((k) => map.lambdaMin[k] as number),
        scuffingSafety: grid((k) => finiteOrNull(map.scuffingSafety[k] as number)),
        integralSafety: grid((k) => finiteOrNull(map.integralSafety[k] as number)),
        verdict: grid((k) => VERDICT_CODES[map.verdict[k] as number] as VerdictCode),
        lambdaGFMin: grid((k) => map.lambdaGFMin[k] as number),
        micropittingSafety: map.micropittingSafety ? grid((k) => (map.micropittingSafety as Float64Array)[k] as number) : null,
        lambdaGFP: map.lambdaGFP,
      });
      if (options.progress?.(out.length, total) === false) return null;
    }
  }
  return out;
}

/** The pair the map sweeps: the review's gear pair, or the governing mesh of a planetary stage. */
function sweptPair(whole: Review): { review: PairReview; geometry: GearPairGeometry; mesh?: OperatingMapResult['mesh'] } {
  const pair = asPairReview(whole);
  if (pair) return { review: pair, geometry: gearPairGeometry(gearPairInput(pair.gearPair)) };
  const shown = run(whole).planetary?.shownMesh ?? 'sun-planet';
  const mesh = planetaryMeshReviews(whole as PlanetaryReview).meshes.find((m) => m.mesh === shown);
  if (!mesh) throw new TypeError('operatingMaps: no mesh to sweep');
  return { review: mesh.review, geometry: mesh.geometry, mesh: mesh.mesh };
}

/** The maps as one CSV (a row per cell), with a header of names and units. */
export function operatingMapsCsv(maps: readonly OperatingMapResult[]): string {
  const q = (s: string) => `"${s.replace(/"/g, '""')}"`;
  const num = (x: number | null) => (x === null ? '' : String(x));
  const lines = ['load case,oil,oil temperature (°C),load (% of case torque),lambda_min (-),S_B (-),S_intS (-),verdict,lambda_GF_min (-),S_lambda micropitting (-)'];
  for (const m of maps) {
    m.temperatures_C.forEach((t, r) => {
      m.loadPercent.forEach((l, c) => {
        lines.push([q(textCell(m.loadCase)), q(textCell(m.oil)), num(t), num(l), num(m.lambdaMin[r]?.[c] ?? null), num(m.scuffingSafety[r]?.[c] ?? null), num(m.integralSafety[r]?.[c] ?? null), m.verdict[r]?.[c] ?? '', num(m.lambdaGFMin[r]?.[c] ?? null), num(m.micropittingSafety?.[r]?.[c] ?? null)].join(','));
      });
    });
  }
  return `${lines.join('\n')}\n`;
}
