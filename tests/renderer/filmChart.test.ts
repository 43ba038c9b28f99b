import { describe, expect, it } from 'vitest';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { parseReviewValue } from '../../app/review/parse';
import { ehlAtPoint } from '../../app/review/ehlAtPoint';
import { filmChartSpec, ROUGHNESS_LABEL, TRIBOFILM_LABEL } from '../../renderer/components/film/filmChart';
import { computeFilm } from '../../renderer/worker/filmCompute';

const parsed = parseReviewValue(DEMO_REVIEWS['harrow-creek-crusher-hs-pair.flankfilm.json']);
if (!parsed.ok) throw new Error('the demo must parse');
const review = parsed.review;
const caseName = review.loadCases[1]?.name as string;
const r = ehlAtPoint(review, { caseName, at: 'lambda-min' });

describe('Film detail chart', () => {
  it('pressure and film across the contact, the Hertz ellipse and the formula h_min as a line', () => {
    const spec = filmChartSpec(r, 'si');
    expect(spec.series.map((s) => s.axis)).toEqual(['y', 'y', 'y2', 'y2']);
    expect(spec.series[0]?.points).toHaveLength(r.nodes);
    const line = spec.series[3]?.points ?? [];
    expect(line.map((p) => p.y)).toEqual([r.formulaHMin_um, r.formulaHMin_um]);
    // Hertz ellipse: p0 at x = 0, nothing outside |x| < b
    const hertz = spec.series[1]?.points ?? [];
    expect(Math.max(...hertz.map((p) => p.y ?? 0))).toBeCloseTo(r.hertzP0_MPa, 0);
    expect(hertz.filter((p) => Math.abs(p.x) >= 1).every((p) => p.y === null)).toBe(true);
  });

  it('the roughness band is 0…σ and the tribofilm band 0.05–0.15 µm, labelled common practice', () => {
    const spec = filmChartSpec(r, 'si');
    const [rough, tribo] = spec.bands;
    expect([rough?.from, rough?.to, rough?.label]).toEqual([0, r.compositeRoughness_um, ROUGHNESS_LABEL]);
    expect(tribo?.from).toBeCloseTo(0.05, 12); // 50 nm (common practice)
    expect(tribo?.to).toBeCloseTo(0.15, 12); // 150 nm (common practice)
    expect(tribo?.label).toBe(TRIBOFILM_LABEL);
    expect(TRIBOFILM_LABEL).toMatch(/common practice/);
    expect(spec.y2Max).toBeGreaterThan(r.compositeRoughness_um);
  });

  it('US units: the film in µin (1 µm = 39.37 µin) and the pressure in ksi', () => {
    const spec = filmChartSpec(r, 'us');
    expect(spec.bands[1]?.to).toBeCloseTo(0.15 / 0.0254, 6);
    expect(spec.yLabel).toMatch(/ksi/);
  });

  it('the worker answers a bad point with a message in words, not a throw', () => {
    const m = computeFilm({ run: 7, review, point: { caseName: 'nope', at: 'C' } });
    expect(m).toEqual({ run: 7, kind: 'failed', message: expect.stringMatching(/no load case named "nope"/) });
    const ok = computeFilm({ run: 8, review, point: { caseName, at: 'C' }, nodes: 129 });
    expect(ok.kind === 'done' && ok.result.converged && ok.result.nodes === 129).toBe(true);
  });
});
