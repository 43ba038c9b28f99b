import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../app/engine/diagnostics';
import { ISO_VG_GRADES, ISO_VG_LIMITS, isoViscosityGrade } from '../../app/engine/oil/isoGrade';
import { centistokes, toCentistokes } from '../../app/engine/units';

// ISO 3448, Industrial liquid lubricants — ISO viscosity classification.

const grade = (kv40: number) => isoViscosityGrade(centistokes(kv40));

describe('ISO 3448 grades', () => {
  it('has the twenty grades VG 2 … VG 3200', () => {
    expect([...ISO_VG_GRADES]).toEqual([2, 3, 5, 7, 10, 15, 22, 32, 46, 68, 100, 150, 220, 320, 460, 680, 1000, 1500, 2200, 3200]); // ISO 3448 Table 1
  });

  it.each([
    [2, 1.98, 2.42], // ISO 3448 Table 1 [memory]: mid-point 2.2
    [3, 2.88, 3.52], // ISO 3448 Table 1 [memory]: mid-point 3.2
    [5, 4.14, 5.06], // ISO 3448 Table 1 [memory]: mid-point 4.6
    [7, 6.12, 7.48], // ISO 3448 Table 1 [memory]: mid-point 6.8
    [10, 9, 11], // ISO 3448 Table 1
    [32, 28.8, 35.2], // ISO 3448 Table 1
    [220, 198, 242], // ISO 3448 Table 1
    [3200, 2880, 3520], // ISO 3448 Table 1
  ])('VG %s spans %s…%s mm²/s at 40 °C', (g, min, max) => {
    const row = ISO_VG_LIMITS.find((r) => r.grade === g);
    expect(row).toBeDefined();
    expect(toCentistokes(row!.min)).toBeCloseTo(min, 9);
    expect(toCentistokes(row!.max)).toBeCloseTo(max, 9);
    expect(grade(min)).toBe(g);
    expect(grade(max)).toBe(g);
  });

  it('every grade is ±10 % of its mid-point', () => {
    for (const r of ISO_VG_LIMITS) {
      expect(r.min / r.midpoint).toBeCloseTo(0.9, 3); // ISO 3448: limits ±10 %
      expect(r.max / r.midpoint).toBeCloseTo(1.1, 3); // ISO 3448: limits ±10 %
    }
  });

  it.each([
    [220, 220], // ISO 3448: mid-point of VG 220
    [245, null], // ISO 3448: between VG 220 (≤ 242) and VG 320 (≥ 288)
    [197.9, null], // ISO 3448: below VG 220 (≥ 198), above VG 150 (≤ 165)
    [288, 320], // ISO 3448: lower limit of VG 320
    [1.5, null], // ISO 3448: below VG 2
    [4000, null], // ISO 3448: above VG 3200
  ])('KV40 %s mm²/s → %s', (kv40, g) => {
    expect(grade(kv40)).toBe(g);
  });

  it('a non-positive KV40 is an input error naming the field', () => {
    expect(() => isoViscosityGrade(centistokes(0), 'oils[1].kv40_mm2s')).toThrow(EngineInputError);
    expect(() => isoViscosityGrade(centistokes(-5), 'oils[1].kv40_mm2s')).toThrow(/oils\[1\]\.kv40_mm2s/);
  });
});
