import { describe, expect, it } from 'vitest';
import { EngineInputError, WarningSink } from '../../app/engine/diagnostics';
import { dowsonHigginsonMinFilm } from '../../app/engine/film/dowsonHigginson';
import { isoLocalFilm } from '../../app/engine/film/isoLocalFilm';
import type { Metres, MetresPerSecond, NewtonsPerMetre, Pascals, PascalSeconds, PerPascal } from '../../app/engine/units';

const E_R = (2 / ((2 * (1 - 0.09)) / 206e9)) as Pascals; // steel, E 206 GPa, ν 0.3: E_r = 2E* = 226.4 GPa
const E_STAR = E_R / 2;
/** Hertz line-contact pressure p = √(w E* / (π ρ)) (METHODS §4, Hertz). */
const hertz = (w: number, rho: number) => Math.sqrt((w * E_STAR) / (Math.PI * rho)) as Pascals;

// FZG A pitch point, stage 9, oil as in dowsonHigginson.test.ts: ρn 8.382 mm, vΣ 6.364 m/s, w 446.4 N/mm.
const C = { eta: 0.012 as PascalSeconds, alpha: 1.6e-8 as PerPascal, vSum: 6.3638 as MetresPerSecond, rho: 8.38205e-3 as Metres, w: 446_363 };

describe('ISO/TR 15144-1 local film thickness h_Y [memory]', () => {
  it('FZG A pitch point, stage 9, S_GF = 1: h_Y = 0.177 µm', () => {
    const h = isoLocalFilm(C.eta, C.alpha, C.vSum, C.rho, hertz(C.w, C.rho), E_R);
    expect(h).toBeCloseTo(1.7665e-7, 10); // arithmetic of h = 1600 ρ G^0.6 U^0.7 W^-0.13 (µm, mm) in SI
  });

  it('its groups are the Dowson–Higginson ones: ratio to the 2.65 form is 0.6038 G^0.06, 1 at G ≈ 4490', () => {
    for (const G of [3000, 3622, 4491, 6000]) {
      const a = (G / E_R) as PerPascal;
      const iso = isoLocalFilm(C.eta, a, C.vSum, C.rho, hertz(C.w, C.rho), E_R);
      const dh = dowsonHigginsonMinFilm(C.eta, a, (C.vSum / 2) as MetresPerSecond, C.rho, C.w as NewtonsPerMetre, E_R);
      expect(iso / dh).toBeCloseTo((1.6 / 2.65) * G ** 0.06, 10); // exact algebra of the two fits
    }
    // steel/mineral oil G 3000…6000: the two fits differ by less than 3 %
    expect((1.6 / 2.65) * 3000 ** 0.06).toBeGreaterThan(0.97);
    expect((1.6 / 2.65) * 6000 ** 0.06).toBeLessThan(1.03);
  });

  it('the sliding parameter enters as S_GF^0.22', () => {
    const p = hertz(C.w, C.rho);
    const h1 = isoLocalFilm(C.eta, C.alpha, C.vSum, C.rho, p, E_R, 1);
    expect(isoLocalFilm(C.eta, C.alpha, C.vSum, C.rho, p, E_R, 0.5) / h1).toBeCloseTo(0.5 ** 0.22, 12); // 0.8586
  });

  it('vΣ ≤ 0 gives 0 with a warning naming vSum; meaningless inputs throw', () => {
    const sink = new WarningSink();
    expect(isoLocalFilm(C.eta, C.alpha, 0 as MetresPerSecond, C.rho, hertz(C.w, C.rho), E_R, 1, sink)).toBe(0);
    expect(sink.items[0]?.field).toBe('vSum');
    expect(() => isoLocalFilm(C.eta, C.alpha, C.vSum, C.rho, 0 as Pascals, E_R)).toThrow(EngineInputError);
    expect(() => isoLocalFilm(C.eta, C.alpha, C.vSum, C.rho, hertz(C.w, C.rho), E_R, 0)).toThrow(/sGF/);
  });
});
