import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { US_FACTOR, fromDisplay, toDisplay, unitLabel, type QuantityKind } from '../../renderer/units/units';
import { formatInput, parseInput } from '../../renderer/units/format';

const KINDS: QuantityKind[] = ['length', 'roughness', 'film', 'torque', 'power', 'temperature', 'temperatureDifference', 'kinematicViscosity', 'density', 'stress', 'velocity'];

describe('US customary factors', () => {
  it.each([
    ['length', 25.4, 1e-15], // 1 in = 25.4 mm exactly (international yard and pound, 1959)
    ['roughness', 0.0254, 1e-15], // 1 µin = 0.0254 µm exactly (same definition)
    ['torque', 0.1129848290276167, 1e-15], // lbf·in → N·m 1.129 848 E−01 (NIST SP 811, B.9), exact from 0.45359237 kg × 9.80665 m/s² × 0.0254 m
    ['power', 0.7456998715822702, 1e-15], // hp (550 ft·lbf/s) → W 7.456 999 E+02 (NIST SP 811, B.9)
    ['density', 16.01846337396014, 1e-15], // lb/ft³ → kg/m³ 1.601 846 E+01 (NIST SP 811, B.9)
    ['stress', 6.894757293168361, 1e-15], // ksi → Pa 6.894 757 E+06 (NIST SP 811, B.9)
    ['velocity', 0.3048, 1e-15], // ft/s → m/s 3.048 E−01 exactly (NIST SP 811, B.9)
    ['kinematicViscosity', 1, 0], // 1 cSt = 1 mm²/s (NIST SP 811, B.9: centistokes → m²/s 1.0 E−06)
  ] as const)('%s: factor %d', (kind, expected, tol) => {
    expect(Math.abs(US_FACTOR[kind] - expected) / expected).toBeLessThanOrEqual(tol);
  });

  it('temperature: fixed points of the Celsius and Fahrenheit scales', () => {
    expect(toDisplay('temperature', 100, 'us')).toBeCloseTo(212, 12); // water boils at 212 °F (definition of the °F scale)
    expect(toDisplay('temperature', 0, 'us')).toBeCloseTo(32, 12); // water freezes at 32 °F
    expect(toDisplay('temperature', -40, 'us')).toBeCloseTo(-40, 12); // −40 °C = −40 °F, the crossing point
    expect(fromDisplay('temperature', 212, 'us')).toBeCloseTo(100, 12);
  });

  it('a temperature rise of 100 K is 180 °F (1 K = 1.8 °F difference, NIST SP 811 4.2.1.1)', () => {
    expect(toDisplay('temperatureDifference', 100, 'us')).toBeCloseTo(180, 12);
  });

  it('SI is the identity and every kind has a label in both systems', () => {
    for (const k of KINDS) {
      expect(toDisplay(k, 123.456, 'si')).toBe(123.456);
      expect(unitLabel(k, 'si')).not.toBe('');
      expect(unitLabel(k, 'us')).not.toBe('');
    }
    expect(unitLabel('kinematicViscosity', 'us')).toBe('cSt');
    expect(unitLabel('torque', 'us')).toBe('lbf·in');
  });
});

describe('round trip SI → US → SI', () => {
  const value = fc.double({ min: -1e6, max: 1e8, noNaN: true, noDefaultInfinity: true }).filter((v) => Math.abs(v) > 1e-6);
  const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

  it.each(KINDS.filter((k) => k !== 'temperature'))('%s: the converted value converts back to 1e-9 relative', (kind) => {
    fc.assert(
      fc.property(value, (v) => rel(fromDisplay(kind, toDisplay(kind, v, 'us'), 'us'), v) <= 1e-9),
      { numRuns: 500, seed: 20261201 },
    );
  });

  // A temperature scale has an offset (0 °C is not "no temperature"): relative to the absolute temperature.
  it('temperature: the converted value converts back to 1e-9 of the absolute temperature', () => {
    fc.assert(
      fc.property(fc.double({ min: -273, max: 1e4, noNaN: true }), (c) => Math.abs(fromDisplay('temperature', toDisplay('temperature', c, 'us'), 'us') - c) / (c + 273.15) <= 1e-9),
      { numRuns: 500, seed: 20261201 },
    );
  });

  it.each(KINDS.filter((k) => k !== 'temperature'))('%s: through the text shown in the box and back to 1e-9 relative', (kind) => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e7, noNaN: true }), (v) => {
        const shown = formatInput(toDisplay(kind, v, 'us'));
        return rel(fromDisplay(kind, parseInput(shown), 'us'), v) <= 1e-9;
      }),
      { numRuns: 500, seed: 20261201 },
    );
  });

  // A temperature scale has an offset, so "relative" is taken on the absolute (kelvin) temperature.
  it('temperature: through the text shown in the box and back to 1e-9 of the absolute temperature', () => {
    fc.assert(
      fc.property(fc.double({ min: -40, max: 200, noNaN: true }), (c) => {
        const back = fromDisplay('temperature', parseInput(formatInput(toDisplay('temperature', c, 'us'))), 'us');
        return Math.abs(back - c) / (c + 273.15) <= 1e-9;
      }),
      { numRuns: 500, seed: 20261201 },
    );
  });
});

describe('input text', () => {
  it('parses decimals, a comma decimal mark and exponents, and rejects the rest', () => {
    expect(parseInput('12.5')).toBe(12.5);
    expect(parseInput(' 12,5 ')).toBe(12.5);
    expect(parseInput('1e3')).toBe(1000);
    expect(parseInput('−4')).toBe(-4);
    expect(parseInput('')).toBeNaN();
    expect(parseInput('12a')).toBeNaN();
    expect(parseInput('1.2.3')).toBeNaN();
  });
  it('formats without trailing zeros', () => {
    expect(formatInput(70)).toBe('70');
    expect(formatInput(0.3)).toBe('0.3');
    expect(formatInput(70 / 25.4)).toBe('2.755905512');
    expect(formatInput(undefined)).toBe('');
  });
});
