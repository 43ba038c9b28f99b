import { describe, it, expect } from 'vitest';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { operatingMaps } from '../../app/review/operatingMaps';
import { parseReviewValue } from '../../app/review/parse';
import type { Review } from '../../app/review/schema';
import { MapClient } from '../../renderer/worker/mapClient';
import type { MapMessage } from '../../renderer/worker/mapProtocol';

const parsed = parseReviewValue(DEMO_REVIEWS['harrow-creek-crusher-hs-pair.flankfilm.json']);
if (!parsed.ok) throw new Error('the demo must parse');
const review: Review = parsed.review;
const hotter: Review = { ...review, policy: { ...review.policy, temperatureRange_C: [40, 90] } };
const settle = () => new Promise((r) => setTimeout(r, 300));

// Node has no Web Worker: the client takes its fallback path (after a macrotask), with the same rules.
describe('MapClient (latest wins, cancel)', () => {
  it('reports progress map by map, then the maps operatingMaps() gives', async () => {
    const seen: MapMessage[] = [];
    const done = new Promise<void>((ok) => {
      const c = new MapClient((m) => {
        seen.push(m);
        if (m.kind !== 'progress') ok();
      });
      c.start(review, { temperatures: 8, loads: 8 });
    });
    await done;
    const total = review.loadCases.length * review.oils.length;
    expect(seen.filter((m) => m.kind === 'progress').map((m) => (m.kind === 'progress' ? m.done : 0))).toEqual(Array.from({ length: total }, (_, i) => i + 1));
    const last = seen.at(-1);
    expect(last?.kind).toBe('done');
    if (last?.kind === 'done') expect(last.maps).toEqual(operatingMaps(review, { temperatures: 8, loads: 8 }));
  });

  it('a second start abandons the first: only the newest run is answered', async () => {
    const seen: MapMessage[] = [];
    const c = new MapClient((m) => seen.push(m));
    const first = c.start(review, { temperatures: 6, loads: 6 });
    const second = c.start(hotter, { temperatures: 6, loads: 6 });
    await settle();
    expect(seen.some((m) => m.run === first)).toBe(false);
    const last = seen.at(-1);
    expect(last?.run).toBe(second);
    expect(last?.kind === 'done' && last.maps[0]?.temperatures_C[0]).toBe(40);
  });

  it('cancel: nothing of the run arrives afterwards; a cancel with nothing running says so', async () => {
    const seen: MapMessage[] = [];
    const c = new MapClient((m) => seen.push(m));
    c.start(review, { temperatures: 6, loads: 6 });
    expect(c.cancel()).toBe(true);
    await settle();
    expect(seen).toEqual([]);
    expect(c.cancel()).toBe(false);
  });
});
