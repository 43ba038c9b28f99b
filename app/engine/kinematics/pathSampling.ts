import { EngineInputError } from '../diagnostics';
import type { Metres } from '../units';
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
  const taken = new Set<number>([0, n - 1]);
  for (const p of [points.B, points.C, points.D]) {
    if (p <= A || p >= E) continue; // outside the path (εα < 1 is rejected earlier; C may lie outside A–E on odd designs)
    let i = Math.round((p - A) / step);
    // nearest free interior index, searching outwards
    for (let k = 0; k < n; k++) {
      const lo = i - k;
      const hi = i + k;
      if (lo > 0 && lo < n - 1 && !taken.has(lo)) { i = lo; break; }
      if (hi > 0 && hi < n - 1 && !taken.has(hi)) { i = hi; break; }
    }
    taken.add(i);
    s[i] = p;
  }
  s.sort();
  return s;
}

/** Index of the sample nearest to `position` (the samples are sorted). */
export function nearestIndex(samples: Float64Array, position: Metres): number {
  let best = 0;
  let bestDist = Infinity;
  for (let i = 0; i < samples.length; i++) {
    const d = Math.abs((samples[i] as number) - position);
    if (d < bestDist) { bestDist = d; best = i; }
  }
  return best;
}
