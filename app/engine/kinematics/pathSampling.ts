import { EngineInputError } from '../diagnostics';
import type { PathPoints } from '../geometry/types';

export const MIN_PATH_POINTS = 11;
export const MAX_PATH_POINTS = 5001;

/** The number of path points, checked: a whole number from MIN_PATH_POINTS to MAX_PATH_POINTS. */
export function requirePathPoints(n: number): number {
  if (!Number.isInteger(n) || n < MIN_PATH_POINTS || n > MAX_PATH_POINTS) {
    throw new EngineInputError('path.points-out-of-range', 'policy.pathPoints', `${MIN_PATH_POINTS}…${MAX_PATH_POINTS}`, `policy.pathPoints = ${n} must be a whole number from ${MIN_PATH_POINTS} to ${MAX_PATH_POINTS}.`);
  }
  return n;
}

/**
 * Positions along the path of contact A…E, `n` of them, evenly spaced, with the grid
 * points nearest to B, C and D moved onto them exactly, so every characteristic point is
 * sampled and the count stays n. Returned in ascending order (from T1), in `out` when given.
 */
export function samplePath(points: PathPoints, n: number, out?: Float64Array): Float64Array {
  requirePathPoints(n);
  if (out !== undefined && out.length !== n) throw new RangeError(`samplePath: room for ${out.length} positions, ${n} asked`);
  const { A, E } = points;
  const s = out ?? new Float64Array(n);
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
