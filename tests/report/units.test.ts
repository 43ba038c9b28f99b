import { describe, expect, it } from 'vitest';
import { niceNumber, niceTicks, tickLabel } from '../../app/report/niceTicks';
import { DASH, formatNumber, formatPercent, unitsFor } from '../../app/report/units';

describe('niceTicks (Heckbert, "Nice numbers for graph labels", Graphics Gems 1990)', () => {
  it('niceNumber rounds to 1, 2, 5 × 10ⁿ', () => {
    expect(niceNumber(0.7, true)).toBe(0.5); // 0.7 < 7×10⁻¹ → 5×10⁻¹ (Heckbert's rounding thresholds 1.5, 3, 7)
    expect(niceNumber(2.9, true)).toBe(2);
    expect(niceNumber(3.1, false)).toBe(5); // ceiling form
    expect(niceNumber(1234, false)).toBe(2000);
  });
  it('covers the data with whole steps and a step of 1, 2 or 5 × 10ⁿ', () => {
    for (const [lo, hi] of [
      [0, 1318.42],
      [9.06, 28.02],
      [0.0328, 0.205],
      [-3.7, 12.1],
      [95.5, 190.25],
    ] as const) {
      const t = niceTicks(lo, hi, 5);
      expect(t.min).toBeLessThanOrEqual(lo);
      expect(t.max).toBeGreaterThanOrEqual(hi);
      const mant = t.step / 10 ** Math.floor(Math.log10(t.step));
      expect([1, 2, 5]).toContain(Math.round(mant * 1e9) / 1e9);
      expect(t.values.length).toBeGreaterThanOrEqual(3);
      expect(t.values.length).toBeLessThanOrEqual(8);
      for (let i = 1; i < t.values.length; i++) expect(t.values[i]! - t.values[i - 1]!).toBeCloseTo(t.step, 9);
    }
  });
  it('0 to 1318 MPa gives 0, 500, 1000, 1500', () => {
    expect(niceTicks(0, 1318.42, 5).values).toEqual([0, 500, 1000, 1500]);
  });
  it('a flat or reversed range is widened, a non-finite one becomes 0…1', () => {
    const flat = niceTicks(5, 5);
    expect(flat.min).toBeLessThan(5);
    expect(flat.max).toBeGreaterThan(5);
    expect(niceTicks(10, 0).min).toBe(0);
    expect(niceTicks(NaN, 3)).toMatchObject({ min: 0, max: 1 });
  });
  it('labels carry the decimals of the step, with a true minus sign', () => {
    expect(tickLabel(0.30000000000000004, 0.1)).toBe('0.3');
    expect(tickLabel(-5, 5)).toBe('−5');
    expect(tickLabel(1500, 500)).toBe('1500');
  });
});

describe('formatNumber', () => {
  it('never prints NaN: null, undefined, NaN and ±Infinity print as a dash', () => {
    for (const x of [null, undefined, NaN, Infinity, -Infinity]) expect(formatNumber(x)).toBe(DASH);
    expect(formatPercent(null)).toBe(DASH);
    expect(unitsFor('si').fmt(null, 'stress')).toBe(DASH);
  });
  it('gives significant figures, no trailing zeros, a true minus', () => {
    expect(formatNumber(1318.4208, 4)).toBe('1318');
    expect(formatNumber(0.18513, 3)).toBe('0.185');
    expect(formatNumber(1.5, 4)).toBe('1.5');
    expect(formatNumber(-0.72300043, 3)).toBe('−0.723');
    expect(formatNumber(2.5e-9, 3)).toBe('2.5×10⁻⁹');
  });
});

describe('US customary units (NIST SP 811, Appendix B)', () => {
  const us = unitsFor('us');
  it('converts with the exact definitions', () => {
    expect(us.value(25.4, 'length')).toBeCloseTo(1, 12); // 1 in = 25.4 mm exactly
    expect(us.value(100, 'temperature')).toBeCloseTo(212, 12); // °F = 1.8 °C + 32
    expect(us.value(10, 'temperatureRise')).toBeCloseTo(18, 12);
    expect(us.value(6.894757293168, 'stress')).toBeCloseTo(1, 9); // 1 ksi = 6.894757 MPa
    expect(us.value(0.745699872, 'power')).toBeCloseTo(1, 8); // 1 hp = 745.69987 W
    expect(us.value(1.3558179483314, 'torque')).toBeCloseTo(1, 12); // 1 lbf·ft = 1.3558179 N·m
    expect(us.value(1, 'velocity')).toBeCloseTo(196.850394, 5); // 1 m/s = 196.85 ft/min
    expect(us.value(206, 'modulus')).toBeCloseTo(29.878, 3); // 206 GPa in Msi
  });
  it('labels the units', () => {
    expect(us.fmt(100, 'temperature')).toBe('212 °F');
    expect(unitsFor('si').fmt(20, 'angle')).toBe('20°');
  });
});
