import type { Regime } from '../film/regime';
import type { FzgStageNeed } from '../mesh/scuffing';
import type { ScuffingMethod, VerdictCode, VerdictPolicy } from './types';

export interface VerdictCodeFacts {
  readonly requiredStage: FzgStageNeed;
  readonly requiredStageIntegral: FzgStageNeed;
  readonly integralSafetyAtEpFloor: number | null;
  readonly applicationFactor: number;
  readonly regime: Regime;
}

/** A stage need as a number: '>12' (beyond the A/8.3/90 scale) counts as 13. */
export const stageNum = (s: FzgStageNeed): number => (s === '>12' ? 13 : s);

export const usesFlash = (p: VerdictPolicy): boolean => p.scuffingMethods !== 'integral';
export const usesIntegral = (p: VerdictPolicy): boolean => p.scuffingMethods !== 'flash';

/** The FZG stage the duty needs by the policy's methods: the more demanding of those in use. */
export function neededStage(f: VerdictCodeFacts, p: VerdictPolicy): number {
  return Math.max(usesFlash(p) ? stageNum(f.requiredStage) : 0, usesIntegral(p) ? stageNum(f.requiredStageIntegral) : 0);
}

/**
 * The method that governs: the one in use that needs the higher stage; on a tie the one with the
 * smaller safety margin (safety / its policy minimum), and the flash method when both margins are unknown.
 */
export function governingMethod(
  f: VerdictCodeFacts & { readonly scuffingSafety: number | null; readonly integralSafety: number | null },
  p: VerdictPolicy,
): ScuffingMethod {
  if (!usesIntegral(p)) return 'flash';
  if (!usesFlash(p)) return 'integral';
  const a = stageNum(f.requiredStage);
  const b = stageNum(f.requiredStageIntegral);
  if (a !== b) return a > b ? 'flash' : 'integral';
  const mf = f.scuffingSafety === null ? Infinity : f.scuffingSafety / p.scuffingSafetyMin;
  const mi = f.integralSafety === null ? Infinity : f.integralSafety / p.integralSafetyMin;
  return mi < mf ? 'integral' : 'flash';
}

/** Beyond oil chemistry: the stage needed is above the EP floor, or the integral method fails even at it. */
export function isBeyondOil(f: VerdictCodeFacts, p: VerdictPolicy): boolean {
  const integralFailsAtFloor = usesIntegral(p) && f.integralSafetyAtEpFloor !== null && f.integralSafetyAtEpFloor < p.integralSafetyMin;
  return neededStage(f, p) > p.epOilFzgStage || integralFailsAtFloor;
}

/** Shock duty in the boundary regime (common practice escalation to EP). */
export function isShockInBoundary(f: VerdictCodeFacts, p: VerdictPolicy): boolean {
  return f.applicationFactor >= p.shockApplicationFactor && f.regime === 'boundary';
}

/** EP warranted: a stage above the AW floor by the methods in use, or an escalation rule. */
export function isEpWarranted(f: VerdictCodeFacts, p: VerdictPolicy): boolean {
  return neededStage(f, p) > p.antiWearOilFzgStage || isShockInBoundary(f, p);
}

/**
 * The verdict code — the one place it is decided (the case verdict and the operating map both
 * call it): beyond-oil, else ep-warranted, else aw-suffices.
 */
export function verdictCodeOf(f: VerdictCodeFacts, p: VerdictPolicy): VerdictCode {
  if (isBeyondOil(f, p)) return 'beyond-oil';
  if (isEpWarranted(f, p)) return 'ep-warranted';
  return 'aw-suffices';
}
