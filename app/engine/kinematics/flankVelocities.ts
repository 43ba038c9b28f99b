import type { Metres, MetresPerSecond, RadiansPerSecond } from '../units';

export interface FlankVelocities {
  /** Tangential velocity of the pinion flank at the contact, v1 = ω1 ρ1. */
  v1: MetresPerSecond;
  /** Tangential velocity of the wheel flank at the contact, v2 = ω2 ρ2. */
  v2: MetresPerSecond;
  /** Sum velocity vΣ = v1 + v2 (twice the entrainment velocity). */
  sum: MetresPerSecond;
  /** Sliding velocity vg = |v1 − v2|; zero at the pitch point C. */
  sliding: MetresPerSecond;
  /** Slide-to-roll ratio 2(v1 − v2)/(v1 + v2); negative below C (pinion dedendum), positive above. */
  slideToRoll: number;
  /** Specific sliding of the pinion ζ1 = (v1 − v2)/v1. */
  specificSliding1: number;
  /** Specific sliding of the wheel ζ2 = (v2 − v1)/v2. */
  specificSliding2: number;
}

/**
 * Flank velocities at a contact point s from T1 on the transverse line of action (ISO/TS 6336-20
 * kinematics): ρ1 = s, v = ω ρ, and ρ2 = T1T2 − s on an external pair, ρ2 = s + T1T2 on an
 * internal one (T2 lies behind T1; both flanks move the same way along the line). At C both give
 * v1 = v2. Writes into `out` to keep the hot loop allocation-free.
 * @param s - position from T1, m (0 < s < T1T2 on an external pair, s > 0 on an internal one)
 * @param lineOfAction - T1T2, m
 * @param omega1 - pinion angular speed, rad/s; omega2 - wheel angular speed, rad/s (both as magnitudes)
 * @param internal - the wheel is a ring with internal teeth
 */
export function flankVelocities(s: Metres, lineOfAction: Metres, omega1: RadiansPerSecond, omega2: RadiansPerSecond, out: FlankVelocities, internal = false): FlankVelocities {
  const v1 = omega1 * s;
  const v2 = omega2 * (internal ? s + lineOfAction : lineOfAction - s);
  const sum = v1 + v2;
  out.v1 = v1 as MetresPerSecond;
  out.v2 = v2 as MetresPerSecond;
  out.sum = sum as MetresPerSecond;
  out.sliding = Math.abs(v1 - v2) as MetresPerSecond;
  out.slideToRoll = sum > 0 ? (2 * (v1 - v2)) / sum : 0;
  out.specificSliding1 = v1 > 0 ? (v1 - v2) / v1 : 0;
  out.specificSliding2 = v2 > 0 ? (v2 - v1) / v2 : 0;
  return out;
}

export function emptyFlankVelocities(): FlankVelocities {
  return { v1: 0 as MetresPerSecond, v2: 0 as MetresPerSecond, sum: 0 as MetresPerSecond, sliding: 0 as MetresPerSecond, slideToRoll: 0, specificSliding1: 0, specificSliding2: 0 };
}
