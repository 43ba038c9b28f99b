import { describe, expect, it } from 'vitest';
import { EngineInputError, WarningSink } from '../../app/engine/diagnostics';
import { bulkTemperature, LUBRICATION_FACTOR_XS } from '../../app/engine/heat/bulkTemperature';
import { isoMeanFriction, type IsoFrictionInputs } from '../../app/engine/heat/isoFriction';
import { scuffingSafety, scuffingTemperature } from '../../app/engine/heat/scuffingTemperature';
import { celsiusToKelvin, kelvinToCelsius, type KelvinDifference, type Metres, type MetresPerSecond, type NewtonsPerMetre, type PascalSeconds } from '../../app/engine/units';

const C = celsiusToKelvin;

// FZG A pitch point, stage 9 (302 N·m), own arithmetic of the ISO 14635-1 geometry: wBt = 446.4 N/mm,
// vΣC = 6.364 m/s, ρrelC = 8.382 mm. Oil ISO VG 100 mineral at 90 °C, η ≈ 12 mPa·s (common practice);
// Ra 0.35 µm on both flanks (ground FZG test gears, [memory]).
const FZG9: IsoFrictionInputs = {
  wBt: 446_363 as NewtonsPerMetre,
  vSumC: 6.3638 as MetresPerSecond,
  rhoRelC: 8.38205e-3 as Metres,
  etaOil: 0.012 as PascalSeconds,
  raAvg: 0.35e-6 as Metres,
  xL: 1,
};

describe('ISO/TS 6336-20 mean coefficient of friction μm [memory]', () => {
  it('FZG A pitch point, stage 9: XR 0.994, μm 0.0604', () => {
    expect(2.2 * (0.35 / 8.38205) ** 0.25).toBeCloseTo(0.9945, 4); // XR = 2.2 (Ra/ρ)^0.25, Ra µm, ρ mm
    const mu = isoMeanFriction(FZG9);
    expect(mu).toBeCloseTo(0.06045, 4); // 0.045·(446.4/(6.364·8.382))^0.2·12^-0.05·0.9945
    expect(mu).toBeGreaterThan(0.03); // mesh friction of oil-lubricated steel gears 0.03–0.1 (common practice)
    expect(mu).toBeLessThan(0.1);
  });

  it('takes SI and converts inside: same value as the formula in N/mm, m/s, mm, mPa·s, µm', () => {
    const p = { ...FZG9, wBt: 250_000 as NewtonsPerMetre, etaOil: 0.05 as PascalSeconds, raAvg: 0.8e-6 as Metres, xL: 0.8, kBgamma: 1.2 };
    const mixed = 0.045 * ((250 * 1.2) / (6.3638 * 8.38205)) ** 0.2 * 50 ** -0.05 * 2.2 * (0.8 / 8.38205) ** 0.25 * 0.8;
    expect(isoMeanFriction(p)).toBeCloseTo(mixed, 12);
  });

  it('exponents: w^0.2, vΣ^−0.2, ρ^−0.2·ρ^−0.25, η^−0.05, Ra^0.25, XL linear', () => {
    const m0 = isoMeanFriction(FZG9);
    expect(isoMeanFriction({ ...FZG9, wBt: (2 * FZG9.wBt) as NewtonsPerMetre }) / m0).toBeCloseTo(2 ** 0.2, 12);
    expect(isoMeanFriction({ ...FZG9, vSumC: (2 * FZG9.vSumC) as MetresPerSecond }) / m0).toBeCloseTo(2 ** -0.2, 12);
    expect(isoMeanFriction({ ...FZG9, rhoRelC: (2 * FZG9.rhoRelC) as Metres }) / m0).toBeCloseTo(2 ** -0.45, 12);
    expect(isoMeanFriction({ ...FZG9, etaOil: (2 * FZG9.etaOil) as PascalSeconds }) / m0).toBeCloseTo(2 ** -0.05, 12);
    expect(isoMeanFriction({ ...FZG9, raAvg: (2 * FZG9.raAvg) as Metres }) / m0).toBeCloseTo(2 ** 0.25, 12);
    expect(isoMeanFriction({ ...FZG9, xL: 0.8 }) / m0).toBeCloseTo(0.8, 12); // PAO XL 0.8 [memory]
  });

  it('warns beyond vΣC 50 m/s and below wBt·KBγ 150 N/mm [memory, weak]; throws on zero inputs', () => {
    const sink = new WarningSink();
    isoMeanFriction({ ...FZG9, vSumC: 60 as MetresPerSecond, wBt: 100_000 as NewtonsPerMetre }, sink);
    expect(sink.items.map((w) => w.field).sort()).toEqual(['vSumC', 'wBt']);
    const quiet = new WarningSink();
    isoMeanFriction(FZG9, quiet);
    expect(quiet.items).toEqual([]);
    expect(() => isoMeanFriction({ ...FZG9, raAvg: 0 as Metres })).toThrow(EngineInputError);
  });
});

describe('ISO/TS 6336-20 scuffing temperature θS = 80 + (0.85 + 1.4 XW) XL S² °C [memory, strong]', () => {
  // XW = XL = 1: 80 + 2.25 S² (arithmetic of the formula)
  const table: [number, number][] = [
    [1, 82.25], [2, 89], [3, 100.25], [4, 116], [5, 136.25], [6, 161],
    [7, 190.25], [8, 224], [9, 262.25], [10, 305], [11, 352.25], [12, 404],
  ];
  it.each(table)('stage %i → %f °C', (s, theta) => {
    const r = scuffingTemperature(s);
    expect(kelvinToCelsius(r.value)).toBeCloseTo(theta, 9);
    expect(r.atLeast).toBe(false);
  });

  it('">12" (and any number above 12) is computed with 12 and flagged atLeast', () => {
    for (const s of ['>12', 13, 14] as const) {
      const r = scuffingTemperature(s);
      expect(kelvinToCelsius(r.value)).toBeCloseTo(404, 9);
      expect(r).toMatchObject({ atLeast: true, stage: 12 });
    }
  });

  it('structural and lubricant factors: nitrided XW 1.5, PAO XL 0.8 [memory]', () => {
    expect(kelvinToCelsius(scuffingTemperature(9, 1.5).value)).toBeCloseTo(80 + 2.95 * 81, 9); // 318.95 °C
    expect(kelvinToCelsius(scuffingTemperature(12, 1, 0.8).value)).toBeCloseTo(80 + 2.25 * 0.8 * 144, 9); // 339.2 °C
  });

  it('a stage that is not a whole number 1…12 throws', () => {
    expect(() => scuffingTemperature(8.5)).toThrow(EngineInputError);
    expect(() => scuffingTemperature(0)).toThrow(EngineInputError);
    expect(() => scuffingTemperature(Number.NaN)).toThrow(EngineInputError);
  });
});

describe('ISO/TS 6336-20 bulk temperature θM = θoil + 0.47 XS Xmp θfl,max [memory]', () => {
  const flash = 100 as KelvinDifference;
  it('dip XS 1.0, spray XS 1.2 [memory, weak], n_p = 2 gives Xmp 1.5', () => {
    expect(kelvinToCelsius(bulkTemperature(C(90), flash))).toBeCloseTo(137, 9);
    expect(kelvinToCelsius(bulkTemperature(C(90), flash, LUBRICATION_FACTOR_XS.spray))).toBeCloseTo(146.4, 9);
    expect(kelvinToCelsius(bulkTemperature(C(90), flash, 1, 2))).toBeCloseTo(160.5, 9);
    expect(() => bulkTemperature(C(90), flash, 1, 1.5)).toThrow(EngineInputError);
  });
});

describe('ISO/TS 6336-20 scuffing safety SB = (θS − θoil)/(θB,max − θoil) [memory]', () => {
  it('FZG stage 9 oil, oil 90 °C, θB,max 200 °C: SB = 172.25/110 = 1.566', () => {
    const r = scuffingSafety(scuffingTemperature(9).value, C(90), C(200));
    expect(r.reason).toBe('ok');
    expect(r.value).toBeCloseTo(172.25 / 110, 12);
  });

  it('no rise above the oil: value null with a reason, never Infinity or NaN', () => {
    const sink = new WarningSink();
    const r = scuffingSafety(C(262.25), C(90), C(90), sink);
    expect(r).toEqual({ value: null, reason: 'no-temperature-rise' });
    expect(sink.items[0]?.field).toBe('thetaBmax');
  });

  it('oil above its scuffing temperature: a negative factor, flagged', () => {
    const sink = new WarningSink();
    const r = scuffingSafety(C(82.25), C(90), C(150), sink);
    expect(r.reason).toBe('oil-at-or-above-scuffing-temperature');
    expect(r.value).toBeLessThan(0);
    expect(sink.items[0]?.code).toBe('heat.oil-above-scuffing-temperature');
  });
});
