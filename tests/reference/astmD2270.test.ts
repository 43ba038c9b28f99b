import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../app/engine/diagnostics';
import { d2270BasicValues, kv100ForViscosityIndex, viscosityIndex } from '../../app/engine/oil/viscosityIndex';
import { centistokes, toCentistokes } from '../../app/engine/units';

// ASTM D2270-10, Standard Practice for Calculating Viscosity Index from Kinematic Viscosity at 40 and 100 °C.

const vi = (kv40: number, kv100: number) => viscosityIndex(centistokes(kv40), centistokes(kv100), 'oils[0]');

describe('ASTM D2270 worked examples', () => {
  it('procedure A: KV40 73.30, KV100 8.86', () => {
    const r = vi(73.3, 8.86);
    expect(toCentistokes(r.l)).toBeCloseTo(119.94, 6); // ASTM D2270 worked example: L = 119.94
    expect(toCentistokes(r.h)).toBeCloseTo(69.48, 6); // ASTM D2270 worked example: H = 69.48
    expect(r.procedure).toBe('A');
    expect(r.value).toBe(92); // ASTM D2270 worked example: VI = 92
    expect(r.unrounded).toBeGreaterThan(91.5);
    expect(r.unrounded).toBeLessThan(92.5);
  });

  it('procedure B: KV40 22.83, KV100 5.05', () => {
    const r = vi(22.83, 5.05);
    // ASTM D2270 worked example: H = 28.97 (printed to 0.01; the table rows 5.0 → 28.49 and 5.1 → 29.46 interpolate to 28.975)
    expect(Math.abs(toCentistokes(r.h) - 28.97)).toBeLessThanOrEqual(0.0051);
    expect(r.procedure).toBe('B');
    expect(r.value).toBe(156); // ASTM D2270 worked example: VI = 156
  });
});

describe('ASTM D2270 basic values L and H', () => {
  it.each([
    [2, 7.994, 6.394], // ASTM D2270 Table 1, first row
    [8.8, 118.5, 68.79], // ASTM D2270 Table 1
    [20, 493.2, 229.5], // ASTM D2270 Table 1 (last 0.1-step row)
    [70, 4905, 1558], // ASTM D2270 Table 1, last row
  ])('Y = %s mm²/s → L %s, H %s', (y, l, h) => {
    const r = d2270BasicValues(centistokes(y));
    expect(toCentistokes(r.l)).toBeCloseTo(l, 6);
    expect(toCentistokes(r.h)).toBeCloseTo(h, 6);
  });

  it('above 70 mm²/s uses L = 0.8353Y² + 14.67Y − 216, H = 0.1684Y² + 11.85Y − 97', () => {
    const r = d2270BasicValues(centistokes(100));
    expect(toCentistokes(r.l)).toBeCloseTo(9604, 6); // ASTM D2270 formula at Y = 100: 8353 + 1467 − 216
    expect(toCentistokes(r.h)).toBeCloseTo(2772, 6); // ASTM D2270 formula at Y = 100: 1684 + 1185 − 97
  });

  it('the formulas meet the table at 70 mm²/s within 0.1 %', () => {
    const table = d2270BasicValues(centistokes(70));
    const formula = d2270BasicValues(centistokes(70.000001));
    expect(Math.abs(formula.l / table.l - 1)).toBeLessThan(1e-3); // ASTM D2270: 4905 (table) against 4903.9 (formula)
    expect(Math.abs(formula.h / table.h - 1)).toBeLessThan(1e-3); // ASTM D2270: 1558 (table) against 1557.7 (formula)
  });

  it('interpolates linearly between rows', () => {
    const r = d2270BasicValues(centistokes(8.85));
    expect(toCentistokes(r.l)).toBeCloseTo((118.5 + 120.9) / 2, 9); // ASTM D2270 Table 1 rows 8.8 and 8.9, linear
  });
});

describe('ASTM D2270 definitions', () => {
  it('an oil whose KV40 equals L has VI 0, one whose KV40 equals H has VI 100', () => {
    expect(vi(118.5, 8.8).unrounded).toBeCloseTo(0, 9); // ASTM D2270: L is the KV40 of a VI 0 oil
    expect(vi(68.79, 8.8).unrounded).toBeCloseTo(100, 9); // ASTM D2270: H is the KV40 of a VI 100 oil
  });

  it('procedures A and B meet at VI 100', () => {
    const a = vi(68.79 * (1 + 1e-9), 8.8);
    const b = vi(68.79 * (1 - 1e-9), 8.8);
    expect(a.procedure).toBe('A');
    expect(b.procedure).toBe('B');
    expect(Math.abs(a.unrounded - b.unrounded)).toBeLessThan(1e-5); // ASTM D2270: both give 100 at U = H
  });

  it('KV100 below 2 mm²/s is outside the standard', () => {
    expect(() => vi(8, 1.9)).toThrow(EngineInputError);
    try {
      vi(8, 1.9);
    } catch (e) {
      expect((e as EngineInputError).field).toBe('oils[0].kv100_mm2s');
      expect((e as EngineInputError).limit).toContain('2 mm²/s');
    }
  });
});

describe('KV100 for a given VI (inverse of D2270)', () => {
  it('recovers the worked example', () => {
    const target = vi(73.3, 8.86).unrounded;
    expect(toCentistokes(kv100ForViscosityIndex(centistokes(73.3), target))).toBeCloseTo(8.86, 8); // ASTM D2270 worked example
    const targetB = vi(22.83, 5.05).unrounded;
    expect(toCentistokes(kv100ForViscosityIndex(centistokes(22.83), targetB))).toBeCloseTo(5.05, 8); // ASTM D2270 worked example
  });

  it('fails, naming the field, when no KV100 ≥ 2 mm²/s gives the VI', () => {
    expect(() => kv100ForViscosityIndex(centistokes(2.2), 95, 'grade')).toThrow(/grade\.viscosityIndex/);
  });
});
