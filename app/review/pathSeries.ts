/**
 * The path of contact of one case result in columns (PathSeries), from the engine's arrays, and
 * back to one PointResult per point where objects are wanted: the JSON of `review --json`, the CSV,
 * a table. Both directions use the same unit conversions, so a point read from the columns is the
 * number the engine gave, converted once.
 */
import { ColumnBlock } from '../engine/columnBlock';
import type { CaseAnalysis } from '../engine/mesh/analyseCase';
import { REGIMES } from '../engine/mesh/film';
import type { Regime } from '../engine/film/regime';
import { kelvinToCelsius, toMegapascals, toMicrometres, toMillimetres, type Kelvin, type Metres, type Pascals } from '../engine/units';
import type { CaseResult, PathSeries, PointResult, Results } from './results';

/** The columns of one analysis, in display units. Arrays already in display units are shared with the engine's, not copied. */
export function pathSeriesOf(a: CaseAnalysis): PathSeries {
  const m = a.mechanics;
  const { position_mm, pathFraction, hertzStress_MPa } = mechanicsColumns(a);
  // The film's two columns and the heat's one, from one buffer.
  const block = new ColumnBlock(m.n, (a.film ? 2 : 0) + (a.heat ? 1 : 0));
  return {
    n: m.n,
    position_mm,
    pathFraction,
    loadShare: m.loadShare,
    hertzStress_MPa,
    pinionFlankVelocity_mps: m.v1,
    wheelFlankVelocity_mps: m.v2,
    slidingVelocity_mps: m.slidingVelocity,
    sumVelocity_mps: m.sumVelocity,
    slideToRoll: m.slideToRoll,
    specificSlidingPinion: m.specificSliding1,
    specificSlidingWheel: m.specificSliding2,
    film: a.film ? filmColumns(a.film, m.n, block) : null,
    heat: a.heat ? heatColumns(a.heat, m.n, block) : null,
  };
}

type MechanicsColumns = Pick<PathSeries, 'position_mm' | 'pathFraction' | 'hertzStress_MPa'>;

/** Converted once per load case: its oils' analyses share the mechanics, and so their columns (read only). */
const convertedMechanics = new WeakMap<CaseAnalysis['mechanics'], MechanicsColumns>();

function mechanicsColumns(a: CaseAnalysis): MechanicsColumns {
  const m = a.mechanics;
  const known = convertedMechanics.get(m);
  if (known) return known;
  const n = m.n;
  const { A, E } = a.input.geometry.points;
  const block = new ColumnBlock(n, 3);
  const position_mm = block.float64();
  const pathFraction = block.float64();
  const hertzStress_MPa = block.float64();
  for (let i = 0; i < n; i++) {
    const s = m.position[i] as number;
    position_mm[i] = toMillimetres(s as Metres);
    pathFraction[i] = (s - A) / (E - A);
    hertzStress_MPa[i] = toMegapascals(m.hertzPressure[i] as Pascals);
  }
  const columns = { position_mm, pathFraction, hertzStress_MPa };
  convertedMechanics.set(m, columns);
  return columns;
}

function filmColumns(film: NonNullable<CaseAnalysis['film']>, n: number, block: ColumnBlock): NonNullable<PathSeries['film']> {
  const filmThicknessMin_um = block.float64();
  const filmThicknessCentral_um = block.float64();
  for (let i = 0; i < n; i++) {
    filmThicknessMin_um[i] = toMicrometres(film.hMin[i] as Metres);
    filmThicknessCentral_um[i] = toMicrometres(film.hCentral[i] as Metres);
  }
  return { filmThicknessMin_um, filmThicknessCentral_um, lambda: film.lambda, lambdaGF: film.lambdaGF, regime: film.regime };
}

function heatColumns(heat: NonNullable<CaseAnalysis['heat']>, n: number, block: ColumnBlock): NonNullable<PathSeries['heat']> {
  const contactTemperature_C = block.float64();
  for (let i = 0; i < n; i++) contactTemperature_C[i] = kelvinToCelsius(heat.contact[i] as Kelvin);
  return { flashTemperature_K: heat.flash, contactTemperature_C };
}

const at = (xs: Float64Array, i: number): number => xs[i] as number;

/** Point i of the path as one object. */
export function pointOf(p: PathSeries, i: number): PointResult {
  const f = p.film;
  const h = p.heat;
  return {
    position_mm: at(p.position_mm, i),
    pathFraction: at(p.pathFraction, i),
    loadShare: at(p.loadShare, i),
    hertzStress_MPa: at(p.hertzStress_MPa, i),
    pinionFlankVelocity_mps: at(p.pinionFlankVelocity_mps, i),
    wheelFlankVelocity_mps: at(p.wheelFlankVelocity_mps, i),
    slidingVelocity_mps: at(p.slidingVelocity_mps, i),
    sumVelocity_mps: at(p.sumVelocity_mps, i),
    slideToRoll: at(p.slideToRoll, i),
    specificSlidingPinion: at(p.specificSlidingPinion, i),
    specificSlidingWheel: at(p.specificSlidingWheel, i),
    filmThicknessMin_um: f ? at(f.filmThicknessMin_um, i) : null,
    filmThicknessCentral_um: f ? at(f.filmThicknessCentral_um, i) : null,
    lambda: f ? at(f.lambda, i) : null,
    lambdaGF: f ? at(f.lambdaGF, i) : null,
    regime: f ? ((REGIMES[f.regime[i] as number] as Regime | undefined) ?? null) : null,
    flashTemperature_K: h ? at(h.flashTemperature_K, i) : null,
    contactTemperature_C: h ? at(h.contactTemperature_C, i) : null,
  };
}

/** Every point of the path as objects, A to E. */
export function pathPoints(p: PathSeries): PointResult[] {
  const out: PointResult[] = [];
  for (let i = 0; i < p.n; i++) out.push(pointOf(p, i));
  return out;
}

/** A case result as JSON writes it: the path as one object per point. */
export type CaseResultJson = Omit<CaseResult, 'path'> & { path: PointResult[] };

function caseJson(c: CaseResult): CaseResultJson {
  return { ...c, path: pathPoints(c.path) };
}

/** The results as JSON writes them. */
export type ResultsJson = Omit<Results, 'cases' | 'meshes'> & {
  cases: CaseResultJson[];
  meshes?: Array<Omit<NonNullable<Results['meshes']>[number], 'cases'> & { cases: CaseResultJson[] }>;
};

/**
 * The results as JSON writes them (`review --json`, snapshots): every case's path, and every
 * mesh's of a planetary stage, as one object per point; everything else as it is.
 */
export function resultsJson(r: Results): ResultsJson {
  // Spread, then overwrite: the keys keep their order, so the JSON reads as it always has.
  const { meshes } = r;
  const out: ResultsJson = { ...r, cases: r.cases.map(caseJson), meshes: meshes?.map((m) => ({ ...m, cases: m.cases.map(caseJson) })) };
  if (!meshes) delete out.meshes;
  return out;
}
