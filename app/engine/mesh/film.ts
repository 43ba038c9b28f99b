import { ColumnBlock } from '../columnBlock';
import type { WarningSink } from '../diagnostics';
import { LINE_CONTACT_FIT_LIMITS, warnOutsideLineContactFit } from '../film/lineContactRange';
import { classifyRegime, type Regime } from '../film/regime';
import { RQ_PER_RA_GAUSSIAN } from '../film/specificFilm';
import { MINERAL_OIL_CONDUCTIVITY, MURCH_WILSON_L_MAX } from '../film/thermalCorrection';
import { tribofilmNote } from '../film/tribofilmNote';
import type { Metres } from '../units';
import type { OilState } from './oilState';
import type { MeshMechanics } from './mechanics';
import type { CaseInput } from './types';

export const REGIMES: readonly Regime[] = ['boundary', 'mixed', 'full-film'];

/** The columns filmAlongPath takes from its block: five of Float64 (taken first), one of Uint8. */
export const FILM_COLUMNS = { float64: 5, uint8: 1 } as const;

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

const LN = Math.log;
const { uMin, uMax, wMin, wMax, gMin, gMax } = LINE_CONTACT_FIT_LIMITS;
const LN_U_MIN = LN(uMin), LN_U_MAX = LN(uMax), LN_W_MIN = LN(wMin), LN_W_MAX = LN(wMax);

/**
 * EHL film along the path at the oil state given (the bulk temperature θM): h_min by the policy's
 * formula, h_c by Pan–Hamrock, the Murch–Wilson inlet shear-heating factor φT, λ with the Gaussian
 * composite roughness, λ_GF (ISO/TS 6336-22 form, ISO/TR 15144-1 film) and the regime at every point.
 *
 * The four films share their dimensionless groups, U = η0 ū/(E′R) and W = w/(E′R) (for the
 * ISO/TR 15144-1 groups, U_Y = η vΣ/(2E_r ρ) and W_Y = 2π p²/E_r² reduce to the same U and W
 * through Hertz), so this hot loop evaluates the published formulas of film/dowsonHigginson.ts,
 * film/panHamrock.ts, film/isoLocalFilm.ts and film/thermalCorrection.ts in log space from three
 * logarithms per point: h = R·k·exp(a ln U + b ln G + c ln W). tests/engine/film/filmKernel.test.ts
 * holds it to those reference functions within 1e-12.
 */
export function filmAlongPath(input: CaseInput, m: MeshMechanics, oil: OilState, sink: WarningSink, block: ColumnBlock = new ColumnBlock(m.n, FILM_COLUMNS.float64, FILM_COLUMNS.uint8)): FilmAlongPath {
  const { policy } = input;
  const n = m.n;
  const hMin = block.float64();
  const hCentral = block.float64();
  const thermalFactor = block.float64();
  const lambda = block.float64();
  const lambdaGF = block.float64();
  const regime = block.uint8();
  const ra1 = input.roughnessRa1;
  const ra2 = input.roughnessRa2;
  const sigma = (RQ_PER_RA_GAUSSIAN * Math.sqrt(ra1 * ra1 + ra2 * ra2)) as Metres;
  const raAvg = (ra1 + ra2) / 2;
  const useDH = policy.filmFormula === 'dowson-higginson';
  const thermal = policy.thermalFilmCorrection;
  const { boundaryBelow, fullFilmFrom } = policy.regime;

  const ePrime = 2 * m.contactModulus; // Hamrock convention E′ = 2E*
  const eta = oil.dynamicViscosity;
  const G = oil.pressureViscosity * ePrime;
  const lnG = LN(G);
  const lnEtaOverE = LN(eta) - LN(ePrime);
  const lnE = LN(ePrime);
  // Murch–Wilson: L = β η ū²/k_f, so ln L = ln(β η/k_f) + 2 ln ū.
  const lnMW = LN((oil.temperatureViscosity * eta) / MINERAL_OIL_CONDUCTIVITY);
  const kDH = 2.65 * Math.exp(0.54 * lnG);
  const kPHmin = 1.714 * Math.exp(0.568 * lnG);
  // The h_min formula's constants, chosen once (a + (−b)·c is a − b·c to the last bit).
  const kMin = useDH ? kDH : kPHmin;
  const aU = useDH ? 0.7 : 0.694;
  const aW = useDH ? -0.13 : -0.128;
  const kPHc = 2.922 * Math.exp(0.47 * lnG);
  const kISO = 1.6 * Math.exp(0.6 * lnG);
  if (G < gMin || G > gMax) warnOutsideLineContactFit(useDH ? 'Dowson–Higginson' : 'Pan–Hamrock', (uMin + uMax) / 2, (wMin + wMax) / 2, G, sink);

  let lambdaMin = Infinity;
  let lambdaMinIndex = 0;
  let lambdaGFMin = Infinity;
  let rangeWarned = false;
  let mwWarned = false;
  for (let i = 0; i < n; i++) {
    const uMean = (m.sumVelocity[i] as number) / 2;
    const R = m.reducedRadius[i] as number;
    let h = 0;
    let hc = 0;
    let hY = 0;
    let phi = 1;
    if (uMean > 0) {
      const lnR = LN(R);
      const lnU1 = LN(uMean);
      const lnU = lnEtaOverE + lnU1 - lnR;
      const lnW = LN(m.lineLoad[i] as number) - lnE - lnR;
      if (!rangeWarned && (lnU < LN_U_MIN || lnU > LN_U_MAX || lnW < LN_W_MIN || lnW > LN_W_MAX)) {
        warnOutsideLineContactFit(useDH ? 'Dowson–Higginson' : 'Pan–Hamrock', Math.exp(lnU), Math.exp(lnW), G, sink);
        rangeWarned = true;
      }
      h = R * kMin * Math.exp(aU * lnU + aW * lnW);
      hc = R * kPHc * Math.exp(0.692 * lnU - 0.166 * lnW);
      hY = R * kISO * Math.exp(0.7 * lnU - 0.13 * lnW);
      if (thermal) {
        const lnL = lnMW + 2 * lnU1;
        if (!mwWarned && lnL > LN_MW_L_MAX) {
          sink.add({ code: 'film.thermal-loading-range', severity: 'warning', field: 'L', message: `Thermal loading parameter L = ${Math.exp(lnL).toFixed(1)} is above ${MURCH_WILSON_L_MAX}; the Murch–Wilson factor is an extrapolation.` });
          mwWarned = true;
        }
        phi = 3.94 / (3.94 + Math.exp(0.62 * lnL));
      }
    } else {
      sink.add({ code: 'film.no-entrainment', severity: 'warning', field: 'uMean', message: 'Somewhere on the path the mean entrainment velocity is not above 0: no EHL film forms there (film taken as 0).' });
    }
    thermalFactor[i] = phi;
    hMin[i] = h * phi;
    hCentral[i] = hc * phi;
    const l = (h * phi) / sigma;
    lambda[i] = l;
    regime[i] = l < boundaryBelow ? 0 : l < fullFilmFrom ? 1 : 2;
    const lgf = hY / raAvg;
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

const LN_MW_L_MAX = LN(MURCH_WILSON_L_MAX);
