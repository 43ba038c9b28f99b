import { describe, expect, it } from 'vitest';
import { WarningSink } from '../../app/engine/diagnostics';
import { dowsonHigginsonMinFilm } from '../../app/engine/film/dowsonHigginson';
import { panHamrockFilm } from '../../app/engine/film/panHamrock';
import type { Metres, MetresPerSecond, NewtonsPerMetre, Pascals, PascalSeconds, PerPascal } from '../../app/engine/units';

const E_PRIME = (2 / ((2 * (1 - 0.09)) / 206e9)) as Pascals; // steel, E 206 GPa, ν 0.3 (ISO 6336), E′ = 2E*
const R = 0.01 as Metres;

/** Inputs that give the requested Hamrock groups U, W, G at R = 10 mm, η0 = 0.05 Pa·s. */
function fromGroups(U: number, W: number, G: number) {
  const eta0 = 0.05 as PascalSeconds;
  return [eta0, (G / E_PRIME) as PerPascal, ((U * E_PRIME * R) / eta0) as MetresPerSecond, R, (W * E_PRIME * R) as NewtonsPerMetre, E_PRIME] as const;
}

describe('Pan–Hamrock line-contact film (Pan & Hamrock, ASME J. Tribology 111, 1989 [memory])', () => {
  it('FZG A pitch point, stage 9 (inputs as in dowsonHigginson.test.ts): h_min 0.166 µm, h_c 0.183 µm', () => {
    const f = panHamrockFilm(0.012 as PascalSeconds, 1.6e-8 as PerPascal, 3.1819 as MetresPerSecond, 8.38205e-3 as Metres, 446_363 as NewtonsPerMetre, E_PRIME);
    expect(f.hMin).toBeCloseTo(1.6598e-7, 10); // arithmetic of H_min = 1.714 W^-0.128 U^0.694 G^0.568
    expect(f.hCentral).toBeCloseTo(1.829e-7, 10); // arithmetic of H_c = 2.922 W^-0.166 U^0.692 G^0.470
  });

  it('agrees with Dowson–Higginson within 20 % over the gear range (both fit isothermal numerical solutions; METHODS band "a few tens of percent")', () => {
    let lo = Infinity;
    let hi = 0;
    for (const U of [1e-12, 1e-11, 1e-10])
      for (const W of [2e-5, 1e-4, 3e-4])
        for (const G of [2500, 3500, 5000]) {
          const args = fromGroups(U, W, G);
          const r = panHamrockFilm(...args).hMin / dowsonHigginsonMinFilm(...args);
          lo = Math.min(lo, r);
          hi = Math.max(hi, r);
        }
    expect(lo).toBeGreaterThan(0.8);
    expect(hi).toBeLessThan(1.2);
    // measured: Pan–Hamrock 5–10 % below Dowson–Higginson (0.905…0.953)
    expect(lo).toBeCloseTo(0.905, 2);
    expect(hi).toBeCloseTo(0.953, 2);
  });

  it('central film exceeds the minimum film (exit constriction), by 5–30 % in line contact', () => {
    for (const U of [1e-12, 1e-10])
      for (const W of [2e-5, 3e-4])
        for (const G of [2500, 5000]) {
          const f = panHamrockFilm(...fromGroups(U, W, G));
          expect(f.hCentral / f.hMin).toBeGreaterThan(1.05); // measured 1.054…1.263
          expect(f.hCentral / f.hMin).toBeLessThan(1.3);
        }
  });

  it('velocity and load exponents are those of the paper', () => {
    const a = panHamrockFilm(...fromGroups(1e-11, 1e-4, 4000));
    const hMin0 = a.hMin;
    const hC0 = a.hCentral;
    const b = panHamrockFilm(...fromGroups(2e-11, 1e-4, 4000));
    expect(b.hMin / hMin0).toBeCloseTo(2 ** 0.694, 10);
    expect(b.hCentral / hC0).toBeCloseTo(2 ** 0.692, 10);
    const c = panHamrockFilm(...fromGroups(1e-11, 2e-4, 4000));
    expect(c.hMin / hMin0).toBeCloseTo(2 ** -0.128, 10);
    expect(c.hCentral / hC0).toBeCloseTo(2 ** -0.166, 10);
  });

  it('writes into a reused object, and gives 0 with a warning when ū ≤ 0', () => {
    const out = { hMin: 1 as Metres, hCentral: 1 as Metres };
    const args = fromGroups(1e-11, 1e-4, 4000);
    expect(panHamrockFilm(...args, undefined, out)).toBe(out);
    const sink = new WarningSink();
    panHamrockFilm(args[0], args[1], 0 as MetresPerSecond, args[3], args[4], args[5], sink, out);
    expect([out.hMin, out.hCentral]).toEqual([0, 0]);
    expect(sink.items[0]?.code).toBe('film.no-entrainment');
  });
});
