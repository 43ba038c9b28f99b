import type { Metres } from '../units';
import type { PathPoints } from '../geometry/types';

/**
 * Load-sharing factor XΓ of an unmodified spur pair (ISO/TS 6336-20, DIN 3990-4 [memory]):
 * rises linearly from 1/3 at A to 2/3 at B, is 1 from B to D (single-pair contact),
 * falls linearly from 2/3 at D to 1/3 at E. At B and D exactly the single-pair value 1
 * is returned (the conservative side of the step).
 */
export function spurLoadShare(s: Metres, p: PathPoints): number {
  if (s >= p.B && s <= p.D) return 1;
  if (s < p.B) {
    const span = p.B - p.A;
    const t = span > 0 ? (s - p.A) / span : 1;
    return 1 / 3 + t / 3;
  }
  const span = p.E - p.D;
  const t = span > 0 ? (p.E - s) / span : 1;
  return 1 / 3 + t / 3;
}

/**
 * Load-sharing factor XΓ along the path for spur and helical pairs (ISO/TS 6336-20 [memory]):
 * εβ ≥ 1: XΓ = 1/εα (uniform over the contact lines);
 * 0 < εβ < 1: XΓ = (1 − εβ) XΓ,spur + εβ/εα, the standard's linear interpolation, so that
 * β = 0 gives the spur values exactly.
 * @param epsAlpha - transverse contact ratio εα; epsBeta - overlap ratio εβ
 */
export function loadShare(s: Metres, p: PathPoints, epsAlpha: number, epsBeta: number): number {
  if (epsBeta >= 1) return 1 / epsAlpha;
  if (epsBeta <= 0) return spurLoadShare(s, p);
  return (1 - epsBeta) * spurLoadShare(s, p) + epsBeta / epsAlpha;
}
