import type { GearPairGeometry } from '../geometry/types';
import type { Material } from '../materials';
import type { OilModel } from '../oil/oilModel';
import type { BaseOil, Chemistry } from '../oil/types';
import type { RegimeThresholds } from '../film/regime';
import type { FzgFailureStage } from '../heat/scuffingTemperature';
import type { MicropittingFailureStage } from '../micropitting/failureStage';
import type { Kelvin, Metres, NewtonMetres, RadiansPerSecond } from '../units';

export type FilmFormula = 'dowson-higginson' | 'pan-hamrock';
export type Lubrication = 'dip' | 'spray';
/** Scuffing methods: flash temperature (ISO/TS 6336-20), integral temperature (ISO/TS 6336-21), or both. */
export const SCUFFING_METHODS = ['flash', 'integral', 'both'] as const;
export type ScuffingMethods = (typeof SCUFFING_METHODS)[number];

/** The review's policy, as the engine uses it. */
export interface EnginePolicy {
  readonly pathPoints: number;
  readonly thermalFilmCorrection: boolean;
  readonly filmFormula: FilmFormula;
  readonly regime: RegimeThresholds;
  readonly lambdaTarget: number;
  readonly scuffingSafetyMin: number;
  readonly integralSafetyMin: number;
  readonly antiWearOilFzgStage: number;
  readonly epOilFzgStage: number;
  /** A user-given μ, else the ISO/TS 6336-20 estimate. */
  readonly frictionCoefficient: number | null;
  readonly scuffingTemperatureSpread: number;
  readonly shockApplicationFactor: number;
  /** Which scuffing methods the verdict uses; with both, the more demanding governs. */
  readonly scuffingMethods: ScuffingMethods;
  /** Sλ,min of the micropitting method (ISO/TS 6336-22), default 1 [memory, weak]. */
  readonly micropittingSafetyMin: number;
}

/** One load case, in SI. */
export interface EngineDuty {
  readonly name: string;
  readonly pinionSpeed: RadiansPerSecond;
  readonly pinionTorque: NewtonMetres;
  readonly applicationFactor: number;
  readonly dynamicFactor: number;
  readonly faceLoadFactor: number;
  readonly transverseLoadFactor: number;
  readonly oilTemperature: Kelvin;
  readonly lubrication: Lubrication;
  readonly pinionMeshes: number;
  readonly timeShare: number;
}

/** One candidate oil: its data-sheet model plus what the verdict needs. */
export interface EngineOil {
  readonly name: string;
  readonly field: string;
  readonly model: OilModel;
  readonly baseOil: BaseOil;
  readonly chemistry: Chemistry;
  readonly fzgFailureStage: FzgFailureStage;
  /** FVA 54 micropitting failure load stage on the C-GF gear (5…10, '>10'); absent or null when unknown. */
  readonly micropittingFailureStage?: MicropittingFailureStage | null;
}

export interface CaseInput {
  readonly geometry: GearPairGeometry;
  readonly pinion: Material;
  readonly wheel: Material;
  readonly roughnessRa1: Metres;
  readonly roughnessRa2: Metres;
  readonly duty: EngineDuty;
  readonly oil: EngineOil | null;
  readonly policy: EnginePolicy;
  /** Path of the load case in the review, for messages, e.g. `loadCases[1]`. */
  readonly caseField: string;
}
