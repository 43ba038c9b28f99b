import { describe, expect, it } from 'vitest';
import { EngineInputError, WarningSink } from '../../app/engine/diagnostics';
import { dowsonHigginsonMinFilm } from '../../app/engine/film/dowsonHigginson';
import type { Metres, MetresPerSecond, NewtonsPerMetre, Pascals, PascalSeconds, PerPascal } from '../../app/engine/units';

const eta = (v: number) => v as PascalSeconds;
const alpha = (v: number) => v as PerPascal;
const ms = (v: number) => v as MetresPerSecond;
const m = (v: number) => v as Metres;
const npm = (v: number) => v as NewtonsPerMetre;
const pa = (v: number) => v as Pascals;

// Steel/steel, E = 206 GPa, ν = 0.3 (ISO 6336): E′ = 2/(2·0.91/206e9) = 226.37 GPa (Hamrock convention E′ = 2E*).
const E_PRIME = pa(2 / ((2 * (1 - 0.09)) / 206e9));

// FZG A pitch point, stage 9 (302 N·m): R = 8.382 mm and ū = 3.182 m/s from the ISO 14635-1 geometry
// (z 16/24, m 4.5, a 91.5, αwt 22.44°) at 2175 rpm; w = 2T/d1/cos αn/b = 446.4 N/mm.
// Oil assumed: η0 = 12 mPa·s and α = 16 GPa⁻¹ (an ISO VG 100 mineral oil near 90 °C, common practice).
const FZG = { eta: eta(0.012), alpha: alpha(1.6e-8), u: ms(3.1819), R: m(8.38205e-3), w: npm(446_363) };

describe('Dowson–Higginson line-contact minimum film (Dowson & Higginson 1966/1977, 2.65 form)', () => {
  it('FZG A pitch point, stage 9: h_min = 0.179 µm', () => {
    const h = dowsonHigginsonMinFilm(FZG.eta, FZG.alpha, FZG.u, FZG.R, FZG.w, E_PRIME);
    expect(h).toBeCloseTo(1.7894e-7, 10); // arithmetic of H = 2.65 U^0.7 G^0.54 W^-0.13 for the inputs above
    expect(h).toBeGreaterThan(0.1e-6); // industrial gears run with films of about 0.1–1 µm (common practice)
    expect(h).toBeLessThan(1e-6);
  });

  it('equals the dimensional form h = 2.65 α^0.54 (η0 ū)^0.7 R^0.43 E′^−0.03 w^−0.13 (Dowson & Higginson [memory])', () => {
    for (const [e, a, u, R, w] of [
      [0.012, 1.6e-8, 3.18, 8.4e-3, 4.46e5],
      [0.2, 2.5e-8, 0.3, 20e-3, 1.2e6],
      [0.005, 1.1e-8, 20, 4e-3, 8e4],
    ] as const) {
      const expected = 2.65 * a ** 0.54 * (e * u) ** 0.7 * R ** 0.43 * E_PRIME ** -0.03 * w ** -0.13;
      expect(dowsonHigginsonMinFilm(eta(e), alpha(a), ms(u), m(R), npm(w), E_PRIME) / expected).toBeCloseTo(1, 12);
    }
  });

  it('h ∝ ū^0.7, weak load exponent w^−0.13, R^0.43 and nearly no E′ effect (E′^−0.03)', () => {
    const h = (k: { u?: number; w?: number; R?: number; E?: number }) =>
      dowsonHigginsonMinFilm(FZG.eta, FZG.alpha, ms(FZG.u * (k.u ?? 1)), m(FZG.R * (k.R ?? 1)), npm(FZG.w * (k.w ?? 1)), pa(E_PRIME * (k.E ?? 1)));
    const h0 = h({});
    expect(h({ u: 2 }) / h0).toBeCloseTo(2 ** 0.7, 10); // 1.6245
    expect(h({ w: 2 }) / h0).toBeCloseTo(2 ** -0.13, 10); // 0.9138: doubling the load thins the film by 9 %
    expect(h({ R: 2 }) / h0).toBeCloseTo(2 ** 0.43, 10);
    expect(h({ E: 2 }) / h0).toBeCloseTo(2 ** -0.03, 10); // with α fixed
  });

  it('no entrainment (ū ≤ 0): film 0 and a warning naming uMean', () => {
    for (const u of [0, -1]) {
      const sink = new WarningSink();
      expect(dowsonHigginsonMinFilm(FZG.eta, FZG.alpha, ms(u), FZG.R, FZG.w, E_PRIME, sink)).toBe(0);
      expect(sink.items.map((x) => [x.code, x.field])).toEqual([['film.no-entrainment', 'uMean']]);
    }
  });

  it('warns, naming the group, far outside the fitted range; silent inside it', () => {
    const inside = new WarningSink();
    dowsonHigginsonMinFilm(FZG.eta, FZG.alpha, FZG.u, FZG.R, FZG.w, E_PRIME, inside);
    expect(inside.items).toEqual([]);
    const outside = new WarningSink();
    // α = 6e-8 gives G = 13 600; ū = 1e-4 m/s gives U ≈ 6e-16; w = 100 N/m gives W ≈ 5e-8
    dowsonHigginsonMinFilm(FZG.eta, alpha(6e-8), ms(1e-4), FZG.R, npm(100), E_PRIME, outside);
    expect(outside.items.map((x) => x.field).sort()).toEqual(['G', 'U', 'W']);
    expect(outside.items.every((x) => x.severity === 'warning' && /Dowson–Higginson/.test(x.message))).toBe(true);
  });

  it('meaningless inputs throw EngineInputError (never a silent NaN)', () => {
    expect(() => dowsonHigginsonMinFilm(FZG.eta, FZG.alpha, FZG.u, FZG.R, npm(0), E_PRIME)).toThrow(EngineInputError);
    expect(() => dowsonHigginsonMinFilm(eta(Number.NaN), FZG.alpha, FZG.u, FZG.R, FZG.w, E_PRIME)).toThrow(EngineInputError);
    expect(() => dowsonHigginsonMinFilm(FZG.eta, FZG.alpha, ms(Number.NaN), FZG.R, FZG.w, E_PRIME)).toThrow(EngineInputError);
    expect(() => dowsonHigginsonMinFilm(FZG.eta, FZG.alpha, FZG.u, m(-1e-3), FZG.w, E_PRIME)).toThrow(EngineInputError);
    expect(() => dowsonHigginsonMinFilm(FZG.eta, alpha(0), FZG.u, FZG.R, FZG.w, E_PRIME)).toThrow(/alpha/);
  });
});
