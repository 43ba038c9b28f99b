import type { MicropittingFinding, Reason, Shortfall, VerdictFacts, VerdictPolicy } from './types';
import type { FzgStageNeed } from '../mesh/scuffing';
import { governingMethod, isShockInBoundary, neededStage, usesFlash, usesIntegral } from './code';
import { METHOD_WORDS, stageWords } from './words';

/**
 * The verdict's rules, one small function each, which give the reasons in order. A rule returns
 * null when it has nothing to say. The code itself is decided in code.ts, from the same facts.
 */
export interface RuleOutcome {
  readonly reason: Reason;
  readonly needsAntiWear?: boolean;
  /** What the oil falls short on, if this rule finds it short. */
  readonly oilFallsShort?: Shortfall;
}

export type Rule = (f: VerdictFacts, p: VerdictPolicy) => RuleOutcome | null;

const n2 = (x: number) => x.toFixed(2);
const n0 = (x: number) => x.toFixed(0);
const stageText = (s: FzgStageNeed) => stageWords(s);
const stageNum = (s: FzgStageNeed | number) => (s === '>12' ? 13 : s);
const floorsText = (p: VerdictPolicy) =>
  `policy floors: anti-wear oil FZG ≥ ${p.antiWearOilFzgStage} (the hydraulic-oil class DIN 51524-2 HLP asks for 10), EP gear oil FZG ≥ ${p.epOilFzgStage} (DIN 51517-3 CLP asks for 12)`;

/** The FZG stage the flash-temperature method needs, against the AW and EP floors. */
export const requiredStageRule: Rule = (f, p) => {
  if (!usesFlash(p)) return null;
  const need = stageNum(f.requiredStage);
  const beyond = need > p.epOilFzgStage;
  const ep = !beyond && need > p.antiWearOilFzgStage;
  const where = beyond
    ? `above the EP floor (${p.epOilFzgStage}): no oil in scope gives SB ≥ ${p.scuffingSafetyMin}`
    : ep
      ? `above the anti-wear floor (${p.antiWearOilFzgStage}) and within the EP floor (${p.epOilFzgStage})`
      : `within the anti-wear floor (${p.antiWearOilFzgStage})`;
  return {
    reason: {
      rule: 'scuffing.required-stage',
      text: `θB,max = ${n0(f.maxContactTemperature_C)} °C at ${n0(f.oilTemperature_C)} °C oil: SB ≥ ${p.scuffingSafetyMin} needs an oil of FZG A/8.3/90 failure stage ${stageText(f.requiredStage)}, ${where}.`,
      threshold: `SB,min = ${p.scuffingSafetyMin} (policy); ${floorsText(p)}`,
      source: 'ISO/TS 6336-20 flash temperature method; θS = 80 + (0.85 + 1.4 XW) XL S² °C',
    },
  };
};

/** The integral temperature method, as a second opinion that can escalate or rule out oil. */
export const integralRule: Rule = (f, p) => {
  if (!usesIntegral(p)) return null;
  const atFloor = f.integralSafetyAtEpFloor;
  if (atFloor !== null && atFloor < p.integralSafetyMin) {
    return {
      reason: {
        rule: 'scuffing.integral-beyond-ep-floor',
        text: `By the integral temperature method even an oil at the EP floor (stage ${p.epOilFzgStage}) gives SintS = ${n2(atFloor)} < ${p.integralSafetyMin}.`,
        threshold: `SintS,min = ${p.integralSafetyMin} (policy)`,
        source: 'ISO/TS 6336-21 integral temperature method',
      },
    };
  }
  const need = stageNum(f.requiredStageIntegral);
  if (need > p.antiWearOilFzgStage) {
    return {
      reason: {
        rule: 'scuffing.integral-required-stage',
        text: `By the integral temperature method SintS ≥ ${p.integralSafetyMin} needs FZG stage ${stageText(f.requiredStageIntegral)}, above the anti-wear floor (${p.antiWearOilFzgStage}).`,
        threshold: `SintS,min = ${p.integralSafetyMin} (policy); ${floorsText(p)}`,
        source: 'ISO/TS 6336-21 integral temperature method',
      },
    };
  }
  return {
    reason: {
      rule: 'scuffing.integral-ok',
      text: `By the integral temperature method SintS ≥ ${p.integralSafetyMin} needs FZG stage ${stageText(f.requiredStageIntegral)}, within the anti-wear floor.`,
      threshold: `SintS,min = ${p.integralSafetyMin} (policy)`,
      source: 'ISO/TS 6336-21 integral temperature method',
    },
  };
};

/** Shock duty in the boundary regime: asperities meet under impact loads; EP films are the usual answer. */
export const shockInBoundaryRule: Rule = (f, p) => {
  if (!isShockInBoundary(f, p)) return null;
  return {
    reason: {
      rule: 'escalation.shock-boundary',
      text: `Shock duty (KA = ${n2(f.applicationFactor)} ≥ ${p.shockApplicationFactor}) with boundary lubrication (λmin = ${n2(f.lambdaMin)}): EP chemistry is warranted whatever the scuffing margin.`,
      threshold: `KA ≥ ${p.shockApplicationFactor} (policy) and λ < 1`,
      source: 'common practice (heavy-duty and shock-loaded enclosed gearing is specified with EP oils)',
    },
  };
};

/** The regime in words; boundary alone makes an R&O oil insufficient, not EP necessary. */
export const regimeRule: Rule = (f) => {
  const boundary = f.regime === 'boundary';
  return {
    reason: {
      rule: 'film.regime',
      text: boundary
        ? `Boundary lubrication (λmin = ${n2(f.lambdaMin)}): film ${f.filmMin_um.toFixed(3)} µm against composite roughness ${f.compositeRoughness_um.toFixed(3)} µm. An anti-wear tribofilm (about 0.05–0.15 µm, common practice) must carry the asperity contacts: at least anti-wear chemistry is needed; this alone does not call for EP.`
        : `${f.regime === 'mixed' ? 'Mixed' : 'Full-film'} lubrication (λmin = ${n2(f.lambdaMin)}): film ${f.filmMin_um.toFixed(3)} µm against composite roughness ${f.compositeRoughness_um.toFixed(3)} µm.`,
      threshold: 'λ < 1 boundary, 1 ≤ λ < 3 mixed, λ ≥ 3 full film (policy; common practice)',
      source: 'Dowson–Higginson / Pan–Hamrock EHL film; λ with Rq = 1.25 Ra (common practice)',
    },
    needsAntiWear: boundary,
  };
};

/** λ against the policy target: a viscosity matter, answered with a grade, not with chemistry. */
export const lambdaTargetRule: Rule = (f, p) => {
  const ok = f.lambdaMin >= p.lambdaTarget;
  return {
    reason: {
      rule: 'film.lambda-target',
      text: ok
        ? `λmin = ${n2(f.lambdaMin)} meets the target ${p.lambdaTarget}.`
        : `λmin = ${n2(f.lambdaMin)} is below the target ${p.lambdaTarget}: a heavier grade (see the grade finder), a cooler sump or smoother flanks would raise it; EP chemistry does not.`,
      threshold: `λ target = ${p.lambdaTarget} (policy)`,
      source: 'policy; common practice',
    },
    ...(ok ? {} : { oilFallsShort: 'film' as const }),
  };
};

/** The oil's own FZG stage against what the duty needs, and which method sets the need. */
export const oilStageRule: Rule = (f, p) => {
  const need = neededStage(f, p);
  const has = stageNum(f.oilFzgStage);
  const ok = has >= need;
  const method = METHOD_WORDS[governingMethod(f, p)];
  const figures = [
    usesFlash(p) ? `SB = ${f.scuffingSafety === null ? '—' : n2(f.scuffingSafety)}` : null,
    usesIntegral(p) ? `SintS = ${f.integralSafety === null ? '—' : n2(f.integralSafety)}` : null,
    `scuffing probability ${(100 * f.scuffingProbability).toFixed(1)} %`,
  ].filter((x): x is string => x !== null);
  return {
    reason: {
      rule: 'oil.fzg-stage',
      text: `The duty needs FZG A/8.3/90 failure stage ${stageWords(need)}, set by the ${method}. This oil's stage is ${stageWords(f.oilFzgStage)}: ${ok ? 'it meets that' : 'short of that'} (${figures.join(', ')}).`,
      threshold: 'oil stage ≥ stage needed',
      source: 'ISO 14635-1 (FZG A/8.3/90); ISO/TS 6336-20 and -21',
    },
    ...(ok ? {} : { oilFallsShort: 'fzg-stage' as const }),
  };
};

const mpStageWords = (s: number | '>10') => (s === '>10' ? 'above 10 (beyond the test\'s scale)' : String(s));
const mpNeedWords = (s: number | '>10') => (s === 5 ? '5 or below (the test\'s first stage)' : mpStageWords(s));

/** The micropitting finding of ISO/TS 6336-22: Sλ against Sλ,min, or unknown without the oil's failure stage. */
export function micropittingFinding(f: VerdictFacts, p: VerdictPolicy): MicropittingFinding {
  const mp = f.micropitting;
  if (mp === null || mp.safety === null) return 'unknown';
  if (mp.safety >= p.micropittingSafetyMin) return 'meets';
  // An oil rated above stage 10 has only a lower bound on Sλ; it meets a need within the scale.
  return mp.safetyAtLeast && mp.requiredStage !== '>10' ? 'meets' : 'short';
}

/**
 * Micropitting, a finding of its own: the oil's FVA 54 failure stage against the stage the duty needs.
 * It never calls for EP chemistry; the reason says that some EP additive systems lower micropitting
 * resistance, so an EP oil must show its micropitting class too (common practice).
 */
export const micropittingRule: Rule = (f, p) => {
  const mp = f.micropitting;
  if (mp === null) return null;
  const finding = micropittingFinding(f, p);
  const need = `the duty needs a micropitting failure stage of ${mpNeedWords(mp.requiredStage)} (FVA 54, C-GF gear) for Sλ ≥ ${p.micropittingSafetyMin}`;
  const chemistry = 'An oil\'s micropitting resistance comes from its additive system, not its grade, and some EP additive systems lower it: an EP oil must show its micropitting class too; EP chemistry is no answer to micropitting.';
  const figures = mp.lambdaGFP === null || mp.safety === null ? '' : `Sλ = λGF,min/λGFP = ${n2(mp.lambdaGFMin)}/${n2(mp.lambdaGFP)} = ${mp.safetyAtLeast ? 'at least ' : ''}${n2(mp.safety)}`;
  const text =
    finding === 'unknown'
      ? `Micropitting: λGF,min = ${n2(mp.lambdaGFMin)}; this oil's micropitting failure stage is not given, so its margin is unknown; ${need}. Ask the supplier for it. ${chemistry}`
      : finding === 'meets'
        ? `Micropitting: ${figures} with this oil's failure stage ${mpStageWords(mp.oilStage ?? '>10')}; ${need}: it meets that. ${chemistry}`
        : `Micropitting: ${figures} < ${p.micropittingSafetyMin} with this oil's failure stage ${mpStageWords(mp.oilStage ?? '>10')}; ${need}: a higher micropitting class, smoother flanks or a thicker film is needed. ${chemistry}`;
  return {
    reason: {
      rule: 'micropitting.safety',
      text,
      threshold: `Sλ,min = ${p.micropittingSafetyMin} (policy; default [memory], weak); λGFP = 1.4 · WW · λGFT, WW = ${n2(mp.materialFactor)}`,
      source: 'ISO/TS 6336-22 micropitting (λGFT from the FVA 54 test on the C-GF gear at 90 °C and 8.3 m/s) [memory]; effect of EP additives: common practice',
    },
    ...(finding === 'short' ? { oilFallsShort: 'micropitting' as const } : {}),
  };
};

export const RULES: readonly Rule[] = [requiredStageRule, integralRule, shockInBoundaryRule, regimeRule, lambdaTargetRule, oilStageRule, micropittingRule];
