/**
 * The worker moves the path columns to the page: every column's buffer is listed once (a duplicate
 * would make postMessage throw), and moving them leaves the next recompute intact.
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';
import { pathBuffers } from '../../renderer/worker/transferables';

const review = (file: string) => {
  const p = parseReviewValue(JSON.parse(readFileSync(file, 'utf8')));
  if (!p.ok) throw new Error('demo invalid');
  return p.review;
};

describe('pathBuffers', () => {
  it('lists each buffer once, and structuredClone moves them all', () => {
    const r = review('assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json');
    const results = run(r);
    const buffers = pathBuffers(results);
    expect(new Set(buffers).size).toBe(buffers.length);
    expect(buffers.length).toBeGreaterThan(0);
    const before = results.cases[0]!.path.hertzStress_MPa[3];
    const moved = structuredClone(results, { transfer: buffers });
    expect(moved.cases[0]!.path.hertzStress_MPa[3]).toBe(before);
    expect(results.cases[0]!.path.hertzStress_MPa.length).toBe(0); // detached here: it was moved, not copied
    // Every column of every path was moved (columns share buffers in groups, so count columns, not buffers).
    const columns = results.cases.flatMap((c) => [c.path, c.path.film, c.path.heat].flatMap((g) => (g ? Object.values(g).filter((v) => ArrayBuffer.isView(v)) : [])));
    expect(columns.length).toBeGreaterThan(results.cases.length * 10);
    for (const v of columns) expect((v as Float64Array).length).toBe(0);
    // The engine kept nothing in those buffers: the next recompute gives the same numbers.
    expect(run(r).cases[0]!.path.hertzStress_MPa[3]).toBe(before);
    expect(JSON.stringify(run(r).gradeFinder)).toBe(JSON.stringify(moved.gradeFinder));
  });
  it('covers every mesh of a planetary stage', () => {
    const results = run(review('assets/demo/harrow-creek-ball-mill-planetary.flankfilm.json'));
    const buffers = pathBuffers(results);
    const meshCases = (results.meshes ?? []).reduce((n, m) => n + m.cases.length, 0);
    expect(meshCases).toBeGreaterThan(0);
    expect(() => structuredClone(results, { transfer: buffers })).not.toThrow();
    for (const m of results.meshes ?? []) for (const c of m.cases) expect(c.path.position_mm.length).toBe(0);
  });
});
