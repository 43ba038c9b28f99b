import { describe, expect, it } from 'vitest';
import { luFactor, luSolve } from '../../../app/engine/ehl/denseSolve';

describe('dense LU with partial pivoting', () => {
  it('solves a system that needs row swaps, and the factors solve a second right-hand side', () => {
    // A = [[0, 2, 1], [1, 1, 1], [2, 1, 0]]; x = (1, 2, 3) gives b = (0·1 + 2·2 + 3, 1 + 2 + 3, 2 + 2 + 0) = (7, 6, 4)
    const a = Float64Array.from([0, 2, 1, 1, 1, 1, 2, 1, 0]);
    const piv = new Int32Array(3);
    expect(luFactor(a, piv, 3)).toBe(true);
    const b = Float64Array.from([7, 6, 4]);
    expect(luSolve(a, piv, b, 3)).toBe(true);
    expect([...b].map((v) => Math.round(v * 1e12) / 1e12)).toEqual([1, 2, 3]);
    // x = (−1, 0, 2): b = (0 + 0 + 2, −1 + 0 + 2, −2 + 0 + 0) = (2, 1, −2)
    const c = Float64Array.from([2, 1, -2]);
    expect(luSolve(a, piv, c, 3)).toBe(true);
    expect([...c].map((v) => Math.round(v * 1e12) / 1e12)).toEqual([-1, 0, 2]);
  });

  it('says so for a singular matrix instead of returning NaN', () => {
    const a = Float64Array.from([1, 2, 2, 4]);
    expect(luFactor(a, new Int32Array(2), 2)).toBe(false);
  });
});
