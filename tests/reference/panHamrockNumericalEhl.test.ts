import { describe, expect, it } from 'vitest';
import { lineContactEhl } from '../../app/engine/ehl/lineContactEhl';
import { pointAt } from './ehlPoints';

/**
 * The numerical line-contact solver against the fit of published numerical solutions:
 * P. Pan, B. J. Hamrock, "Simple formulas for performance parameters used in elastohydrodynamically
 * lubricated line contacts", ASME J. Tribology 111 (1989) 246–251 [memory]:
 *   H_min = 1.714 W^−0.128 U^0.694 G^0.568,  H_c = 2.922 W^−0.166 U^0.692 G^0.470 (h/R).
 * Their solutions are isothermal, Roelands viscosity and Dowson–Higginson density [memory], as ours.
 * The bands: h_c within ±15 %, h_min within ±25 %, in the moderate-load range.
 *
 * The groups are set through the inputs: E′ = 2.26e11 Pa (steel, Hamrock convention), R = 20 mm,
 * α = 2.2e−8 1/Pa, so G = αE′ = 4972 (near Hamrock's steel–mineral-oil G = 5007 [memory]);
 * η0 = 0.05 Pa·s; ū = U E′ R/η0 and w = W E′ R.
 *
 * Measured at the default 257 nodes and hybrid wedge scheme: h_c +8…+13 %, h_min +3…+7 % at these
 * points. Found, not calibrated away: with the first-order wedge (an option) h_c reads 10–18 % above
 * the fit, outside the band at three of these points; extrapolating first and second order in N puts
 * the grid-converged h_c about 10 % above the fit at U = 1e−11, W = 1.3e−4.
 */
const E = 2.26e11, R = 0.02, ALPHA = 2.2e-8;

const COMBOS: Array<{ U: number; W: number }> = [
  { U: 1e-11, W: 5e-5 }, // pH ≈ 0.64 GPa
  { U: 1e-11, W: 1.3e-4 }, // pH ≈ 1.03 GPa, Hamrock's reference case [memory]
  { U: 3e-11, W: 1.3e-4 },
  { U: 3e-12, W: 1.3e-4 },
  { U: 1e-11, W: 2e-4 }, // pH ≈ 1.3 GPa
];

describe('numerical EHL line contact against Pan–Hamrock (1989) [memory]', () => {
  for (const { U, W } of COMBOS) {
    it(`U = ${U}, W = ${W}: converges; h_c within ±15 %, h_min within ±25 % of the fit`, () => {
      const r = lineContactEhl(pointAt(U, W));
      expect(r.converged, `${r.stopReason}, residual ${r.residual}`).toBe(true);
      expect(r.gridResolved).toBe(true);
      expect(r.formula.hCentral).toBeCloseTo(R * 2.922 * W ** -0.166 * U ** 0.692 * (ALPHA * E) ** 0.47, 12); // Pan–Hamrock (1989) H_c [memory]
      expect(r.formula.hMin).toBeCloseTo(R * 1.714 * W ** -0.128 * U ** 0.694 * (ALPHA * E) ** 0.568, 12); // Pan–Hamrock (1989) H_min [memory]
      const c = r.hCentral / r.formula.hCentral;
      const m = r.hMin / r.formula.hMin;
      expect(Math.abs(c - 1), `h_c ratio ${c.toFixed(3)}`).toBeLessThan(0.15); // ±15 %, Pan–Hamrock (1989) [memory]
      expect(Math.abs(m - 1), `h_min ratio ${m.toFixed(3)}`).toBeLessThan(0.25); // ±25 %, Pan–Hamrock (1989) [memory]
      expect(r.hMin).toBeLessThan(r.hCentral); // the exit constriction (Dowson & Higginson 1966 [memory])
    });
  }

  it('the pressure spike and the film minimum move towards the outlet edge of the Hertz zone as the load rises', () => {
    // Published behaviour (Dowson & Higginson 1966; Pan & Hamrock 1989 [memory]): with rising load
    // the spike moves downstream towards x = b and the pressure approaches the Hertz ellipse.
    const loads = [2e-5, 5e-5, 1.3e-4];
    const runs = loads.map((W) => lineContactEhl(pointAt(1e-10, W)));
    for (const r of runs) expect(r.converged).toBe(true);
    const spikes = runs.map((r) => r.spike?.xOverB ?? Number.NaN);
    const minima = runs.map((r) => r.xAtHMin);
    for (let i = 1; i < runs.length; i++) {
      expect(spikes[i], `spike x/b at the loads: ${spikes.join(', ')}`).toBeGreaterThan(spikes[i - 1] as number);
      expect(minima[i], `h_min x/b: ${minima.join(', ')}`).toBeGreaterThanOrEqual(minima[i - 1] as number);
    }
    for (const x of spikes) expect(x).toBeLessThan(1); // the spike stays inside the Hertz zone
    // and the spike stands less proud of the Hertz pressure as the load rises
    const height = runs.map((r) => (r.spike?.p ?? 0) / r.hertzPressure);
    expect(height[2] as number).toBeLessThan(height[0] as number);
  });

  it('at high load the pressure approaches the Hertz ellipse away from the spike', () => {
    const r = lineContactEhl(pointAt(1e-11, 2e-3)); // pH ≈ 4 GPa
    expect(r.converged).toBe(true);
    let worst = 0;
    for (let i = 0; i < r.nodes; i++) {
      const x = r.xOverB[i] as number;
      if (Math.abs(x) > 0.8) continue;
      worst = Math.max(worst, Math.abs((r.pressure[i] as number) / r.hertzPressure - Math.sqrt(1 - x * x))); // Hertz: p/pH = √(1 − x²/b²)
    }
    expect(worst).toBeLessThan(0.03);
  });
});
