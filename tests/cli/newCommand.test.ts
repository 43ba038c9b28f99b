import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parseReviewText, parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';
import { cli } from './cliHarness';

const dir = () => mkdtempSync(join(tmpdir(), 'flankfilm-new-'));

describe('flankfilm new [spur|helical|internal|planetary] FILE', () => {
  it('writes a spur template with engineering defaults only: nothing of the demo, and it does not compute until filled in', async () => {
    const file = join(dir(), 'pair.flankfilm.json');
    const r = await cli('new', 'spur', file);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/Fill in:/);
    const text = readFileSync(file, 'utf8');
    expect(text).not.toMatch(/Harrow|DEMO|invented/i);
    const review = JSON.parse(text) as { gearPair: { normalPressureAngle_deg: number; helixAngle_deg: number }; id?: string; date?: string };
    expect(review.gearPair.normalPressureAngle_deg).toBe(20); // ISO 53 basic rack
    expect(review.gearPair.helixAngle_deg).toBe(0); // spur: β = 0
    expect(review.id).toBeUndefined();
    expect(review.date).toBeUndefined();
    const parsed = parseReviewText(text);
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) {
      const paths = parsed.issues.map((i) => i.path);
      // What belongs to the user's gearbox, duty and oil is left for them to enter.
      for (const p of ['gearPair.normalModule_mm', 'gearPair.faceWidth_mm', 'gearPair.pinion.teeth', 'loadCases[0].pinionSpeed_rpm', 'oils[0].kv40_mm2s', 'oils[1].fzgFailureStage']) expect(paths).toContain(p);
    }
    // review refuses it, naming the values to fill in
    const review2 = await cli('review', file);
    expect(review2.code).toBe(1);
    expect(review2.err).toMatch(/normalModule_mm/);
  });

  it('helical template starts at β = 15°; the template defaults to spur', async () => {
    const d = dir();
    expect((await cli('new', 'helical', join(d, 'h.json'))).code).toBe(0);
    expect((JSON.parse(readFileSync(join(d, 'h.json'), 'utf8')) as { gearPair: { helixAngle_deg: number } }).gearPair.helixAngle_deg).toBe(15);
    expect((await cli('new', join(d, 's.json'))).code).toBe(0);
    expect((JSON.parse(readFileSync(join(d, 's.json'), 'utf8')) as { gearPair: { helixAngle_deg: number } }).gearPair.helixAngle_deg).toBe(0);
  });

  it('refuses to overwrite an existing file, and refuses a bad call with the usage', async () => {
    const file = join(dir(), 'mine.flankfilm.json');
    writeFileSync(file, 'my own work');
    const r = await cli('new', 'spur', file);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/exists; not overwritten/);
    expect(readFileSync(file, 'utf8')).toBe('my own work');
    const bad = await cli('new', 'planetary', 'a.json', 'b.json');
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/usage/);
  });

  it('internal and planetary templates: the user\'s values are left out and marked; filled with the invented demo\'s values they compute', async () => {
    const d = dir();
    expect((await cli('new', 'internal', join(d, 'i.json'))).code).toBe(0);
    const planetary = await cli('new', 'planetary', join(d, 'p.json'));
    expect(planetary.code).toBe(0);
    expect(planetary.out).toContain('planetary stage template');
    expect(planetary.out).toContain('number of planets, the member held');
    const internal = JSON.parse(readFileSync(join(d, 'i.json'), 'utf8'));
    expect(internal.gearPair.kind).toBe('internal');
    const stage = JSON.parse(readFileSync(join(d, 'p.json'), 'utf8'));
    expect(stage.gearPair).toBeUndefined();
    for (const [raw, paths] of [
      [internal, ['gearPair.normalModule_mm', 'gearPair.wheel.teeth', 'loadCases[0].pinionSpeed_rpm', 'oils[0].kv40_mm2s']],
      [stage, ['planetary.normalModule_mm', 'planetary.planets', 'planetary.held', 'planetary.sun.teeth', 'planetary.ring.roughnessRa_um', 'loadCases[0].sunSpeed_rpm', 'oils[1].fzgFailureStage']],
    ] as const) {
      const parsed = parseReviewValue(raw);
      expect(parsed.ok).toBe(false);
      if (!parsed.ok) for (const p of paths) expect(parsed.issues.map((i) => i.path)).toContain(p);
    }
    // The planetary template with the user's values of the invented demo's ball mill (from the demo file).
    const demo = JSON.parse(readFileSync('assets/demo/harrow-creek-ball-mill-planetary.flankfilm.json', 'utf8'));
    const filled = {
      ...stage,
      planetary: { ...stage.planetary, ...demo.planetary },
      loadCases: [{ ...stage.loadCases[0], ...demo.loadCases[0], timeShare: 1 }],
      oils: demo.oils.slice(0, 2),
    };
    const ok = parseReviewValue(filled);
    if (!ok.ok) throw new Error(JSON.stringify(ok.issues));
    const results = run(ok.review);
    expect(results.meshes).toHaveLength(2);
    expect(results.cases.length).toBeGreaterThan(0);
  });
});
