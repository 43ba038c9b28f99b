import type { CaseAnalysis } from '../engine/mesh/analyseCase';
import { decideVerdict } from '../engine/verdict/decide';
import { NOMINAL_STRESS_EDITION } from '../engine/stress/iso6336Nominal';
import type { VerdictFacts } from '../engine/verdict/types';
import { kelvinToCelsius, toMegapascals, toMicrometres, toMillimetres, type Metres, type Pascals } from '../engine/units';
import { micropittingFacts, micropittingResult } from './micropittingResult';
import type { ReviewOil } from './oils';
import type { CaseResult, LimitCheck } from './results';
import { pathSeriesOf, pointOf } from './pathSeries';
import type { PairLoadCase, PairReview, Policy } from './schema';

const orNull = (x: number): number | null => (Number.isFinite(x) ? x : null);

/** The facts the verdict rules read, from one analysis. */
function verdictFacts(review: PairReview, lc: PairLoadCase, oil: ReviewOil, all: readonly ReviewOil[], a: CaseAnalysis, maxHertz: Pascals): VerdictFacts {
  const film = a.film as NonNullable<CaseAnalysis['film']>;
  const heat = a.heat as NonNullable<CaseAnalysis['heat']>;
  const sc = a.scuffing as NonNullable<CaseAnalysis['scuffing']>;
  return {
    caseName: lc.name,
    oilName: oil.name,
    chemistry: oil.chemistry,
    baseOil: oil.baseOil,
    oilFzgStage: oil.fzgFailureStage,
    oilIsoVG: oil.model.isoVG,
    applicationFactor: lc.applicationFactor,
    oilTemperature_C: lc.oilTemperature_C,
    pitchLineVelocity_mps: a.mechanics.pitchLineVelocity,
    maxHertzStress_MPa: toMegapascals(maxHertz),
    lambdaMin: film.lambdaMin,
    lambdaGFMin: film.lambdaGFMin,
    regime: film.caseRegime,
    compositeRoughness_um: toMicrometres(film.compositeRoughness),
    filmMin_um: toMicrometres(film.hMin[film.lambdaMinIndex] as Metres),
    maxContactTemperature_C: kelvinToCelsius(heat.contactMax),
    scuffingTemperature_C: kelvinToCelsius(sc.scuffingTemperature),
    scuffingTemperatureAtLeast: sc.scuffingTemperatureAtLeast,
    scuffingSafety: sc.safety,
    integralSafety: sc.integralSafety,
    integralSafetyAtEpFloor: sc.integralSafetyAtEpFloor,
    requiredStage: sc.requiredStage,
    requiredStageIntegral: sc.requiredStageIntegral,
    scuffingProbability: sc.probability,
    micropitting: micropittingFacts(a),
    components: review.gearPair.components,
    otherOils: all.filter((o) => o !== oil).map((o) => ({ chemistry: o.chemistry, baseOil: o.baseOil, role: o.role })),
    role: oil.role,
  };
}

/** One analysis as the results JSON shows it (display units). */
export function caseToResult(review: PairReview, lc: PairLoadCase, oil: ReviewOil | null, all: readonly ReviewOil[], a: CaseAnalysis): CaseResult {
  const m = a.mechanics;
  const path = pathSeriesOf(a);
  let maxI = 0;
  for (let i = 0; i < m.n; i++) if ((m.hertzPressure[i] as number) > (m.hertzPressure[maxI] as number)) maxI = i;
  const film = a.film;
  const heat = a.heat;
  const sc = a.scuffing;
  const st = a.oilAtFilmTemperature;
  const verdict = oil && film ? decideVerdict(verdictFacts(review, lc, oil, all, a, m.hertzPressure[maxI] as Pascals), review.policy) : null;
  return {
    loadCase: lc.name,
    oil: oil?.name ?? null,
    pinionSpeed_rpm: lc.pinionSpeed_rpm,
    pinionTorque_Nm: a.input.duty.pinionTorque,
    applicationFactor: lc.applicationFactor,
    oilTemperature_C: lc.oilTemperature_C,
    pitchLineVelocity_mps: m.pitchLineVelocity,
    referenceLineVelocity_mps: (m.pinionAngularSpeed * a.input.geometry.referenceDiameter1) / 2,
    nominalContactStress_MPa: toMegapascals(m.nominal.sigmaH),
    nominalContactStressEdition: NOMINAL_STRESS_EDITION,
    nominalContactStressBasic_MPa: toMegapascals(m.nominal.sigmaH0),
    maxHertzStress_MPa: toMegapascals(m.hertzPressure[maxI] as Pascals),
    maxHertzStressPosition_mm: toMillimetres(m.position[maxI] as Metres),
    pitchHertzStress_MPa: toMegapascals(m.pitchHertzWholeLoad),
    pitch: pointOf(path, m.pitchIndex),
    path,
    oilAtTemperature: st
      ? {
          temperature_C: kelvinToCelsius(st.temperature),
          viscosity_mm2s: st.kinematicViscosity * 1e6,
          dynamicViscosity_mPas: st.dynamicViscosity * 1e3,
          density_kgm3: st.density,
          pressureViscosity_1perGPa: st.pressureViscosity * 1e9,
          temperatureViscosity_1perK: st.temperatureViscosity,
        }
      : null,
    lambdaMin: film ? film.lambdaMin : null,
    lambdaMinPosition_mm: film ? toMillimetres(m.position[film.lambdaMinIndex] as Metres) : null,
    regime: film ? film.caseRegime : null,
    filmFormula: film ? film.formula : null,
    thermalFilmFactor: film ? (film.thermalFactor[film.lambdaMinIndex] as number) : null,
    filmNote: film ? film.note : null,
    frictionCoefficient: heat ? heat.friction : null,
    frictionSource: heat ? heat.frictionSource : null,
    bulkTemperature_C: heat ? kelvinToCelsius(heat.bulkTemperature) : null,
    maxFlashTemperature_K: heat ? heat.flashMax : null,
    maxContactTemperature_C: heat ? kelvinToCelsius(heat.contactMax) : null,
    maxContactTemperaturePosition_mm: heat ? toMillimetres(m.position[heat.contactMaxIndex] as Metres) : null,
    scuffingTemperature_C: sc ? kelvinToCelsius(sc.scuffingTemperature) : null,
    scuffingTemperatureAtLeast: sc ? sc.scuffingTemperatureAtLeast : false,
    scuffingSafety: sc ? sc.safety : null,
    integralTemperature_C: sc ? kelvinToCelsius(sc.integralTemperature) : null,
    integralScuffingTemperature_C: sc ? kelvinToCelsius(sc.integralScuffingTemperature) : null,
    integralSafety: sc ? sc.integralSafety : null,
    requiredFzgStage: sc ? sc.requiredStage : null,
    requiredFzgStageIntegral: sc ? sc.requiredStageIntegral : null,
    scuffingProbability: sc ? orNull(sc.probability) : null,
    lambdaGFMin: film ? film.lambdaGFMin : null,
    micropittingAdvisory: film ? micropittingAdvisory(film.lambdaGFMin, a.micropitting?.failureStage ?? null) : null,
    micropitting: verdict ? micropittingResult(a, review.policy, verdict.micropitting) : null,
    verdict: verdict
      ? {
          code: verdict.code,
          oilFit: verdict.oilFit,
          shortfalls: verdict.shortfalls,
          chemistryNeed: verdict.chemistryNeed ?? 'beyond-oil',
          neededFzgStage: verdict.neededStage > 12 ? '>12' : verdict.neededStage,
          governingMethod: verdict.governingMethod,
          checks: limitChecks(review.policy, sc?.safety ?? null, sc?.integralSafety ?? null, film?.lambdaMin ?? null, a.micropitting?.safety ?? null),
          micropitting: verdict.micropitting,
          reasons: verdict.reasons,
          cautions: verdict.cautions,
        }
      : null,
    warnings: a.warnings,
  };
}

/** SB, SintS (for the methods the policy uses), λmin and Sλ (micropitting) against their policy limits. */
export function limitChecks(p: Policy, sb: number | null, sInt: number | null, lambdaMin: number | null, sLambda: number | null = null): LimitCheck[] {
  const check = (quantity: LimitCheck['quantity'], symbol: string, value: number | null, limit: number): LimitCheck => ({
    quantity,
    symbol,
    value,
    limit,
    pass: value === null ? null : value >= limit,
  });
  const out: LimitCheck[] = [];
  if (p.scuffingMethods !== 'integral') out.push(check('scuffingSafety', 'SB', sb, p.scuffingSafetyMin));
  if (p.scuffingMethods !== 'flash') out.push(check('integralSafety', 'SintS', sInt, p.integralSafetyMin));
  out.push(check('lambdaMin', 'λmin', lambdaMin, p.lambdaTarget));
  out.push(check('micropittingSafety', 'Sλ', sLambda, p.micropittingSafetyMin));
  return out;
}

/**
 * The screen on the whole path: without the oil's micropitting failure stage (which a data sheet
 * rarely gives) ISO/TS 6336-22 cannot give Sλ, and we screen at λGF,min < 1 (common practice).
 */
function micropittingAdvisory(lambdaGFMin: number, stage: number | '>10' | null): string {
  if (stage !== null) return `λGF,min = ${lambdaGFMin.toFixed(2)} along the whole path; the oil's micropitting failure stage ${stage === '>10' ? 'above 10' : stage} gives Sλ by ISO/TS 6336-22 (see Micropitting).`;
  return lambdaGFMin < 1
    ? `λGF,min = ${lambdaGFMin.toFixed(2)} < 1: micropitting is possible; ask for the oil's micropitting test class and check λGF,min against λGFP by ISO/TS 6336-22 (screen: common practice).`
    : `λGF,min = ${lambdaGFMin.toFixed(2)} ≥ 1: no micropitting flag by the screen λGF,min < 1 (common practice; ISO/TS 6336-22 needs the oil's λGFP for a safety factor).`;
}
