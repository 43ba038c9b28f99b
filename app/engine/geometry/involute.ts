import type { Radians } from '../units';

/**
 * Involute function inv α = tan α − α (ISO 21771).
 * @param alpha - angle in radians, 0 ≤ α < π/2
 * @example involute(degreesToRadians(20)) // 0.0149044
 */
export function involute(alpha: Radians): number {
  return Math.tan(alpha) - alpha;
}

/**
 * Inverse of the involute function: the angle α with tan α − α = inv, by Newton's method
 * started from Cheng's cube-root approximation. Defined for inv ≥ 0.
 */
export function inverseInvolute(inv: number): Radians {
  if (!(inv >= 0) || !Number.isFinite(inv)) throw new RangeError(`inverseInvolute: inv must be finite and ≥ 0, got ${inv}`);
  if (inv === 0) return 0 as Radians;
  let a = Math.cbrt(3 * inv) * (1 - 0.1 * Math.cbrt(inv * inv)); // good start for small angles
  if (!(a > 0) || a >= Math.PI / 2) a = 1.0;
  for (let i = 0; i < 50; i++) {
    const t = Math.tan(a);
    const f = t - a - inv;
    const df = t * t; // d/dα (tan α − α) = tan² α
    const next = a - f / df;
    const clamped = next <= 0 ? a / 2 : next >= Math.PI / 2 ? (a + Math.PI / 2) / 2 : next;
    if (Math.abs(clamped - a) < 1e-15) return clamped as Radians;
    a = clamped;
  }
  return a as Radians;
}
