/**
 * The benchmark's report: each figure against its target, and the README's table regenerated
 * between its markers from bench-results.json (the numbers here are a made-up results file).
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { FIGURES, README_BEGIN, README_END, consoleTable, readmeTable, verdictOf, withReadmeTable, type BenchResults } from '../../scripts/bench/targets';

const results: BenchResults = {
  date: '2026-12-02T12:00:00.000Z',
  machine: { cpus: 2, cpuModel: 'test CPU', node: 'v20.20.2', loadAverage: [0.1, 0.2, 0.3] },
  recompute_ms_median: 1.2,
  floor_ratio: 3.4,
  latency_p95_ms: null,
};

describe('bench targets', () => {
  it('every issue target is there: recompute 1.5 ms, floor 3 ×, scaling 2.3 ×, map 50 ms, record 500 ms, latency 50 ms, first paint 500 ms, largest review 30 s and 1 GB', () => {
    const t = Object.fromEntries(FIGURES.map((f) => [f.key, f.target]));
    expect(t).toMatchObject({ recompute_ms_median: 1.5, floor_ratio: 3, scaling_800_over_400: 2.3, map_ms: 50, pdf_ms: 500, latency_p95_ms: 50, first_paint_ms: 500, largest_review_ms: 30000, largest_review_rss_mb: 1024 });
    for (const k of ['ehl_ms', 'planetary_recompute_ms', 'fleet_ms']) expect(t).toHaveProperty(k);
  });
  it('met, missed, not measured', () => {
    const f = (key: string) => FIGURES.find((x) => x.key === key)!;
    expect(verdictOf(f('recompute_ms_median'), 1.2)).toBe('met');
    expect(verdictOf(f('floor_ratio'), 3.4)).toBe('MISSED');
    expect(verdictOf(f('latency_p95_ms'), null)).toBe('not measured');
    expect(verdictOf(f('planetary_recompute_ms'), 3)).toBe('reported');
    const table = consoleTable(results);
    expect(table).toMatch(/recompute_ms_median\s+1\.20 ms\s+≤ 1\.50 ms\s+met/);
    expect(table).toMatch(/floor_ratio\s+3\.40 ×\s+≤ 3\.00 ×\s+MISSED/);
  });
  it('the README table is replaced between its markers, the rest of the file kept', () => {
    const readme = `# Title\n\nbefore\n\n${README_BEGIN}\nold table\n${README_END}\n\nafter\n`;
    const out = withReadmeTable(readme, results);
    expect(out.startsWith('# Title\n\nbefore\n\n')).toBe(true);
    expect(out.endsWith('\n\nafter\n')).toBe(true);
    expect(out).not.toContain('old table');
    expect(out).toContain(readmeTable(results));
    expect(out).toContain('Measured 2026-12-02 on 2 cores (test CPU), Node v20.20.2');
    expect(() => withReadmeTable('# no markers\n', results)).toThrow(/markers/);
  });
  it('the README has the markers', () => {
    const readme = readFileSync('README.md', 'utf8');
    expect(readme.indexOf(README_BEGIN)).toBeGreaterThan(0);
    expect(readme.indexOf(README_END)).toBeGreaterThan(readme.indexOf(README_BEGIN));
  });
});
