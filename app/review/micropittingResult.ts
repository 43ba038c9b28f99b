import type { CaseAnalysis } from '../engine/mesh/analyseCase';
import { MICROPITTING_STAGES } from '../engine/micropitting/failureStage';
import type { MicropittingFacts } from '../engine/verdict/types';
import { toMillimetres, type Metres } from '../engine/units';
import type { MicropittingFinding, MicropittingResult, MicropittingStageNeeded } from './results';
import type { Policy } from './schema';

/** A micropitting stage in words. */
export const micropittingStageWords = (s: MicropittingStageNeeded): string => (s === '>10' ? 'above 10' : String(s));
/** A stage the duty needs, in words: stage 5 is the test's first stage, so a need of 5 means 5 or below. */
export const micropittingNeedWords = (s: MicropittingStageNeeded): string => (s === 5 ? '5 or below (the test\'s first stage)' : micropittingStageWords(s));
/** A micropitting stage as a number for comparisons: '>10' counts as 11. */
export const micropittingStageNumber = (s: MicropittingStageNeeded | null): number => (s === null ? 0 : s === '>10' ? 11 : s);

export const MICROPITTING_FINDING_WORDS: Readonly<Record<MicropittingFinding, string>> = {
  meets: 'meets the micropitting need',
  short: 'short on micropitting: a higher micropitting class is needed',
  unknown: 'micropitting margin unknown: the oil\'s micropitting failure stage is not given',
};

/** The facts the verdict's micropitting rule reads. */
export function micropittingFacts(a: CaseAnalysis): MicropittingFacts | null {
  const mp = a.micropitting;
  if (!mp) return null;
  return {
    lambdaGFMin: mp.lambdaGFMin,
    lambdaGFP: mp.lambdaGFP,
    safety: mp.safety,
    safetyAtLeast: mp.safetyAtLeast,
    oilStage: mp.failureStage,
    requiredStage: mp.requiredStage,
    materialFactor: mp.materialFactor,
  };
}

/** Micropitting by ISO/TS 6336-22 as the results JSON shows it. */
export function micropittingResult(a: CaseAnalysis, p: Policy, finding: MicropittingFinding): MicropittingResult | null {
  const mp = a.micropitting;
  if (!mp) return null;
  const f2 = (x: number) => x.toFixed(2);
  const need = `the duty needs failure stage ${micropittingNeedWords(mp.requiredStage)} for Sλ ≥ ${p.micropittingSafetyMin}`;
  const note =
    mp.safety === null || mp.lambdaGFP === null
      ? `λGF,min = ${f2(mp.lambdaGFMin)}; the oil's micropitting failure stage is not given, so Sλ is unknown; ${need}.${mp.lambdaGFMin < 1 ? ' Screen: λGF,min < 1, micropitting is possible (common practice).' : ''}`
      : `Sλ = ${f2(mp.lambdaGFMin)}/${f2(mp.lambdaGFP)} = ${mp.safetyAtLeast ? 'at least ' : ''}${f2(mp.safety)} with failure stage ${micropittingStageWords(mp.failureStage ?? '>10')}; ${need}: ${MICROPITTING_FINDING_WORDS[finding]}.`;
  return {
    lambdaGFMin: mp.lambdaGFMin,
    lambdaGFMinPosition_mm: toMillimetres(a.mechanics.position[mp.lambdaGFMinIndex] as Metres),
    lambdaGFT: mp.lambdaGFT,
    lambdaGFP: mp.lambdaGFP,
    safety: mp.safety,
    safetyAtLeast: mp.safetyAtLeast,
    safetyMin: p.micropittingSafetyMin,
    materialFactorWW: mp.materialFactor,
    failureStage: mp.failureStage,
    requiredFailureStage: mp.requiredStage,
    lambdaGFTByStage: MICROPITTING_STAGES.map((stage, i) => ({ stage, lambdaGFT: mp.lambdaGFTByStage[i] as number })),
    finding,
    note,
  };
}
