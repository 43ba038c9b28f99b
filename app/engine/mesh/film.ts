import type { WarningSink } from '../diagnostics';
import { dowsonHigginsonMinFilm } from '../film/dowsonHigginson';
import { isoLocalFilm } from '../film/isoLocalFilm';
import { panHamrockFilm, type PanHamrockFilm } from '../film/panHamrock';
import { classifyRegime, type Regime } from '../film/regime';
import { RQ_PER_RA_GAUSSIAN, specificFilmThicknessGF } from '../film/specificFilm';
import { murchWilsonThermalFactor } from '../film/thermalCorrection';
import { tribofilmNote } from '../film/tribofilmNote';
import type { Metres, MetresPerSecond, NewtonsPerMetre, Pascals } from '../units';
import type { OilState } from './analyseCase';
import type { MeshMechanics } from './mechanics';
import type { CaseInput } from './types';

export const REGIMES: readonly Regime[] = ['boundary', 'mixed', 'full-film'];

export interface FilmAlongPath {
  /** The formula whose h_min feeds λ. */
  readonly formula: 'Dowson–Higginson (1966)' | 'Pan–Hamrock (1989)';
  /** h_min at each point (thermally corrected when the policy says so), m. */
  readonly hMin: Float64Array;
  /** Pan–Hamrock central film h_c at each point (same correction), m. */
  readonly hCentral: Float64Array;
  /** Murch–Wilson inlet shear-heating factor φT at each point (1 when switched off). */
  readonly thermalFactor: Float64Array;
  readonly lambda: Float64Array;
  /** λ_GF = h_Y/Ra_avg with the ISO/TR 15144-1 local film h_Y (S_GF = 1). */
  readonly lambdaGF: Float64Array;
  /** Index into REGIMES at each point. */
  readonly regime: Uint8Array;
  /** Composite roughness √(Rq1² + Rq2²), Rq = 1.25 Ra, m. */
  readonly compositeRoughness: Metres;
  readonly lambdaMin: number;
  readonly lambdaMinIndex: number;
  readonly lambdaGFMin: number;
  /** Regime at λ_min: the worst along the path. */
  readonly caseRegime: Regime;
  /** h_min and roughness against an anti-wear tribofilm, in words. */
  readonly note: string;
}

/**
 * EHL film along the path at the oil state given (the bulk temperature θM): h_min by the
 * policy's formula, h_c by Pan–Hamrock, the Murch–Wilson inlet shear-heating factor, λ with the
 * Gaussian composite roughness, λ_GF (ISO/TS 6336-22 form) and the regime at every point.
 */
export function filmAlongPath(input: CaseInput, m: MeshMechanics, oil: OilState, sink: WarningSink): FilmAlongPath {
  const { policy } = input;
  const ePrime = (2 * m.contactModulus) as Pascals; // Hamrock convention E′ = 2E*
  const n = m.n;
  const hMin = new Float64Array(n);
  const hCentral = new Float64Array(n);
  const thermalFactor = new Float64Array(n);
  const lambda = new Float64Array(n);
  const lambdaGF = new Float64Array(n);
  const regime = new Uint8Array(n);
  const ra1 = input.roughnessRa1;
  const ra2 = input.roughnessRa2;
  const sigma = (RQ_PER_RA_GAUSSIAN * Math.sqrt(ra1 * ra1 + ra2 * ra2)) as Metres;
  const ph: PanHamrockFilm = { hMin: 0 as Metres, hCentral: 0 as Metres };
  const useDH = policy.filmFormula === 'dowson-higginson';
  let lambdaMin = Infinity;
  let lambdaMinIndex = 0;
  let lambdaGFMin = Infinity;
  for (let i = 0; i < n; i++) {
    const uMean = ((m.sumVelocity[i] as number) / 2) as MetresPerSecond;
    const R = m.reducedRadius[i] as Metres;
    const w = m.lineLoad[i] as NewtonsPerMetre;
    panHamrockFilm(oil.dynamicViscosity, oil.pressureViscosity, uMean, R, w, ePrime, sink, ph);
    const h = useDH ? dowsonHigginsonMinFilm(oil.dynamicViscosity, oil.pressureViscosity, uMean, R, w, ePrime, sink) : ph.hMin;
    const phi = policy.thermalFilmCorrection ? murchWilsonThermalFactor(oil.temperatureViscosity, oil.dynamicViscosity, uMean, undefined, sink) : 1;
    thermalFactor[i] = phi;
    hMin[i] = h * phi;
    hCentral[i] = ph.hCentral * phi;
    const l = (h * phi) / sigma;
    lambda[i] = l;
    regime[i] = REGIMES.indexOf(classifyRegime(l, policy.regime));
    const hY = isoLocalFilm(oil.dynamicViscosity, oil.pressureViscosity, m.sumVelocity[i] as MetresPerSecond, R, m.hertzPressure[i] as Pascals, ePrime, 1, sink);
    const lgf = specificFilmThicknessGF(hY, ra1, ra2);
    lambdaGF[i] = lgf;
    if (l < lambdaMin) {
      lambdaMin = l;
      lambdaMinIndex = i;
    }
    if (lgf < lambdaGFMin) lambdaGFMin = lgf;
  }
  const caseRegime = classifyRegime(lambdaMin, policy.regime);
  return {
    formula: useDH ? 'Dowson–Higginson (1966)' : 'Pan–Hamrock (1989)',
    hMin,
    hCentral,
    thermalFactor,
    lambda,
    lambdaGF,
    regime,
    compositeRoughness: sigma,
    lambdaMin,
    lambdaMinIndex,
    lambdaGFMin,
    caseRegime,
    note: tribofilmNote(hMin[lambdaMinIndex] as Metres, sigma, policy.regime),
  };
}
