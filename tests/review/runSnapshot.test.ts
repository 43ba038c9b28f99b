/**
 * Results stay bit-identical: run() on each shipped review gives the numbers recorded in
 * fixtures/demoRuns.json (written by scripts/snapshotDemoRuns.ts), part by part, and the same
 * numbers twice in one process. A speed-up of the engine must pass this unchanged.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { SHIPPED_REVIEWS, demoRunHashes } from './demoRunHashes';

const snapshot = JSON.parse(readFileSync('tests/review/fixtures/demoRuns.json', 'utf8')) as { node: string; reviews: Record<string, Record<string, string>> };

describe('run() is bit-identical to the recorded snapshot', () => {
  it('the snapshot covers every shipped review', () => {
    expect(Object.keys(snapshot.reviews).sort()).toEqual([...SHIPPED_REVIEWS].sort());
  });
  for (const file of SHIPPED_REVIEWS) {
    it(file, () => {
      const now = demoRunHashes(file);
      const recorded = snapshot.reviews[file] ?? {};
      // Part by part first, so a failure names the load case × oil or the section that moved.
      const moved = Object.keys({ ...recorded, ...now }).filter((k) => recorded[k] !== now[k]);
      expect(moved, `parts whose results changed (recorded on Node ${snapshot.node}; regenerate only for an intended change)`).toEqual([]);
      expect(demoRunHashes(file)).toEqual(now);
    });
  }
});
