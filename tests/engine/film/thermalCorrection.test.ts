import { describe, expect, it } from 'vitest';
import { EngineInputError, WarningSink } from '../../../app/engine/diagnostics';
import { murchWilsonThermalFactor } from '../../../app/engine/film/thermalCorrection';
import type { MetresPerSecond, PascalSeconds, PerKelvin, WattsPerMetreKelvin } from '../../../app/engine/units';

const beta = (v: number) => v as PerKelvin;
const eta = (v: number) => v as PascalSeconds;
const ms = (v: number) => v as MetresPerSecond;

describe('Murch–Wilson inlet shear heating φT = 3.94/(3.94 + L^0.62), L = β η0 ū²/k_f (Murch & Wilson 1975 [memory])', () => {
  it('L = 0 (no speed) gives 1; L = 1 gives 3.94/4.94 = 0.7976', () => {
    expect(murchWilsonThermalFactor(beta(0.05), eta(0.1), ms(0))).toBe(1);
    // β 0.05 1/K, η0 0.1 Pa·s, ū = √26 m/s, k_f 0.13 W/(m·K) → L = 0.05·0.1·26/0.13 = 1
    expect(murchWilsonThermalFactor(beta(0.05), eta(0.1), ms(Math.sqrt(26)))).toBeCloseTo(3.94 / 4.94, 12);
  });

  it('FZG A pitch point, stage 9 (ū 3.18 m/s, η0 12 mPa·s, β 0.03 1/K assumed for mineral oil near 90 °C): L 0.028, φT 0.973', () => {
    expect(murchWilsonThermalFactor(beta(0.03), eta(0.012), ms(3.1819))).toBeCloseTo(0.9731, 4); // arithmetic
  });

  it('uses the MEAN entrainment velocity and k_f 0.13 W/(m·K) by default; speed sign does not matter', () => {
    const k = 0.13 as WattsPerMetreKelvin;
    expect(murchWilsonThermalFactor(beta(0.04), eta(0.05), ms(10))).toBe(murchWilsonThermalFactor(beta(0.04), eta(0.05), ms(10), k));
    expect(murchWilsonThermalFactor(beta(0.04), eta(0.05), ms(-10))).toBe(murchWilsonThermalFactor(beta(0.04), eta(0.05), ms(10)));
    expect(murchWilsonThermalFactor(beta(0.04), eta(0.05), ms(20))).toBeLessThan(murchWilsonThermalFactor(beta(0.04), eta(0.05), ms(10)));
  });

  it('warns above L = 10 (fit range [memory, weak]) and throws on negative β', () => {
    const sink = new WarningSink();
    const phi = murchWilsonThermalFactor(beta(0.05), eta(0.5), ms(30), undefined, sink); // L ≈ 173
    expect(phi).toBeGreaterThan(0);
    expect(sink.items[0]).toMatchObject({ code: 'film.thermal-loading-range', field: 'L' });
    expect(() => murchWilsonThermalFactor(beta(-0.01), eta(0.05), ms(1))).toThrow(EngineInputError);
  });
});
