import type { Regime } from '../film/regime';
import type { FzgStageNeed } from '../mesh/scuffing';
import type { VerdictCode, VerdictPolicy } from './types';

export interface VerdictCodeFacts {
  readonly requiredStage: FzgStageNeed;
  readonly requiredStageIntegral: FzgStageNeed;
  readonly integralSafetyAtEpFloor: number | null;
  readonly applicationFactor: number;
  readonly regime: Regime;
}

const stageNum = (s: FzgStageNeed): number => (s === '>12' ? 13 : s);

/** Beyond oil chemistry: the stage needed is above the EP floor, or the integral method fails even at it. */
export function isBeyondOil(f: VerdictCodeFacts, p: VerdictPolicy): boolean {
  return stageNum(f.requiredStage) > p.epOilFzgStage || (f.integralSafetyAtEpFloor !== null && f.integralSafetyAtEpFloor < p.integralSafetyMin);
}

/** Shock duty in the boundary regime (common practice escalation to EP). */
export function isShockInBoundary(f: VerdictCodeFacts, p: VerdictPolicy): boolean {
  return f.applicationFactor >= p.shockApplicationFactor && f.regime === 'boundary';
}

/** EP warranted: a stage above the AW floor by either method, or an escalation rule. */
export function isEpWarranted(f: VerdictCodeFacts, p: VerdictPolicy): boolean {
  return stageNum(f.requiredStage) > p.antiWearOilFzgStage || stageNum(f.requiredStageIntegral) > p.antiWearOilFzgStage || isShockInBoundary(f, p);
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
