import { describe, expect, it } from 'vitest';
import { EngineInputError, WarningSink } from '../../app/engine/diagnostics';
import { integralContactRatioFactor } from '../../app/engine/heat/contactRatioFactor';
import {
  FZG_A_PINION_TORQUE,
  integralScuffingSafety,
  integralScuffingTemperature,
  integralTemperature,
} from '../../app/engine/heat/integralTemperature';
import { celsiusToKelvin, kelvinToCelsius, type KelvinDifference, type NewtonMetres } from '../../app/engine/units';

const C = celsiusToKelvin;
const Nm = (v: number) => v as NewtonMetres;

describe('FZG A/8.3/90 load-stage pinion torques (ISO 14635-1 [memory])', () => {
  it('stages 1–12', () => {
    expect([...FZG_A_PINION_TORQUE]).toEqual([3.3, 13.7, 35.3, 60.8, 94.1, 135.3, 183.4, 239.3, 302.0, 372.6, 450.1, 534.5]);
  });
  it('rise as the stage squared (Hertz stress ∝ √T about linear in the stage): T/S² = 3.70…3.80 N·m from stage 4 (own arithmetic)', () => {
    FZG_A_PINION_TORQUE.forEach((t, i) => {
      const s = i + 1;
      if (s >= 4) {
        expect(t / (s * s)).toBeGreaterThan(3.7);
        expect(t / (s * s)).toBeLessThanOrEqual(3.8); // stage 4: 60.8/16 = 3.80
      }
    });
  });
});

describe('ISO/TS 6336-21 integral scuffing temperature θintS = θMT + XWrelT·C2·θfla,int,T [memory]', () => {
  it('stage 12, mineral: θMT = 80 + 0.23·534.5 = 202.935 °C, θfla,int,T = 0.2·534.5 = 106.9 K, θintS = 202.935 + 1.5·106.9 = 363.285 °C', () => {
    expect(kelvinToCelsius(integralScuffingTemperature(Nm(534.5)))).toBeCloseTo(363.285, 9);
  });
  it('stage 9 (302 N·m): 80 + 69.46 + 1.5·60.4 = 240.06 °C; PAO XL 0.8 at stage 12: 80 + 0.8·(0.23 + 0.3)·534.5 = 306.628 °C', () => {
    expect(kelvinToCelsius(integralScuffingTemperature(Nm(302)))).toBeCloseTo(240.06, 9);
    expect(kelvinToCelsius(integralScuffingTemperature(Nm(534.5), 0.8))).toBeCloseTo(306.628, 9);
  });
  it('XWrelT scales the flash part only: nitrided flanks (XW 1.5 against the carburised test gear) at stage 12 → 202.935 + 1.5·1.5·106.9 = 443.46 °C', () => {
    expect(kelvinToCelsius(integralScuffingTemperature(Nm(534.5), 1, 1.5))).toBeCloseTo(443.46, 9);
  });
  it('θMT alone (the earlier, wrong reading) is not θintS', () => {
    expect(kelvinToCelsius(integralScuffingTemperature(Nm(534.5)))).not.toBeCloseTo(202.935, 0);
  });
});

describe('ISO/TS 6336-21 integral temperature θint = θM + 1.5 θfla,int, θM = θoil + 0.7 Xmp θfla,int [memory]', () => {
  it('oil 90 °C, θfla,E 100 K, Xε 0.3: θfla,int 30 K, θM 111 °C, θint 156 °C', () => {
    const r = integralTemperature(C(90), 100 as KelvinDifference, 0.3);
    expect(r.flashIntegral).toBeCloseTo(30, 12);
    expect(kelvinToCelsius(r.bulk)).toBeCloseTo(111, 9);
    expect(kelvinToCelsius(r.integral)).toBeCloseTo(156, 9);
    expect(kelvinToCelsius(integralTemperature(C(90), 100 as KelvinDifference, 0.3, 3).bulk)).toBeCloseTo(90 + 0.7 * 2 * 30, 9);
  });

  it('SintS is a ratio of °C temperatures: 149.46/156 = 0.958, not the kelvin ratio 0.985', () => {
    const s = integralScuffingSafety(C(149.46), C(156));
    expect(s.value).toBeCloseTo(149.46 / 156, 12);
    expect(s.value).not.toBeCloseTo(C(149.46) / C(156), 2);
  });

  it('θint ≤ 0 °C: value null with a reason and a warning', () => {
    const sink = new WarningSink();
    expect(integralScuffingSafety(C(150), C(0), sink)).toEqual({ value: null, reason: 'integral-temperature-not-positive' });
    expect(sink.items).toHaveLength(1);
  });
});

describe('ISO/TS 6336-21 contact ratio factor Xε [memory]', () => {
  it('εα < 1: the exact path mean of a flash temperature linear in the distance from C', () => {
    const e1 = 0.6;
    const e2 = 0.3;
    const n = 100_000;
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const x = -e2 + ((i + 0.5) / n) * (e1 + e2);
      sum += Math.abs(x) / e1; // θ(x)/θ(E), x in units of p_bt from C
    }
    expect(integralContactRatioFactor(e1, e2)).toBeCloseTo(sum / n, 6); // (0.36 + 0.09)/(2·0.9·0.6) = 0.41667
  });

  it('neighbouring branches meet on their common boundaries (continuity checks of the recalled table)', () => {
    const d = 1e-9;
    const pairs: [number, number, number, number][] = [
      [0.4, 0.6 - d, 0.4, 0.6 + d], // εα = 1
      [1 - d, 0.5, 1 + d, 0.5], // ε1 = 1, 1 ≤ εα < 2
      [0.5, 1 - d, 0.5, 1 + d], // ε2 = 1
      [1.3, 0.7 - d, 1.3, 0.7 + d], // εα = 2, ε1 > ε2
      [0.7, 1.3 - d, 0.7, 1.3 + d], // εα = 2, ε1 < ε2
      [1.2 + d, 1.2, 1.2, 1.2 + d], // ε1 = ε2 in 2 ≤ εα < 3
    ];
    for (const [a1, a2, b1, b2] of pairs) {
      expect(integralContactRatioFactor(a1, a2)).toBeCloseTo(integralContactRatioFactor(b1, b2), 6);
    }
  });

  it('1 ≤ εα < 2: lies between the path means with load sharing (1/3…2/3…1) weighted by X_Γ and by X_Γ^0.75 (own check)', () => {
    const e1 = 0.8;
    const e2 = 0.8; // εα 1.6, B at −0.2, D at +0.2 (units of p_bt from C)
    const ea = e1 + e2;
    const sharing = (x: number) => {
      const A = -e2;
      const B = e1 - 1;
      const D = 1 - e2;
      if (x < B) return 1 / 3 + (1 / 3) * ((x - A) / (B - A));
      if (x <= D) return 1;
      return 2 / 3 - (1 / 3) * ((x - D) / (e1 - D));
    };
    const mean = (p: number) => {
      const n = 100_000;
      let s = 0;
      for (let i = 0; i < n; i++) {
        const x = -e2 + ((i + 0.5) / n) * ea;
        s += sharing(x) ** p * (Math.abs(x) / e1);
      }
      return s / n;
    };
    const x = integralContactRatioFactor(e1, e2); // 0.2656
    expect(x).toBeGreaterThan(mean(1)); // 0.250
    expect(x).toBeLessThan(mean(0.75)); // 0.293
  });

  it('FZG A gear (ε1 1.111, ε2 0.250 from the ISO 14635-1 geometry): Xε = 0.3187', () => {
    expect(integralContactRatioFactor(1.111342, 0.24974)).toBeCloseTo(0.3187, 4); // arithmetic, ε1 ≥ 1 branch
  });

  it('εα ≥ 3 or ε1 ≤ 0 throw', () => {
    expect(() => integralContactRatioFactor(1.6, 1.5)).toThrow(EngineInputError);
    expect(() => integralContactRatioFactor(0, 1.2)).toThrow(EngineInputError);
  });
});
