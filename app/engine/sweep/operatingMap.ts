import { ColumnBlock } from '../columnBlock';
import { blokFlashTemperature } from '../heat/blokFlash';
import { hertzSemiWidth } from '../stress/hertz';
import { LUBRICATION_FACTOR_XS } from '../heat/bulkTemperature';
import { integralContactRatioFactor } from '../heat/contactRatioFactor';
import { helicalLoadFactor } from '../heat/helicalLoadFactor';
import { FZG_A_PINION_TORQUE, INTEGRAL_WEIGHT_BULK, INTEGRAL_WEIGHT_FLASH, integralScuffingTemperature } from '../heat/integralTemperature';
import { multipleMeshFactor } from '../heat/meshingPinions';
import { isoMeanFriction } from '../heat/isoFriction';
import { scuffingTemperature } from '../heat/scuffingTemperature';
import { MINERAL_OIL_CONDUCTIVITY } from '../film/thermalCorrection';
import { RQ_PER_RA_GAUSSIAN } from '../film/specificFilm';
import { materialContactCoefficient } from '../materials';
import { meshMechanics } from '../mesh/mechanics';
import { testGearLambdaGF } from '../mesh/micropitting';
import { WarningSink } from '../diagnostics';
import { micropittingStageNumber, MICROPITTING_STAGE_MAX } from '../micropitting/failureStage';
import { pairMaterialFactorWW } from '../micropitting/materialFactor';
import { permissibleSpecificFilm } from '../micropitting/permissibleFilm';
import type { CaseInput, EngineOil } from '../mesh/types';
import type { OilModel } from '../oil/oilModel';
import type { FzgStageNeed } from '../mesh/scuffing';
import { verdictCodeOf } from '../verdict/code';
import type { VerdictCode } from '../verdict/types';
import { celsiusToKelvin, kelvinToCelsius, type Kelvin, type Metres, type MetresPerSecond, type NewtonMetres, type NewtonsPerMetre } from '../units';

export const VERDICT_CODES: readonly VerdictCode[] = ['aw-suffices', 'ep-warranted', 'beyond-oil'];

export interface MapAxes {
  /** Oil temperatures, °C (rows). */
  readonly temperatures_C: Float64Array;
  /** Load as a fraction of the case torque (columns), e.g. 0.1…1.5. */
  readonly loadFractions: Float64Array;
}

/** One operating map (one load case, one oil): row-major grids, index = row · nLoad + column. */
export interface OperatingMap {
  readonly axes: MapAxes;
  readonly lambdaMin: Float64Array;
  /** SB; +∞ where there is no temperature rise (the edges write it as empty/null, never NaN). */
  readonly scuffingSafety: Float64Array;
  /** SintS; +∞ where θint ≤ 0 °C. */
  readonly integralSafety: Float64Array;
  /** Index into VERDICT_CODES. */
  readonly verdict: Uint8Array;
  /** λGF,min in the area at risk (ISO/TS 6336-22). */
  readonly lambdaGFMin: Float64Array;
  /** Sλ = λGF,min/λGFP; null when the oil's micropitting failure stage is unknown. */
  readonly micropittingSafety: Float64Array | null;
  /** λGFP of the oil (null when unknown): the λGF,min = λGFP line of the map. */
  readonly lambdaGFP: number | null;
}

export function mapAxes(temperatureRange_C: readonly [number, number], nTemperature: number, nLoad: number, loadRange: readonly [number, number] = [0.1, 1.5]): MapAxes {
  const t = new Float64Array(nTemperature);
  const l = new Float64Array(nLoad);
  for (let i = 0; i < nTemperature; i++) t[i] = temperatureRange_C[0] + ((temperatureRange_C[1] - temperatureRange_C[0]) * i) / Math.max(1, nTemperature - 1);
  for (let j = 0; j < nLoad; j++) l[j] = loadRange[0] + ((loadRange[1] - loadRange[0]) * j) / Math.max(1, nLoad - 1);
  return { temperatures_C: t, loadFractions: l };
}

/** What a sweep of one load case needs that depends on neither the oil nor the cell. */
export interface SweepCase {
  readonly input: Omit<CaseInput, 'oil'>;
  readonly n: number;
  /** Blok θfl per unit μ at 100 % load, K. */
  readonly flashPerMu: Float64Array;
  readonly flashPerMuMax: number;
  /**
   * The per-point part of each film, which a cell only scales: with U = (η/E′)·ū/R and
   * W = f·w0/(E′R), h = R k G^b U^a W^c = k G^b (η/E′)^a f^c · [R (ū/R)^a (w0/(E′R))^c], the bracket
   * kept here for the policy's formula (hPoint) and for the ISO/TR 15144-1 local film (hYPoint);
   * and ū^1.24 for the Murch–Wilson factor, L^0.62 = (βη/k_f)^0.62 · ū^1.24.
   */
  readonly hPoint: Float64Array;
  readonly hYPoint: Float64Array;
  readonly uBarPow: Float64Array;
  readonly lnE: number;
  readonly ePrime: number;
  readonly sigma: number;
  readonly raAvg: Metres;
  readonly unitLoad: number;
  readonly kBg: number;
  readonly xS: number;
  readonly xMp: number;
  readonly xW: number;
  readonly vSumC: MetresPerSecond;
  readonly rhoC: Metres;
  /** Integral method: calibrated θfla,E · Xε per unit μ at 100 % load, K. */
  readonly intFlashPerMu: number;
  /** 1 where the point lies in the area at risk of micropitting (s ≤ B or s ≥ D), as micropitting/lambdaGFAtRisk.ts. */
  readonly atRisk: Uint8Array;
  /** The field a warning about the oil temperature names. */
  readonly temperatureField: string;
}

/** Per-oil constants of a sweep: scuffing temperatures per stage for this oil's XL and the pair's XW. */
export interface SweepOil {
  readonly oil: EngineOil;
  readonly thetaS: number;
  /** θS(S), K, index 1…12. */
  readonly thetaSOf: Float64Array;
  /** θintS(S), °C, index 1…12. */
  readonly thetaIntSOf: Float64Array;
  readonly oilStage: number;
  /** λGFP = 1.4 WW λGFT at the oil's micropitting failure stage; null when unknown. */
  readonly lambdaGFP: number | null;
}

export interface CellResult {
  lambdaMin: number;
  scuffingSafety: number;
  integralSafety: number;
  verdict: number;
  lambdaGFMin: number;
  /** Sλ; +∞ when the oil's micropitting stage is unknown (the map then has no Sλ grid). */
  micropittingSafety: number;
}

/**
 * Prepare one load case for sweeping. The same models as analyseCase (mesh/*), rearranged so that
 * nothing is allocated per cell: the velocities and radii, and the flash temperature per unit μ at
 * 100 % load (Blok: θfl ∝ μ w^0.75, since bH ∝ √w), are computed once; the film groups reuse the
 * log-space form of mesh/film.ts (h ∝ f^−0.13 in the load fraction f).
 */
export function prepareSweep(input: Omit<CaseInput, 'oil'>): SweepCase {
  const { policy } = input;
  const g = input.geometry;
  const m = meshMechanics(g, input.pinion, input.wheel, input.duty, policy.pathPoints);
  const n = m.n;
  const bM1 = materialContactCoefficient(input.pinion);
  const bM2 = materialContactCoefficient(input.wheel);
  const ePrime = 2 * m.contactModulus;
  const lnE = Math.log(ePrime);
  const kBg = helicalLoadFactor(g.totalContactRatio);
  const ra1 = input.roughnessRa1;
  const ra2 = input.roughnessRa2;
  const block = new ColumnBlock(n, 4, 1);
  const flashPerMu = block.float64();
  const useDH = policy.filmFormula === 'dowson-higginson';
  const aU = useDH ? 0.7 : 0.694;
  const aW = useDH ? -0.13 : -0.128;
  const hPoint = block.float64();
  const hYPoint = block.float64();
  const uBarPow = block.float64();
  const atRisk = block.uint8();
  let anyAtRisk = false;
  for (let i = 0; i < n; i++) {
    const s = m.position[i] as number;
    atRisk[i] = s <= g.points.B || s >= g.points.D ? 1 : 0;
    anyAtRisk ||= atRisk[i] === 1;
  }
  if (!anyAtRisk) atRisk.fill(1); // no two-pair zone (εα ≤ 1): the whole path, as lambdaGFAtRisk does
  let flashPerMuMax = 0;
  for (let i = 0; i < n; i++) {
    const v1 = m.v1[i] as number, v2 = m.v2[i] as number;
    const w = m.lineLoad[i] as number, bH = m.hertzSemiWidth[i] as number;
    const f = blokFlashTemperature(1, w as NewtonsPerMetre, v1 as MetresPerSecond, v2 as MetresPerSecond, bM1, bM2, bH as Metres); // θfl is linear in μ
    flashPerMu[i] = f;
    if (f > flashPerMuMax) flashPerMuMax = f;
    const lnU = Math.log((m.sumVelocity[i] as number) / 2);
    const r = m.reducedRadius[i] as number;
    const lnR = Math.log(r);
    const lnUPoint = lnU - lnR;
    const lnWPoint = Math.log(w) - lnE - lnR;
    hPoint[i] = r * Math.exp(aU * lnUPoint + aW * lnWPoint);
    hYPoint[i] = useDH ? (hPoint[i] as number) : r * Math.exp(0.7 * lnUPoint - 0.13 * lnWPoint);
    uBarPow[i] = Math.exp(1.24 * lnU);
  }
  const last = n - 1;
  const fullLoad = m.unitLoad * kBg;
  const bHE = hertzSemiWidth(fullLoad as NewtonsPerMetre, m.reducedRadius[last] as Metres, m.contactModulus);
  const v1E = m.v1[last] as number, v2E = m.v2[last] as number;
  const flashEPerMu = blokFlashTemperature(1, fullLoad as NewtonsPerMetre, v1E as MetresPerSecond, v2E as MetresPerSecond, bM1, bM2, bHE);
  const xEps = integralContactRatioFactor((g.points.E - g.points.C) / g.transverseBasePitch, Math.max(0, (g.points.C - g.points.A) / g.transverseBasePitch));
  return {
    temperatureField: `${input.caseField}.oilTemperature_C`,
    input,
    n,
    flashPerMu,
    flashPerMuMax,
    hPoint,
    hYPoint,
    uBarPow,
    lnE,
    ePrime,
    sigma: RQ_PER_RA_GAUSSIAN * Math.sqrt(ra1 * ra1 + ra2 * ra2),
    raAvg: ((ra1 + ra2) / 2) as Metres,
    unitLoad: m.unitLoad,
    kBg,
    xS: LUBRICATION_FACTOR_XS[input.duty.lubrication],
    xMp: multipleMeshFactor(input.duty.pinionMeshes),
    xW: Math.min(input.pinion.structuralFactorXW, input.wheel.structuralFactorXW),
    vSumC: m.sumVelocity[m.pitchIndex] as MetresPerSecond,
    rhoC: m.reducedRadius[m.pitchIndex] as Metres,
    intFlashPerMu: flashEPerMu * xEps,
    atRisk,
  };
}

export function prepareSweepOil(sc: SweepCase, oil: EngineOil): SweepOil {
  const xL = oil.model.lubricantFactor;
  const { thetaSOf, thetaIntSOf } = scuffingTemperaturesByStage(sc.xW, xL);
  const mpStage = oil.micropittingFailureStage ?? null;
  const lambdaGFP =
    mpStage === null
      ? null
      : permissibleSpecificFilm(
          testGearLambdaGF({ ...sc.input, oil }, Math.min(micropittingStageNumber(mpStage, `${oil.field}.micropittingFailureStage`), MICROPITTING_STAGE_MAX), new WarningSink()),
          pairMaterialFactorWW(sc.input.pinion.micropittingFactorWW, sc.input.wheel.micropittingFactorWW),
        );
  return { oil, thetaS: scuffingTemperature(oil.fzgFailureStage, sc.xW, xL).value, thetaSOf, thetaIntSOf, oilStage: oil.fzgFailureStage === '>12' ? 12 : oil.fzgFailureStage, lambdaGFP };
}

/** θS and θintS at each FZG stage 1…12 (index = stage) for XW and XL; kept, as every grade and cell asks again. Read only. */
const byStage = new Map<string, { thetaSOf: Float64Array; thetaIntSOf: Float64Array }>();
function scuffingTemperaturesByStage(xW: number, xL: number): { thetaSOf: Float64Array; thetaIntSOf: Float64Array } {
  const key = `${xW}|${xL}`;
  const known = byStage.get(key);
  if (known) return known;
  const thetaSOf = new Float64Array(13);
  const thetaIntSOf = new Float64Array(13);
  for (let s = 1; s <= 12; s++) {
    thetaSOf[s] = scuffingTemperature(s, xW, xL).value;
    thetaIntSOf[s] = kelvinToCelsius(integralScuffingTemperature(FZG_A_PINION_TORQUE[s - 1] as NewtonMetres, xL, xW));
  }
  if (byStage.size >= 1024) byStage.clear();
  const value = { thetaSOf, thetaIntSOf };
  byStage.set(key, value);
  return value;
}

const codeFacts = { requiredStage: 1 as FzgStageNeed, requiredStageIntegral: 1 as FzgStageNeed, integralSafetyAtEpFloor: null as number | null, applicationFactor: 1, regime: 'mixed' as 'boundary' | 'mixed' | 'full-film' };

/** What cellFilm gives: written in place, so a cell allocates nothing. */
const film = { mu: 0, f75: 0, flashMax: 0, thetaM: 0, lambdaMin: 0, lambdaGFMin: 0 };

/**
 * The film part of a cell: μ (ISO/TS 6336-20 or the policy's), θfl,max and θM, then λmin over the
 * path and λGF,min in the area at risk at θM (clamped to the oil model's range as analyseCase does).
 */
function cellFilm(sc: SweepCase, model: OilModel, tOil: Kelvin, f: number): typeof film {
  const { policy } = sc.input;
  const etaOil = model.dynamicViscosity(tOil, sc.temperatureField);
  const mu = policy.frictionCoefficient ?? isoMeanFriction({ wBt: (sc.unitLoad * f) as NewtonsPerMetre, vSumC: sc.vSumC, rhoRelC: sc.rhoC, etaOil, raAvg: sc.raAvg, xL: model.lubricantFactor, kBgamma: sc.kBg });
  const f75 = Math.pow(f, 0.75);
  const flashMax = mu * f75 * sc.flashPerMuMax;
  const thetaM = tOil + 0.47 * sc.xS * sc.xMp * flashMax;
  // Film at θM, clamped to the oil model's range as analyseCase does.
  const tMax = model.temperatureRange.max;
  const tFilm = (thetaM > tMax ? tMax : thetaM) as Kelvin;
  const eta = model.dynamicViscosity(tFilm);
  const lnG = Math.log(model.pressureViscosity(tFilm) * sc.ePrime);
  const lnEta = Math.log(eta) - sc.lnE;
  const lnF = Math.log(f);
  const useDH = policy.filmFormula === 'dowson-higginson';
  const aU = useDH ? 0.7 : 0.694;
  const aW = useDH ? -0.13 : -0.128;
  // The cell's factors of the films (see SweepCase.hPoint): k G^b (η/E′)^a f^c, and for hY 1.6 G^0.6 (η/E′)^0.7 f^−0.13.
  const kFilm = (useDH ? 2.65 * Math.exp(0.54 * lnG) : 1.714 * Math.exp(0.568 * lnG)) * Math.exp(aU * lnEta + aW * lnF);
  const kIso = 1.6 * Math.exp(0.6 * lnG + 0.7 * lnEta - 0.13 * lnF);
  const thermal = policy.thermalFilmCorrection;
  // Murch–Wilson: φT = 3.94 / (3.94 + L^0.62), L^0.62 = (βη/k_f)^0.62 · ū^1.24.
  const mw = Math.exp(0.62 * Math.log((model.temperatureViscosity(tFilm) * eta) / MINERAL_OIL_CONDUCTIVITY));
  let lmin = Infinity;
  let hYMin = Infinity;
  for (let i = 0; i < sc.n; i++) {
    const h0 = kFilm * (sc.hPoint[i] as number);
    if (sc.atRisk[i] === 1) {
      const hY = kIso * (sc.hYPoint[i] as number);
      if (hY < hYMin) hYMin = hY;
    }
    const h = thermal ? h0 * (3.94 / (3.94 + mw * (sc.uBarPow[i] as number))) : h0;
    if (h < lmin) lmin = h;
  }
  film.mu = mu;
  film.f75 = f75;
  film.flashMax = flashMax;
  film.thetaM = thetaM;
  film.lambdaMin = lmin / sc.sigma;
  film.lambdaGFMin = hYMin / sc.raAvg;
  return film;
}

/** λmin of one cell only (the grade finder's question): evaluateCell's film, without the scuffing and the verdict. */
export function cellLambdaMin(sc: SweepCase, model: OilModel, tOilC: number, f = 1): number {
  return cellFilm(sc, model, celsiusToKelvin(tOilC), f).lambdaMin;
}

/**
 * λmin, SB, SintS and the verdict code of one cell: oil temperature `tOilC` (°C) and load fraction
 * `f` of the case torque. Writes into `out`; allocates nothing. A cell at the case's own temperature
 * and f = 1 equals analyseCase (tests/engine/sweep/operatingMap.test.ts).
 */
export function evaluateCell(sc: SweepCase, so: SweepOil, tOilC: number, f: number, out: CellResult): CellResult {
  const { policy } = sc.input;
  const tOil = celsiusToKelvin(tOilC);
  const { mu, f75, flashMax, thetaM, lambdaMin: lmin, lambdaGFMin: lgf } = cellFilm(sc, so.oil.model, tOil, f);
  const rise = thetaM + flashMax - tOil;
  const flashInt = mu * f75 * sc.intFlashPerMu;
  const thetaIntC = tOilC + (INTEGRAL_WEIGHT_BULK * sc.xMp + INTEGRAL_WEIGHT_FLASH) * flashInt;
  let need: FzgStageNeed = '>12';
  let needInt: FzgStageNeed = '>12';
  for (let s = 12; s >= 1; s--) {
    if (rise <= 0 || ((so.thetaSOf[s] as number) - tOil) / rise >= policy.scuffingSafetyMin) need = s;
    if (thetaIntC <= 0 || (so.thetaIntSOf[s] as number) / thetaIntC >= policy.integralSafetyMin) needInt = s;
  }
  codeFacts.requiredStage = need;
  codeFacts.requiredStageIntegral = needInt;
  codeFacts.integralSafetyAtEpFloor = thetaIntC > 0 ? (so.thetaIntSOf[policy.epOilFzgStage] as number) / thetaIntC : null;
  codeFacts.applicationFactor = sc.input.duty.applicationFactor;
  codeFacts.regime = lmin < policy.regime.boundaryBelow ? 'boundary' : lmin < policy.regime.fullFilmFrom ? 'mixed' : 'full-film';
  out.lambdaMin = lmin;
  out.scuffingSafety = rise > 0 ? (so.thetaS - tOil) / rise : Infinity;
  out.integralSafety = thetaIntC > 0 ? (so.thetaIntSOf[so.oilStage] as number) / thetaIntC : Infinity;
  out.verdict = VERDICT_CODES.indexOf(verdictCodeOf(codeFacts, policy));
  out.lambdaGFMin = lgf;
  out.micropittingSafety = so.lambdaGFP === null ? Infinity : lgf / so.lambdaGFP;
  return out;
}

/** The operating map of one load case with one oil over oil temperature × load. */
export function operatingMap(input: CaseInput, axes: MapAxes, prepared: SweepCase = prepareSweep(input)): OperatingMap {
  const oil = input.oil;
  if (!oil) throw new Error('operatingMap needs an oil');
  const so = prepareSweepOil(prepared, oil);
  const nT = axes.temperatures_C.length;
  const nL = axes.loadFractions.length;
  const cells = nT * nL;
  const lambdaMin = new Float64Array(cells);
  const scuffingSafety = new Float64Array(cells);
  const integralSafety = new Float64Array(cells);
  const verdict = new Uint8Array(cells);
  const lambdaGFMin = new Float64Array(cells);
  const micropittingSafety = so.lambdaGFP === null ? null : new Float64Array(cells);
  const cell: CellResult = { lambdaMin: 0, scuffingSafety: 0, integralSafety: 0, verdict: 0, lambdaGFMin: 0, micropittingSafety: 0 };
  for (let r = 0; r < nT; r++) {
    for (let c = 0; c < nL; c++) {
      evaluateCell(prepared, so, axes.temperatures_C[r] as number, axes.loadFractions[c] as number, cell);
      const k = r * nL + c;
      lambdaMin[k] = cell.lambdaMin;
      scuffingSafety[k] = cell.scuffingSafety;
      integralSafety[k] = cell.integralSafety;
      verdict[k] = cell.verdict;
      lambdaGFMin[k] = cell.lambdaGFMin;
      if (micropittingSafety) micropittingSafety[k] = cell.micropittingSafety;
    }
  }
  return { axes, lambdaMin, scuffingSafety, integralSafety, verdict, lambdaGFMin, micropittingSafety, lambdaGFP: so.lambdaGFP };
}
