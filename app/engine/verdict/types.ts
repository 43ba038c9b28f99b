import type { Regime } from '../film/regime';
import type { Chemistry, BaseOil } from '../oil/types';
import type { FzgStageNeed } from '../mesh/scuffing';
import type { ScuffingMethods } from '../mesh/types';

/** The micropitting figures of one case with one oil (ISO/TS 6336-22). */
export interface MicropittingFacts {
  readonly lambdaGFMin: number;
  /** λGFP at the oil's failure stage; null when the stage is unknown. */
  readonly lambdaGFP: number | null;
  readonly safety: number | null;
  readonly safetyAtLeast: boolean;
  /** The oil's failure stage (5…10, '>10'), null when unknown. */
  readonly oilStage: number | '>10' | null;
  /** The smallest failure stage with Sλ ≥ Sλ,min. */
  readonly requiredStage: number | '>10';
  readonly materialFactor: number;
}

/** Micropitting finding: meets Sλ,min, short (a higher class is needed), or unknown (no failure stage given). */
export type MicropittingFinding = 'meets' | 'short' | 'unknown';

export type VerdictCode = 'aw-suffices' | 'ep-warranted' | 'beyond-oil';
export type OilFit = 'meets' | 'falls-short';

/** What the verdict rules look at, for one load case with one oil (display units where stated). */
export interface VerdictFacts {
  readonly caseName: string;
  readonly oilName: string;
  readonly chemistry: Chemistry;
  readonly baseOil: BaseOil;
  readonly oilFzgStage: number | '>12';
  readonly oilIsoVG: number | null;
  readonly applicationFactor: number;
  readonly oilTemperature_C: number;
  readonly pitchLineVelocity_mps: number;
  readonly maxHertzStress_MPa: number;
  readonly lambdaMin: number;
  readonly lambdaGFMin: number;
  readonly regime: Regime;
  readonly compositeRoughness_um: number;
  readonly filmMin_um: number;
  readonly maxContactTemperature_C: number;
  readonly scuffingTemperature_C: number;
  readonly scuffingTemperatureAtLeast: boolean;
  readonly scuffingSafety: number | null;
  readonly integralSafety: number | null;
  readonly integralSafetyAtEpFloor: number | null;
  readonly requiredStage: FzgStageNeed;
  readonly requiredStageIntegral: FzgStageNeed;
  readonly scuffingProbability: number;
  /** Micropitting (null when not assessed). */
  readonly micropitting: MicropittingFacts | null;
  /** Parts in the oil circuit (review gearPair.components). */
  readonly components: readonly string[];
  /** Other oils of the review, for change-of-oil cautions. */
  readonly otherOils: ReadonlyArray<{ readonly chemistry: Chemistry; readonly baseOil: BaseOil; readonly role: string }>;
  readonly role: string;
}

export interface VerdictPolicy {
  readonly lambdaTarget: number;
  readonly scuffingSafetyMin: number;
  readonly integralSafetyMin: number;
  readonly antiWearOilFzgStage: number;
  readonly epOilFzgStage: number;
  readonly shockApplicationFactor: number;
  /** Which scuffing methods decide: flash, integral or both (the more demanding governs). */
  readonly scuffingMethods: ScuffingMethods;
  /** Sλ,min of the micropitting method. */
  readonly micropittingSafetyMin: number;
}

/** One scuffing method: flash temperature (ISO/TS 6336-20) or integral temperature (ISO/TS 6336-21). */
export type ScuffingMethod = 'flash' | 'integral';

export interface Reason {
  readonly rule: string;
  readonly text: string;
  readonly threshold: string;
  readonly source: string;
}

export interface Caution {
  readonly id: string;
  readonly text: string;
  readonly kind: 'standing' | 'triggered';
}

/** Why an oil falls short: its film (a grade matter), its FZG stage, its chemistry, or its micropitting class. */
export type Shortfall = 'film' | 'fzg-stage' | 'chemistry' | 'micropitting';

export interface Verdict {
  readonly code: VerdictCode;
  readonly oilFit: OilFit;
  readonly shortfalls: Shortfall[];
  /** The method that governs the stage needed (the more demanding of those the policy uses). */
  readonly governingMethod: ScuffingMethod;
  /** The chemistry class the duty needs with this oil; null when no oil gives the margin. */
  readonly chemistryNeed: 'r-and-o' | 'anti-wear' | 'extreme-pressure' | null;
  /** The FZG stage the duty needs by the policy's methods (13 = above the A/8.3/90 scale). */
  readonly neededStage: number;
  /** The micropitting finding; it does not move the code (it is no reason for EP chemistry). */
  readonly micropitting: MicropittingFinding;
  readonly reasons: Reason[];
  readonly cautions: Caution[];
  /** The grade advice when λ falls short (a viscosity matter, not a chemistry one). */
  readonly gradeAdvice: string | null;
}
