import { describe, it, expect } from 'vitest';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';
import { meshCharts, summarise } from '../../renderer/components/mesh/series';

const parsed = parseReviewValue(DEMO_REVIEWS['harrow-creek-crusher-hs-pair.flankfilm.json']);
if (!parsed.ok) throw new Error('the demo must parse');
const results = run(parsed.review);
const limits = { boundaryBelow: 1, fullFilmFrom: 3 };
const c = results.cases[0]!;

describe('Mesh chart series', () => {
  it('four charts, each with A–E at the points of the path of contact, in order', () => {
    const charts = meshCharts(c, results.gear, limits, 'si');
    expect(charts.map((x) => x.id)).toEqual(['hertz', 'velocity', 'film', 'temperature']);
    for (const ch of charts) {
      expect(ch.markers.map((m) => m.label)).toEqual(['A', 'B', 'C', 'D', 'E']);
      expect(ch.markers.map((m) => m.x)).toEqual([results.gear.points_mm.A, results.gear.points_mm.B, results.gear.points_mm.C, results.gear.points_mm.D, results.gear.points_mm.E]);
      const xs = ch.markers.map((m) => m.x);
      expect([...xs].sort((a, b) => a - b)).toEqual(xs);
    }
  });
  it('the Hertz chart’s maximum is the case’s σH,max', () => {
    const [hertz] = meshCharts(c, results.gear, limits, 'si');
    expect(summarise(hertz!)[0]?.max).toBeCloseTo(c.maxHertzStress_MPa, 6);
  });
  it('sliding velocity is zero at C (pure rolling at the pitch point, METHODS.md §2)', () => {
    const velocity = meshCharts(c, results.gear, limits, 'si')[1]!;
    expect(summarise(velocity)[0]?.min).toBeLessThan(1e-9 + 0.05 * (summarise(velocity)[0]?.max ?? 0));
  });
  it('regime bands tile the λ axis at the policy limits, each with its word', () => {
    const film = meshCharts(c, results.gear, { boundaryBelow: 1, fullFilmFrom: 3 }, 'si')[2]!;
    expect(film.bands?.map((b) => b.label)).toEqual(['boundary', 'mixed', 'full film (EHL)']);
    expect(film.bands?.[0]?.from).toBe(0);
    expect(film.bands?.[0]?.to).toBe(1);
    expect(film.bands?.[1]?.to).toBe(3);
    expect(film.bands?.[2]?.from).toBe(3);
  });
  it('US customary: the path in inches, stress in ksi, temperatures in °F', () => {
    const si = meshCharts(c, results.gear, limits, 'si');
    const us = meshCharts(c, results.gear, limits, 'us');
    expect(us[0]!.markers[4]!.x).toBeCloseTo(si[0]!.markers[4]!.x / 25.4, 12); // 1 in = 25.4 mm
    expect(summarise(us[0]!)[0]!.max! * 6.894757293168361).toBeCloseTo(summarise(si[0]!)[0]!.max!, 6); // 1 ksi = 6.894757 MPa (NIST SP 811)
    expect(summarise(us[3]!)[0]!.max!).toBeCloseTo(summarise(si[3]!)[0]!.max! * 1.8 + 32, 9);
    expect(us[0]!.xLabel).toContain('(in)');
  });
});
