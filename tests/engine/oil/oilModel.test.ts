import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../../app/engine/diagnostics';
import type { OilData } from '../../../app/engine/oil/oilModel';
import { makeOilModel } from '../../../app/engine/oil/oilModel';
import { celsiusToKelvin, centistokes, kelvin, perGigapascal, si, toCentistokes } from '../../../app/engine/units';
import type { KilogramsPerCubicMetre } from '../../../app/engine/units';

// The D2270 worked-example oil (KV40 73.30, KV100 8.86 → VI 92) as a mineral oil of 875 kg/m³.
const base: OilData = {
  kv40: centistokes(73.3),
  kv100: centistokes(8.86),
  density15: si<KilogramsPerCubicMetre>(875),
  baseOil: 'mineral',
};

function inputError(fn: () => unknown): EngineInputError {
  try {
    fn();
  } catch (e) {
    if (e instanceof EngineInputError) return e;
    throw e;
  }
  throw new Error('expected an EngineInputError');
}

describe('makeOilModel', () => {
  const m = makeOilModel(base, 'oils[0]');

  it('reproduces the data sheet and derives VI and grade', () => {
    expect(toCentistokes(m.kinematicViscosity(celsiusToKelvin(40)))).toBeCloseTo(73.3, 8); // input KV40
    expect(toCentistokes(m.kinematicViscosity(celsiusToKelvin(100)))).toBeCloseTo(8.86, 8); // input KV100
    expect(m.viscosityIndex).toEqual({ value: 92, source: 'ASTM D2270' }); // ASTM D2270 worked example
    expect(m.isoVG).toBe(68); // ISO 3448: 61.2…74.8 mm²/s
    expect(m.lubricantFactor).toBe(1.0); // ISO/TS 6336-20 [memory]: mineral
    expect(m.warnings).toEqual([]);
  });

  it('η = ν ρ and ρ follows the linear law', () => {
    const t = celsiusToKelvin(70);
    expect(m.density(t)).toBeCloseTo(875 - 0.7 * 55, 9); // ISO/TR 15144-1 form [memory]
    expect(m.dynamicViscosity(t)).toBeCloseTo(m.kinematicViscosity(t) * m.density(t), 15);
  });

  it('β = −(1/η) dη/dT matches a central difference of η(T)', () => {
    for (const theta of [-30, 0, 40, 80, 120, 190]) {
      const t = celsiusToKelvin(theta);
      const h = 1e-3;
      const eta = (x: number) => m.dynamicViscosity(kelvin(x));
      const numeric = -(eta(t + h) - eta(t - h)) / (2 * h) / eta(t);
      expect(m.temperatureViscosity(t) / numeric - 1).toBeCloseTo(0, 6);
    }
  });

  it('β of a VG 68 mineral oil at 40 °C is a few percent per kelvin', () => {
    const beta = m.temperatureViscosity(celsiusToKelvin(40));
    expect(beta).toBeGreaterThan(0.03); // common practice: mineral oils 0.03–0.07 1/K near 40 °C
    expect(beta).toBeLessThan(0.07); // common practice
  });
});

describe('makeOilModel input checks', () => {
  it.each([
    [{ kv100: centistokes(80) }, 'oils[1].kv100_mm2s'], // KV100 ≥ KV40
    [{ kv100: centistokes(73.3) }, 'oils[1].kv100_mm2s'], // KV100 = KV40
    [{ kv40: centistokes(0) }, 'oils[1].kv40_mm2s'],
    [{ kv40: centistokes(-10) }, 'oils[1].kv40_mm2s'],
    [{ kv100: centistokes(0) }, 'oils[1].kv100_mm2s'],
    [{ kv100: centistokes(-1) }, 'oils[1].kv100_mm2s'],
    [{ kv40: centistokes(Number.NaN) }, 'oils[1].kv40_mm2s'],
    [{ density15: si<KilogramsPerCubicMetre>(0) }, 'oils[1].density15_kgm3'],
    [{ density15: si<KilogramsPerCubicMetre>(-875) }, 'oils[1].density15_kgm3'],
    [{ density15: si<KilogramsPerCubicMetre>(0.875) }, 'oils[1].density15_kgm3'], // g/cm³ slip: not positive at 200 °C
    [{ kv40: centistokes(6), kv100: centistokes(1.9) }, 'oils[1].kv100_mm2s'], // below ASTM D2270 without a data-sheet VI
    [{ viscosityIndex: Number.NaN }, 'oils[1].viscosityIndex'],
    [{ pressureViscosity: perGigapascal(0) }, 'oils[1].pressureViscosity_1perGPa'],
    [{ pressureViscosity: perGigapascal(-20) }, 'oils[1].pressureViscosity_1perGPa'],
  ] as [Partial<OilData>, string][])('%o → error on %s', (patch, field) => {
    const e = inputError(() => makeOilModel({ ...base, ...patch }, 'oils[1]'));
    expect(e.field).toBe(field);
    expect(e.message).toContain(field);
  });

  it('temperatures outside −40…200 °C are errors naming the temperature field', () => {
    const m = makeOilModel(base, 'oils[0]');
    for (const theta of [-40.5, 200.5, Number.NaN]) {
      const t = celsiusToKelvin(theta);
      for (const call of [m.kinematicViscosity, m.dynamicViscosity, m.density, m.pressureViscosity, m.temperatureViscosity]) {
        const e = inputError(() => call(t, 'loadCases[2].oilTemperature_C'));
        expect(e.field).toBe('loadCases[2].oilTemperature_C');
        expect(e.limit).toBe('-40 °C…200 °C');
      }
    }
    expect(inputError(() => m.kinematicViscosity(celsiusToKelvin(250))).field).toBe('oils[0].temperature');
    expect(() => m.kinematicViscosity(celsiusToKelvin(-40))).not.toThrow();
    expect(() => m.kinematicViscosity(celsiusToKelvin(200))).not.toThrow();
  });

  it('narrows the range where ν would pass 2e7 mm²/s (ASTM D341 range [memory])', () => {
    const heavy = makeOilModel({ ...base, kv40: centistokes(3200), kv100: centistokes(101.6) }, 'oils[0]');
    expect(heavy.temperatureRange.min).toBeGreaterThan(celsiusToKelvin(-40));
    expect(toCentistokes(heavy.kinematicViscosity(heavy.temperatureRange.min))).toBeCloseTo(2e7, -1);
    expect(() => heavy.kinematicViscosity(celsiusToKelvin(-40))).toThrow(EngineInputError);
  });
});

describe('makeOilModel data-sheet VI', () => {
  it('within 2 points: computed VI, no warning', () => {
    const m = makeOilModel({ ...base, viscosityIndex: 94 }, 'oils[0]');
    expect(m.viscosityIndex).toEqual({ value: 92, source: 'ASTM D2270' });
    expect(m.warnings).toEqual([]);
  });

  it('more than 2 points apart: computed VI and oil.vi-mismatch', () => {
    const m = makeOilModel({ ...base, viscosityIndex: 95 }, 'oils[0]');
    expect(m.viscosityIndex).toEqual({ value: 92, source: 'ASTM D2270' });
    expect(m.warnings.map((w) => [w.code, w.field])).toEqual([['oil.vi-mismatch', 'oils[0].viscosityIndex']]);
  });

  it('below KV100 2 mm²/s the data-sheet VI is used, with a note', () => {
    const m = makeOilModel({ ...base, kv40: centistokes(6), kv100: centistokes(1.9), viscosityIndex: 100 }, 'oils[0]');
    expect(m.viscosityIndex).toEqual({ value: 100, source: 'data sheet' });
    expect(m.warnings.map((w) => w.code)).toContain('oil.vi-from-data-sheet');
  });

  it('ester: XL 1.0 with its warning', () => {
    const m = makeOilModel({ ...base, baseOil: 'ester' }, 'oils[3]');
    expect(m.lubricantFactor).toBe(1.0);
    expect(m.warnings.find((w) => w.code === 'oil.lubricant-factor-untabulated')?.field).toBe('oils[3].baseOil');
  });
});
