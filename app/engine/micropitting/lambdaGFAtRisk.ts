import type { PathPoints } from '../geometry/types';

export interface LambdaGFAtRisk {
  readonly value: number;
  /** Index of the least value in the arrays. */
  readonly index: number;
  /** False when the path has no point outside B…D (εα ≤ 1): the least value over the whole path is used. */
  readonly inRegion: boolean;
}

/**
 * The least λGF in the area at risk of micropitting: the zones of two-pair contact at the
 * flank roots and tips, A…B and D…E (points with s ≤ B or s ≥ D, B and D included), as ISO/TS 6336-22
 * takes λGF,min [memory]. Where no sampled point lies there (εα ≤ 1 leaves no two-pair zone),
 * the whole path is used and `inRegion` says so.
 *
 * @param position - positions from T1, m (as mesh/mechanics samples them)
 * @param lambdaGF - λGF at each position
 * @param points - A…E on the line of action, m
 * Source: ISO/TS 6336-22:2018, λGF,min [memory].
 */
export function lambdaGFAtRisk(position: Float64Array, lambdaGF: Float64Array, points: PathPoints): LambdaGFAtRisk {
  let best = Infinity;
  let index = 0;
  let any = false;
  for (let i = 0; i < position.length; i++) {
    const s = position[i] as number;
    if (s > points.B && s < points.D) continue;
    const v = lambdaGF[i] as number;
    any = true;
    if (v < best) {
      best = v;
      index = i;
    }
  }
  if (any) return { value: best, index, inRegion: true };
  for (let i = 0; i < lambdaGF.length; i++) {
    const v = lambdaGF[i] as number;
    if (v < best) {
      best = v;
      index = i;
    }
  }
  return { value: best, index, inRegion: false };
}
