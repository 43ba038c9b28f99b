import { describe, it, expect } from 'vitest';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { parseReviewValue } from '../../app/review/parse';
import type { Review } from '../../app/review/schema';
import { RecomputeClient } from '../../renderer/worker/recomputeClient';
import type { RecomputeResponse } from '../../renderer/worker/protocol';

const parsed = parseReviewValue(DEMO_REVIEWS['harrow-creek-crusher-hs-pair.flankfilm.json']);
if (!parsed.ok) throw new Error('the demo must parse');
const review: Review = parsed.review;
const withTorque = (t: number): Review => ({ ...review, loadCases: review.loadCases.map((c, i) => (i === 0 ? { ...c, power_kW: undefined, pinionTorque_Nm: t } : c)) });

// Node has no Web Worker: the client takes its fallback path (after a macrotask), which must be latest-wins as well.
describe('RecomputeClient (latest wins)', () => {
  it('a burst of edits: only the newest is computed after the one in flight, and only it is answered', async () => {
    const seen: RecomputeResponse[] = [];
    let done: () => void = () => undefined;
    const finished = new Promise<void>((r) => (done = r));
    const client = new RecomputeClient((res) => {
      seen.push(res);
      if (res.edition === 5) done();
    });
    for (let e = 1; e <= 5; e++) client.request({ edition: e, review: withTorque(1000 + e * 100) });
    await finished;
    // Edition 1 was already in flight and its answer is stale on arrival; 2–4 were never sent.
    expect(seen.map((r) => r.edition)).toEqual([5]);
    const last = seen.at(-1)!;
    expect(last.ok && last.results.cases[0]?.pinionTorque_Nm).toBe(1500);
    client.dispose();
  });
  it('an EngineInputError comes back with its field and message', async () => {
    const res = await new Promise<RecomputeResponse>((r) => {
      const client = new RecomputeClient(r);
      client.request({ edition: 1, review: { ...review, gearPair: { ...(review.gearPair as NonNullable<typeof review.gearPair>), centerDistance_mm: 100 } } });
    });
    expect(res.ok).toBe(false);
    if (!res.ok) {
      expect(res.error.field).toBe('gearPair.centerDistance_mm');
      expect(res.error.message).toMatch(/base circles would overlap/);
    }
  });
});
