import { describe, expect, it } from 'vitest';
import { resultsMoved } from '../../app/review/audit/resultsMoved';
import { run } from '../../app/review/run';
import { loadDemo } from '../report/helpers';

/**
 * The audit names a moved change finding. The demo's proposed oil is an EP oil above FZG 12
 * (invented data); made an R&O oil of FZG 6, it falls short on chemistry and FZG stage in the
 * hard-rock case, whose need is above the anti-wear floor or escalated by shock duty (the verdict
 * rules, DIN 51517-3 CLP / 51524-2 HLP floors), so the change is no longer supported.
 */
describe('results that moved: the change finding', () => {
  it('a proposed oil turned into an R&O oil of FZG 6 moves the change to "not supported", and counts as a verdict change', () => {
    const { review, results } = loadDemo();
    const i = review.oils.findIndex((o) => o.role === 'proposed');
    const edited = { ...review, oils: review.oils.map((o, k) => (k === i ? { ...o, chemistry: 'r-and-o' as const, fzgFailureStage: 6 } : o)) };
    const after = run(edited);
    const moved = resultsMoved(results, after);
    const m = moved.moves.find((x) => x.quantity === 'changeFinding');
    expect(m?.oil).toBe(review.oils[i]?.name);
    expect(m?.before).toBe(results.changes[0]?.finding);
    expect(m?.after).toBe('not-supported');
    expect(moved.verdictChanged).toBe(true);
  });
  it('an untouched review moves nothing', () => {
    const { results } = loadDemo();
    expect(resultsMoved(results, results).moves).toEqual([]);
  });
});
