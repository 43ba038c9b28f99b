import { describe, expect, it } from 'vitest';
import { lambdaGFAtRisk } from '../../../app/engine/micropitting/lambdaGFAtRisk';
import type { PathPoints } from '../../../app/engine/geometry/types';

// Synthetic positions (m) and λGF values: the rule under test is which points count, not a gear.
const pts = (A: number, B: number, C: number, D: number, E: number): PathPoints => ({ A, B, C, D, E }) as unknown as PathPoints;

describe('λGF,min in the area at risk: A…B and D…E, B and D included (ISO/TS 6336-22 [memory])', () => {
  const position = Float64Array.of(0, 1, 2, 3, 4, 5, 6);
  it('skips the single-pair zone between B and D, where the least value may lie', () => {
    const lgf = Float64Array.of(0.9, 0.8, 0.7, 0.1, 0.6, 0.65, 0.95);
    const r = lambdaGFAtRisk(position, lgf, pts(0, 2, 3, 4, 6));
    expect(r).toEqual({ value: 0.6, index: 4, inRegion: true }); // 0.1 at s = 3 lies inside B…D; D itself (0.6) counts
  });
  it('includes B itself', () => {
    const r = lambdaGFAtRisk(position, Float64Array.of(0.9, 0.8, 0.2, 0.1, 0.6, 0.5, 0.95), pts(0, 2, 3, 4, 6));
    expect(r.value).toBe(0.2);
  });
  it('with no two-pair zone sampled (εα ≤ 1: B before A, D after E) it takes the whole path and says so', () => {
    const r = lambdaGFAtRisk(position, Float64Array.of(0.9, 0.8, 0.2, 0.1, 0.6, 0.5, 0.95), pts(0, -1, 3, 7, 6));
    expect(r).toEqual({ value: 0.1, index: 3, inRegion: false });
  });
});
