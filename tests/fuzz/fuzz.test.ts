import { describe, expect, it } from 'vitest';
import { fuzz, summaryLine } from './fuzzer';
import { fuzzOutputs } from './outputs';

describe('review fuzzer (short run; `npm run fuzz -- --runs 10000` for the long one)', () => {
  it('300 cases: no crash, no non-finite output, every rejection names a field', async () => {
    const s = await fuzz({ runs: 300, seed: 20261201, recordEvery: 100, ...fuzzOutputs() });
    console.log(summaryLine(s));
    expect(s.firstProblems).toEqual([]);
    expect(s.crashes).toBe(0);
    expect(s.nonFinite).toBe(0);
    expect(s.rejectedWithoutPath).toBe(0);
    expect(s.rejected).toBeGreaterThan(0);
    expect(s.rejected).toBeLessThan(s.cases);
  }, 120_000);
});
