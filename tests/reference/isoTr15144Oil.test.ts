import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../app/engine/diagnostics';
import { oilDensity } from '../../app/engine/oil/density';
import { alpha38Default, pressureViscosityAt } from '../../app/engine/oil/pressureViscosity';
import { celsiusToKelvin, si, toPerGigapascal } from '../../app/engine/units';
import type { KilogramsPerCubicMetre, PascalSeconds, PerPascal } from '../../app/engine/units';

// ISO/TR 15144-1 (micropitting, oil properties). Every form here is recalled, not read: [memory].

const rho15 = si<KilogramsPerCubicMetre>(880);

describe('ISO/TR 15144-1 density ρ(θ) = ρ15 − 0.7 (θ − 15) [memory]', () => {
  it.each([
    [15, 880], // ISO/TR 15144-1 form [memory]: ρ15 itself
    [40, 862.5], // ISO/TR 15144-1 form [memory]: 880 − 0.7·25
    [100, 820.5], // ISO/TR 15144-1 form [memory]: 880 − 0.7·85
    [-40, 918.5], // ISO/TR 15144-1 form [memory]: 880 + 0.7·55
  ])('at %s °C: %s kg/m³', (theta, rho) => {
    expect(oilDensity(rho15, celsiusToKelvin(theta))).toBeCloseTo(rho, 9);
  });

  it('a density that would not be positive is an input error naming the field', () => {
    // 0.88 entered in g/cm³ instead of kg/m³: negative above about 16 °C
    expect(() => oilDensity(si<KilogramsPerCubicMetre>(0.88), celsiusToKelvin(100), 'oils[0].density15_kgm3')).toThrow(EngineInputError);
    expect(() => oilDensity(si<KilogramsPerCubicMetre>(0.88), celsiusToKelvin(100), 'oils[0].density15_kgm3')).toThrow(/oils\[0\]\.density15_kgm3/);
    expect(() => oilDensity(si<KilogramsPerCubicMetre>(0), celsiusToKelvin(15))).toThrow(EngineInputError);
  });
});

describe('ISO/TR 15144-1 pressure–viscosity coefficient of mineral oil [memory]', () => {
  it('α38 = 2.657e−8 · η38^0.1348 with η38 in Pa·s', () => {
    // A VG 100 mineral oil: ν38 ≈ 110 mm²/s, ρ ≈ 0.88 → η38 ≈ 0.0968 Pa·s.
    const a = alpha38Default('mineral', si<PascalSeconds>(0.0968));
    expect(toPerGigapascal(a.alpha38)).toBeCloseTo(19.4, 1); // METHODS §5 arithmetic: "about 19 GPa⁻¹" for VG 100 [memory]
    expect(toPerGigapascal(alpha38Default('mineral', si<PascalSeconds>(1)).alpha38)).toBeCloseTo(26.57, 9); // ISO/TR 15144-1 [memory]: k at η38 = 1 Pa·s
    expect(a.warning).toBeNull();
  });

  it.each([
    [38, 1], // ISO/TR 15144-1 form [memory]: reference temperature 311 K
    [40, 0.989398], // 1 + 516 (1/313 − 1/311)
    [100, 0.724214], // 1 + 516 (1/373 − 1/311)
    [200, 0.431745], // 1 + 516 (1/473 − 1/311)
    [-40, 1.555428], // 1 + 516 (1/233 − 1/311)
  ])('α(%s °C)/α38 = %s', (theta, ratio) => {
    const alpha38 = si<PerPascal>(20e-9);
    expect(pressureViscosityAt(alpha38, celsiusToKelvin(theta)) / alpha38).toBeCloseTo(ratio, 5);
  });
});
