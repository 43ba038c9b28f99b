import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';
import { findNonFinite } from '../fuzz/fuzzer';

/** Crashes the property tests and the fuzzer found, kept as fixed cases. */
describe('regressions', () => {
  it('a duty so hot that the bulk temperature leaves the oil model (100 rpm at 200 kW) is reviewed with a warning, not refused', () => {
    const raw = JSON.parse(readFileSync('assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json', 'utf8'));
    raw.loadCases[0].pinionSpeed_rpm = 100;
    raw.gearPair.pinion.profileShift = 0;
    const p = parseReviewValue(raw);
    if (!p.ok) throw new Error(JSON.stringify(p.issues));
    const r = run(p.review);
    const c = r.cases[0];
    expect(c?.warnings.map((w) => w.code)).toContain('film.bulk-temperature-above-oil-range');
    expect(c?.verdict?.code).toBe('beyond-oil');
    expect(findNonFinite(r)).toBeNull();
  });
});
