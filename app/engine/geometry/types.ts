import type { Metres, Radians } from '../units';
import type { EngineWarning } from '../diagnostics';

/**
 * External pair: both gears have external teeth and turn in opposite senses. Internal pair: the
 * wheel is a ring with internal teeth, the pinion runs inside it and both turn in the same sense.
 */
export type GearPairKind = 'external' | 'internal';

/**
 * One gear of a cylindrical pair, as given. Tooth counts are positive for both kinds; the kind of
 * pair says that the wheel of an internal pair has internal teeth.
 */
export interface GearInput {
  readonly teeth: number;
  /**
   * Profile shift coefficient x (dimensionless); derived from the centre distance when absent.
   * Sign as ISO 21771 gives it for signed tooth counts [memory]: x > 0 moves the basic rack
   * profile towards the tooth tips and thickens the tooth at the reference circle — away from the
   * axis on an external gear, towards the axis on a ring (its inner, tip circle shrinks).
   */
  readonly profileShift?: number;
  /**
   * Tip diameter da; else d + 2 mn (haP* + x) with haP* = 1. For a ring this is its inner
   * diameter, else d − 2 mn (haP* + x).
   */
  readonly tipDiameter?: Metres;
}

/** How messages name a gear: its review path (`gearPair.wheel`) and its word (`wheel`). */
export interface MemberName {
  readonly field: string;
  readonly word: string;
}

/** Names used in errors and checks, so a planetary stage can say `planetary.ring` and "ring". */
export interface PairNames {
  /** Review path of the pair, e.g. `gearPair`. */
  readonly pair: string;
  readonly pinion: MemberName;
  readonly wheel: MemberName;
}

export const DEFAULT_PAIR_NAMES: PairNames = {
  pair: 'gearPair',
  pinion: { field: 'gearPair.pinion', word: 'pinion' },
  wheel: { field: 'gearPair.wheel', word: 'wheel' },
};

export interface GearPairInput {
  /** Default `external`. */
  readonly kind?: GearPairKind;
  /** Default {@link DEFAULT_PAIR_NAMES}. */
  readonly names?: PairNames;
  readonly normalModule: Metres;
  readonly normalPressureAngle: Radians;
  readonly helixAngle: Radians;
  readonly faceWidth: Metres;
  /** Working centre distance a; else derived from the profile shifts. */
  readonly centerDistance?: Metres;
  readonly pinion: GearInput;
  readonly wheel: GearInput;
}

/**
 * Positions on the line of action, measured from T1 (the pinion base-circle tangent point). On an
 * internal pair T2 lies beyond T1, on the far side from C, so every point is at a positive s and
 * the ring's radius of curvature is s + T1T2.
 */
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
  readonly kind: GearPairKind;
  readonly names: PairNames;
  readonly z1: number;
  readonly z2: number;
  /** Gear ratio u = z2/z1 (positive for both kinds; ISO 21771 writes it negative for an internal pair). */
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
  /** Length T1T2 between the base-circle tangent points (a sin αwt for both kinds). */
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
