import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../../app/engine/diagnostics';
import { fitWalther, waltherLogSlope, waltherTemperature, waltherViscosity } from '../../../app/engine/oil/walther';
import { celsiusToKelvin, centistokes, kelvin } from '../../../app/engine/units';

const T40 = celsiusToKelvin(40);
const T100 = celsiusToKelvin(100);

describe('Walther slope d ln ν/dT', () => {
  it.each([
    [6.8, 2.064], // thin oil: the D341 low-viscosity terms matter
    [73.3, 8.86], // ASTM D2270 worked example oil
    [680, 39.06], // VG 680, VI 95
  ])('KV40 %s / KV100 %s: analytic slope equals a central difference of ln ν', (kv40, kv100) => {
    const c = fitWalther(centistokes(kv40), T40, centistokes(kv100), T100);
    for (let theta = -20; theta <= 200; theta += 20) {
      const t = celsiusToKelvin(theta);
      const h = 1e-3;
      const numeric = (Math.log(waltherViscosity(c, kelvin(t + h))) - Math.log(waltherViscosity(c, kelvin(t - h)))) / (2 * h);
      const analytic = waltherLogSlope(c, t);
      expect(analytic).toBeLessThan(0);
      expect(analytic / numeric - 1).toBeCloseTo(0, 6);
    }
  });
});

describe('Walther inverse T(ν)', () => {
  it('round-trips T → ν → T from −40 to 200 °C', () => {
    const c = fitWalther(centistokes(220), T40, centistokes(18.75), T100);
    for (let theta = -40; theta <= 200; theta += 10) {
      const t = celsiusToKelvin(theta);
      // below ~5 mm²/s (here above ~170 °C) the D341 inverse Z correction is approximate: up to 2e-4 K
      expect(Math.abs(waltherTemperature(c, waltherViscosity(c, t)) - t)).toBeLessThan(theta < 160 ? 1e-7 : 1e-3);
    }
  });
});

describe('Walther fit input checks', () => {
  it('rejects viscosities outside the D341 range, naming the field', () => {
    expect(() => fitWalther(centistokes(10), T40, centistokes(0.1), T100, 'kv40', 'kv100')).toThrow(/kv100/);
    expect(() => fitWalther(centistokes(0), T40, centistokes(2), T100, 'kv40', 'kv100')).toThrow(EngineInputError);
  });

  it('rejects an oil that would thicken as it warms, and coincident temperatures', () => {
    expect(() => fitWalther(centistokes(10), T40, centistokes(20), T100)).toThrow(EngineInputError);
    expect(() => fitWalther(centistokes(10), T40, centistokes(5), T40)).toThrow(EngineInputError);
  });

  it('rejects a non-positive absolute temperature in ν(T)', () => {
    const c = fitWalther(centistokes(100), T40, centistokes(11), T100);
    expect(() => waltherViscosity(c, kelvin(0))).toThrow(EngineInputError);
    expect(() => waltherLogSlope(c, kelvin(-5))).toThrow(EngineInputError);
  });
});
