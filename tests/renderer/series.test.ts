import { describe, it, expect } from 'vitest';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';
import { meshCharts, summarise } from '../../renderer/components/mesh/series';
import { pathPoints } from '../../app/review/pathSeries';

const parsed = parseReviewValue(DEMO_REVIEWS['harrow-creek-crusher-hs-pair.flankfilm.json']);
if (!parsed.ok) throw new Error('the demo must parse');
const results = run(parsed.review);
const limits = { boundaryBelow: 1, fullFilmFrom: 3 };
const c = results.cases[0]!;

describe('Mesh chart series', () => {
  it('one strip of six charts, each with A–E at the points of the path of contact, in order', () => {
    const charts = meshCharts(c, results.gear, limits, 'si');
    expect(charts.map((x) => x.id)).toEqual(['hertz', 'velocity', 'film', 'hmin', 'temperature', 'flash']);
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
    expect(summarise(us[4]!)[0]!.max!).toBeCloseTo(summarise(si[4]!)[0]!.max! * 1.8 + 32, 9); // °F = 1.8 °C + 32
    expect(summarise(us[5]!)[0]!.max!).toBeCloseTo(summarise(si[5]!)[0]!.max! * 1.8, 9); // a temperature difference: 1 K = 1.8 °F
    expect(us[0]!.xLabel).toContain('(in)');
  });
  it('θB = θM + θfl is drawn against θS on one temperature axis; the flash temperature (a difference, K) has its own chart', () => {
    const charts = meshCharts(c, results.gear, limits, 'si');
    const temp = charts.find((x) => x.id === 'temperature')!;
    expect(temp.series.map((x) => x.label)).toEqual(['θB', 'θS']);
    expect(temp.yLabel).toBe('θ (°C)');
    // θB at every point is θM + θfl there (ISO/TS 6336-20: contact temperature = bulk + flash)
    for (const p of pathPoints(c.path)) if (p.contactTemperature_C !== null && p.flashTemperature_K !== null) expect(p.contactTemperature_C).toBeCloseTo((c.bulkTemperature_C ?? NaN) + p.flashTemperature_K, 9);
    const flash = charts.find((x) => x.id === 'flash')!;
    expect(flash.yLabel).toBe('θfl (K)');
    expect(flash.series.map((x) => x.label)).toEqual(['θfl']);
  });
  it('λ is the film chart’s main line with the regime bands on its own axis; hmin is apart', () => {
    const charts = meshCharts(c, results.gear, limits, 'si');
    const film = charts.find((x) => x.id === 'film')!;
    expect(film.yLabel).toBe('λ');
    expect(film.series.every((x) => x.axis === 'y' && x.label.startsWith('λ'))).toBe(true);
    expect(charts.find((x) => x.id === 'hmin')!.series[0]!.label).toBe('hmin');
  });
  it('every oil of a load case on the same chart, on axes fixed over the whole review', () => {
    const rows = results.cases.filter((x) => x.loadCase === c.loadCase);
    expect(rows.length).toBe(parsed.review.oils.length);
    const charts = meshCharts(rows, results.gear, limits, 'si', results.cases);
    const film = charts.find((x) => x.id === 'film')!;
    expect(film.series.map((x) => x.label)).toEqual(rows.map((r) => `λ ${r.oil}`));
    expect(film.series[1]!.dash).toBeDefined(); // the second oil dashed, so colour is never alone
    // The same axis top for another case: switching compares like with like.
    const other = results.cases.filter((x) => x.loadCase !== c.loadCase && x.loadCase === results.cases[results.cases.length - 1]!.loadCase);
    const again = meshCharts(other, results.gear, limits, 'si', results.cases);
    for (const id of ['hertz', 'film', 'hmin', 'temperature', 'flash'] as const) expect(again.find((x) => x.id === id)!.yMax).toBe(charts.find((x) => x.id === id)!.yMax);
    const hertzTop = Math.max(...results.cases.map((x) => x.maxHertzStress_MPa));
    expect(charts[0]!.yMax).toBeCloseTo(hertzTop, 9);
  });
});
