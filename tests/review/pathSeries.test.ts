/**
 * The path in columns and as objects: the JSON of `review --json` has one object per point with the
 * same numbers as the columns, the pitch point is the point at C, and a recompute after a policy
 * change sees that change in the micropitting test gear (nothing kept across recomputes goes stale).
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';
import { pathPoints, pointOf, resultsJson } from '../../app/review/pathSeries';
import type { Review } from '../../app/review/schema';

const rawDemo = () => JSON.parse(readFileSync('assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json', 'utf8'));
const parsed = (raw: unknown): Review => {
  const p = parseReviewValue(raw);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.review;
};

describe('path series', () => {
  const results = run(parsed(rawDemo()));
  it('pathPoints gives one object per point with the columns’ numbers', () => {
    const c = results.cases[0]!;
    const pts = pathPoints(c.path);
    expect(pts).toHaveLength(c.path.n);
    expect(pts[7]!.hertzStress_MPa).toBe(c.path.hertzStress_MPa[7]);
    expect(pts[7]!.lambda).toBe(c.path.film!.lambda[7]);
    expect(pts[7]!.contactTemperature_C).toBe(c.path.heat!.contactTemperature_C[7]);
    expect(new Set(pts.map((p) => p.regime))).toEqual(new Set(pts.map((_, i) => pointOf(c.path, i).regime)));
    for (const p of pts) expect(['boundary', 'mixed', 'full-film']).toContain(p.regime);
  });
  it('the pitch point is the path’s point at C, where sliding vanishes', () => {
    const c = results.cases[1]!;
    const i = c.path.position_mm.indexOf(c.pitch.position_mm);
    expect(i).toBeGreaterThan(0);
    expect(pointOf(c.path, i)).toEqual(c.pitch);
    expect(Math.abs(c.pitch.slidingVelocity_mps)).toBeLessThan(1e-9);
  });
  it('resultsJson writes the path as objects and keeps the keys in order', () => {
    const json = JSON.parse(JSON.stringify(resultsJson(results)));
    expect(Object.keys(json)).toEqual(Object.keys(results));
    expect(Object.keys(json.cases[0])).toEqual(Object.keys(results.cases[0]!));
    expect(json.cases[0].path).toHaveLength(results.cases[0]!.path.n);
    expect(json.cases[0].path[0].position_mm).toBe(results.cases[0]!.path.position_mm[0]);
  });
  it('a case without an oil has no film or heat columns, and null in its points', () => {
    const raw = rawDemo();
    raw.oils = [];
    const c = run(parsed(raw)).cases[0]!;
    expect(c.path.film).toBeNull();
    expect(c.path.heat).toBeNull();
    expect(pathPoints(c.path)[0]!.lambda).toBeNull();
  });
  it('a recompute after a change of μ sees it in the micropitting test gear too', () => {
    const a = run(parsed(rawDemo())).cases[0]!.micropitting!;
    const raw = rawDemo();
    raw.policy.frictionCoefficient = 0.09; // the oil's model is the one kept from the run before: the test must still see the new μ
    const b = run(parsed(raw)).cases[0]!.micropitting!;
    const again = run(parsed(rawDemo())).cases[0]!.micropitting!;
    expect(b.lambdaGFTByStage).not.toEqual(a.lambdaGFTByStage);
    expect(again).toEqual(a);
  });
});
