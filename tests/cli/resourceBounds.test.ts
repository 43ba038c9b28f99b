/**
 * The largest reviews the schema accepts (load cases × oils × path points at MAX_REVIEW_POINTS)
 * finish `review --json` and `review --pdf` within 30 s of CPU time and 1 GB of memory, each in
 * a child process so its peak memory is its own; one point more is refused with a message that
 * names the limit. Before the bound, 20 × 10 × 5001 made --json fail (a 2.3 GB string) and --pdf
 * take 121 s and 2.4 GB. CPU time, not wall time: two shared cores make the wall clock noisy.
 */
import { describe, expect, it, beforeAll } from 'vitest';
import { spawnSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { MAX_REVIEW_POINTS } from '../../app/review/schema';
import { CRUSHER, tempDir } from '../report/helpers';
import { cli } from './cliHarness';

const MEASURE = join(__dirname, 'fixtures', 'measure.ts');
let dir: string;
beforeAll(() => {
  dir = tempDir('flankfilm-bounds-');
});

/** The crusher demo with `cases` load cases, `oils` oils and `points` path points. */
function review(cases: number, oils: number, points: number): string {
  const r = JSON.parse(readFileSync(CRUSHER, 'utf8'));
  const lc = r.loadCases;
  const ol = r.oils;
  r.loadCases = Array.from({ length: cases }, (_, i) => ({ ...lc[i % lc.length], name: `case ${i + 1}`, timeShare: 1 / cases }));
  r.oils = Array.from({ length: oils }, (_, i) => ({ ...ol[i % ol.length], name: `oil ${i + 1}` }));
  r.policy = { ...(r.policy ?? {}), pathPoints: points };
  const p = join(dir, `r-${cases}-${oils}-${points}.flankfilm.json`);
  writeFileSync(p, JSON.stringify(r));
  return p;
}

function measure(...args: string[]): { code: number; cpuSeconds: number; maxRssMB: number; outBytes: number } {
  const r = spawnSync(process.execPath, ['--import', 'tsx', MEASURE, ...args], { encoding: 'utf8', maxBuffer: 16 * 1024 * 1024 });
  const last = r.stderr.trim().split('\n').at(-1) ?? '';
  return JSON.parse(last);
}

describe('resource bounds of the largest accepted review', () => {
  // 20 × 10 × 100 = 20 000 (most pages and maps), 4 × 1 × 5001 = 20 004 (most points per chart)
  for (const [cases, oils, points] of [
    [20, 10, 100],
    [4, 1, 5001],
  ] as const) {
    it(`${cases} cases × ${oils} oils × ${points} points: --json and --pdf each under 30 s CPU and 1 GB`, () => {
      expect(cases * oils * points).toBeLessThanOrEqual(MAX_REVIEW_POINTS);
      const file = review(cases, oils, points);
      const json = measure('review', file, '--json');
      expect(json.code).toBe(0);
      expect(json.outBytes).toBeGreaterThan(1e6);
      expect(json.cpuSeconds).toBeLessThan(30);
      expect(json.maxRssMB).toBeLessThan(1024);
      const pdf = measure('review', file, '--pdf', join(dir, `r-${cases}-${oils}-${points}.pdf`));
      expect(pdf.code).toBe(0);
      expect(pdf.cpuSeconds).toBeLessThan(30);
      expect(pdf.maxRssMB).toBeLessThan(1024);
      console.log(`bounds ${cases}×${oils}×${points}: --json ${json.cpuSeconds.toFixed(1)} s CPU, ${json.maxRssMB.toFixed(0)} MB, ${(json.outBytes / 1e6).toFixed(1)} MB out; --pdf ${pdf.cpuSeconds.toFixed(1)} s CPU, ${pdf.maxRssMB.toFixed(0)} MB`);
    }, 300_000);
  }

  it('one step past the bound is refused, naming the limit and the field (exit 1)', async () => {
    const r = await cli('review', review(20, 10, 101), '--json');
    expect(r.code).toBe(1);
    expect(r.err).toContain(`policy.pathPoints: load cases × oils × path points = 20 × 10 × 101 = 20200, more than the ${MAX_REVIEW_POINTS}`);
    const old = await cli('review', review(20, 10, 5001), '--json'); // the case of the report
    expect(old.code).toBe(1);
  });
});
