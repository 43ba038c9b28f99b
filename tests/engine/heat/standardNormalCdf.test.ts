import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../../app/engine/diagnostics';
import { standardNormalCdf } from '../../../app/engine/heat/standardNormalCdf';

describe('standard normal Φ (Numerical Recipes erfcc, |relative error| < 1.2e-7)', () => {
  // Values from standard normal tables (e.g. Abramowitz & Stegun, Table 26.1).
  it.each([
    [0, 0.5],
    [1, 0.8413447],
    [-1, 0.1586553],
    [1.96, 0.9750021],
    [-1.96, 0.0249979],
    [3, 0.9986501],
    [-3, 0.0013499],
  ])('Φ(%f) = %f', (x, p) => {
    expect(standardNormalCdf(x)).toBeCloseTo(p, 6);
  });

  it('keeps relative accuracy in the far tail: Φ(−6) = 9.866e-10', () => {
    expect(standardNormalCdf(-6) / 9.8659e-10).toBeCloseTo(1, 4);
  });

  it('is symmetric, monotone and bounded', () => {
    let prev = 0;
    for (let x = -8; x <= 8; x += 0.05) {
      const p = standardNormalCdf(x);
      expect(p + standardNormalCdf(-x)).toBeCloseTo(1, 7);
      expect(p).toBeGreaterThanOrEqual(prev);
      prev = p;
    }
    expect(standardNormalCdf(Infinity)).toBe(1);
    expect(standardNormalCdf(-Infinity)).toBe(0);
    expect(() => standardNormalCdf(Number.NaN)).toThrow(EngineInputError);
  });
});
