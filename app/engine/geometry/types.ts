import type { Metres, Radians } from '../units';
import type { EngineWarning } from '../diagnostics';

/** One gear of an external cylindrical pair, as given. */
export interface GearInput {
  readonly teeth: number;
  /** Profile shift coefficient x (dimensionless); derived from the centre distance when absent. */
  readonly profileShift?: number;
  /** Tip diameter da; else d + 2 mn (haP* + x) with haP* = 1. */
  readonly tipDiameter?: Metres;
}

export interface GearPairInput {
  readonly normalModule: Metres;
  readonly normalPressureAngle: Radians;
  readonly helixAngle: Radians;
  readonly faceWidth: Metres;
  /** Working centre distance a; else derived from the profile shifts. */
  readonly centerDistance?: Metres;
  readonly pinion: GearInput;
  readonly wheel: GearInput;
}

/** Positions on the line of action, measured from T1 (the pinion base-circle tangent point). */
export interface PathPoints {
  /** Start of active contact (wheel tip). */
  readonly A: Metres;
  /** Inner point of single-pair contact. */
  readonly B: Metres;
  /** Pitch point. */
  readonly C: Metres;
  /** Outer point of single-pair contact. */
  readonly D: Metres;
  /** End of active contact (pinion tip). */
  readonly E: Metres;
}

export interface GearPairGeometry {
  readonly z1: number;
  readonly z2: number;
  /** Gear ratio u = z2/z1. */
  readonly u: number;
  readonly normalModule: Metres;
  readonly normalPressureAngle: Radians;
  readonly helixAngle: Radians;
  readonly faceWidth: Metres;
  readonly transversePressureAngle: Radians;
  readonly workingPressureAngle: Radians;
  readonly baseHelixAngle: Radians;
  readonly x1: number;
  readonly x2: number;
  readonly referenceDiameter1: Metres;
  readonly referenceDiameter2: Metres;
  readonly baseDiameter1: Metres;
  readonly baseDiameter2: Metres;
  readonly tipDiameter1: Metres;
  readonly tipDiameter2: Metres;
  readonly workingDiameter1: Metres;
  readonly workingDiameter2: Metres;
  readonly centerDistance: Metres;
  /** Transverse base pitch pbt. */
  readonly transverseBasePitch: Metres;
  /** Length T1T2 of the line of action between the base-circle tangent points. */
  readonly lineOfAction: Metres;
  readonly points: PathPoints;
  /** εα */
  readonly transverseContactRatio: number;
  /** εβ */
  readonly overlapRatio: number;
  /** εγ = εα + εβ */
  readonly totalContactRatio: number;
  readonly checks: readonly EngineWarning[];
}
