import { lineContactEhl, type LineContactEhlOptions, type LineContactEhlResult } from '../engine/ehl/lineContactEhl';
import { numericalFilmInWords } from '../engine/ehl/filmInWords';
import { ANTI_WEAR_TRIBOFILM } from '../engine/film/tribofilmNote';
import { micrometres, toMegapascals, toMicrometres, type Metres } from '../engine/units';
import { WarningSink } from '../engine/diagnostics';
import { ehlPointSetup, type EhlPointRequest, type EhlPointSetup } from './ehlPoint';
import type { Results } from './results';
import type { Review } from './schema';

/** The numerical film at one point, in display units (what `flankfilm ehl --json` prints). */
export interface EhlPointResult {
  converged: boolean;
  iterations: number;
  residual: number;
  stopReason: string;
  nodes: number;
  /** Whether the grid resolves the exit constriction; if not, `suggestedNodes` would. */
  gridResolved: boolean;
  suggestedNodes: number | null;
  ms: number;
  viscosityLaw: string;
  loadCase: string;
  oil: string;
  point: string;
  position_mm: number;
  filmTemperature_C: number;
  hMin_um: number;
  hCentral_um: number;
  pMax_MPa: number;
  hertzP0_MPa: number;
  hertzSemiWidth_um: number;
  spike: { x_over_b: number; p_MPa: number } | null;
  formulaName: string;
  formulaHMin_um: number;
  formulaHCentral_um: number;
  thermalFactor: number;
  panHamrockIsothermal: { hMin_um: number; hCentral_um: number };
  compositeRoughness_um: number;
  tribofilm_um: { min: number; max: number };
  inWords: string;
  profile: Array<{ x_over_b: number; p_MPa: number; h_um: number }>;
  warnings: Array<{ code: string; message: string }>;
}

/**
 * Set up (ehlPoint.ts) and solve (engine/ehl) the numerical film at one point. `now` is the clock
 * for the `ms` figure (performance.now where it exists); pure otherwise.
 */
export function ehlAtPoint(review: Review, req: EhlPointRequest, options: LineContactEhlOptions = {}, now: () => number = () => 0): EhlPointResult {
  const setup = ehlPointSetup(review, req);
  const t0 = now();
  const sink = new WarningSink();
  const r = lineContactEhl(setup.input, options, sink);
  const ms = now() - t0;
  return toResult({ ...setup, warnings: [...setup.warnings, ...sink.items] }, r, ms);
}

function toResult(s: EhlPointSetup, r: LineContactEhlResult, ms: number): EhlPointResult {
  const profile: EhlPointResult['profile'] = [];
  for (let i = 0; i < r.nodes; i++) profile.push({ x_over_b: r.xOverB[i] as number, p_MPa: (r.pressure[i] as number) / 1e6, h_um: (r.film[i] as number) * 1e6 });
  return {
    converged: r.converged,
    iterations: r.iterations,
    residual: r.residual,
    stopReason: r.stopReason,
    nodes: r.nodes,
    gridResolved: r.gridResolved,
    suggestedNodes: r.suggestedNodes,
    ms,
    viscosityLaw: r.viscosityLaw,
    loadCase: s.caseName,
    oil: s.oilName,
    point: s.pointLabel,
    position_mm: s.position_mm,
    filmTemperature_C: s.filmTemperature_C,
    hMin_um: toMicrometres(r.hMin),
    hCentral_um: toMicrometres(r.hCentral),
    pMax_MPa: toMegapascals(r.pMax),
    hertzP0_MPa: toMegapascals(r.hertzPressure),
    hertzSemiWidth_um: toMicrometres(r.hertzSemiWidth),
    spike: r.spike ? { x_over_b: r.spike.xOverB, p_MPa: toMegapascals(r.spike.p) } : null,
    formulaName: s.formulaName,
    formulaHMin_um: s.formulaHMin_um,
    formulaHCentral_um: s.formulaHCentral_um,
    thermalFactor: s.thermalFactor,
    panHamrockIsothermal: { hMin_um: toMicrometres(r.formula.hMin), hCentral_um: toMicrometres(r.formula.hCentral) },
    compositeRoughness_um: s.compositeRoughness_um,
    tribofilm_um: { min: toMicrometres(ANTI_WEAR_TRIBOFILM.min), max: toMicrometres(ANTI_WEAR_TRIBOFILM.max) },
    inWords: numericalFilmInWords(r.hMin, micrometres(s.compositeRoughness_um) as Metres, r.converged),
    profile,
    warnings: s.warnings.map((w) => ({ code: w.code, message: w.message })),
  };
}

/**
 * The Film detail the record carries when asked: at the point of least λ of the case × oil with
 * the lowest λmin of the results. Null when the review has no oil.
 */
export function recordFilmDetail(review: Review, results: Results, now: () => number = () => 0): EhlPointResult | null {
  let worst: Results['cases'][number] | null = null;
  for (const c of results.cases) if (c.oil !== null && c.lambdaMin !== null && (worst === null || c.lambdaMin < (worst.lambdaMin as number))) worst = c;
  if (!worst || worst.oil === null) return null;
  return ehlAtPoint(review, { caseName: worst.loadCase, oilName: worst.oil, at: 'lambda-min' }, {}, now);
}
