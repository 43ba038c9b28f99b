import { describe, expect, it } from 'vitest';
import { contourSegments } from '../../../app/engine/sweep/contour';

describe('contour (marching squares)', () => {
  it('the level line of a linear field x + y = 3 passes through the interpolated edge points', () => {
    const segs = contourSegments(5, 5, (r, c) => r + c, 3);
    expect(segs.length).toBeGreaterThan(0);
    for (const s of segs) {
      expect(s.c0 + s.r0).toBeCloseTo(3, 12);
      expect(s.c1 + s.r1).toBeCloseTo(3, 12);
    }
  });
  it('no line when the field is all above or all below; +∞ counts as above', () => {
    expect(contourSegments(4, 4, () => 5, 3)).toHaveLength(0);
    expect(contourSegments(4, 4, () => Infinity, 3)).toHaveLength(0);
    expect(contourSegments(3, 3, (r) => (r === 0 ? Infinity : 1), 3).length).toBe(2);
  });
});
