import { EngineInputError } from '../diagnostics';
import type { PathPoints } from '../geometry/types';

export const MIN_PATH_POINTS = 11;
export const MAX_PATH_POINTS = 5001;

/**
 * Positions along the path of contact A…E, `n` of them, evenly spaced, with the grid
 * points nearest to B, C and D moved onto them exactly, so every characteristic point is
 * sampled and the count stays n. Returned in ascending order (from T1).
 */
export function samplePath(points: PathPoints, n: number): Float64Array {
  if (!Number.isInteger(n) || n < MIN_PATH_POINTS || n > MAX_PATH_POINTS) {
    throw new EngineInputError('path.points-out-of-range', 'policy.pathPoints', `${MIN_PATH_POINTS}…${MAX_PATH_POINTS}`, `policy.pathPoints = ${n} must be a whole number from ${MIN_PATH_POINTS} to ${MAX_PATH_POINTS}.`);
  }
  const { A, E } = points;
  const s = new Float64Array(n);
  const step = (E - A) / (n - 1);
  for (let i = 0; i < n; i++) s[i] = A + i * step;
  s[n - 1] = E;
  // Move the nearest free interior grid point onto each of B, C and D (at most three are taken).
  const taken = [0, n - 1, -1, -1, -1];
  let count = 2;
  const isTaken = (i: number) => {
    for (let k = 0; k < count; k++) if (taken[k] === i) return true;
    return false;
  };
  let moved = false;
  for (const p of [points.B, points.C, points.D]) {
    if (p <= A || p >= E) continue; // outside the path (εα < 1 is rejected earlier; C may lie outside A–E on odd designs)
    let i = Math.round((p - A) / step);
    for (let k = 0; k < n; k++) {
      const lo = i - k;
      const hi = i + k;
      if (lo > 0 && lo < n - 1 && !isTaken(lo)) { i = lo; break; }
      if (hi > 0 && hi < n - 1 && !isTaken(hi)) { i = hi; break; }
    }
    taken[count++] = i;
    if (s[i] !== p) moved = true;
    s[i] = p;
  }
  // The nearest grid point keeps the order, unless two of B, C, D shared one and one moved further.
  if (moved) {
    for (let i = 1; i < n; i++) {
      if ((s[i] as number) < (s[i - 1] as number)) {
        s.sort();
        break;
      }
    }
  }
  return s;
}
