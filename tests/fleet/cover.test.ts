import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { compareCost, costOf, smallestCover, type CoverCandidate } from '../../app/fleet/cover';

/** Every subset of the candidates, the cheapest that covers every coverable element. */
function bruteForce(elements: number, cands: readonly CoverCandidate[]): { cost: ReturnType<typeof costOf> } {
  const coverable = new Set(cands.flatMap((c) => c.covers));
  let best: ReturnType<typeof costOf> | null = null;
  for (let mask = 0; mask < 1 << cands.length; mask++) {
    const chosen = cands.map((_, i) => i).filter((i) => mask & (1 << i));
    const got = new Set(chosen.flatMap((i) => (cands[i] as CoverCandidate).covers));
    if (got.size !== coverable.size) continue;
    const cost = costOf(cands, chosen);
    if (best === null || compareCost(cost, best) < 0) best = cost;
  }
  void elements;
  return { cost: best as ReturnType<typeof costOf> };
}

const instance = fc.integer({ min: 1, max: 12 }).chain((elements) =>
  fc.record({
    elements: fc.constant(elements),
    cands: fc.array(
      fc.record({
        covers: fc.uniqueArray(fc.integer({ min: 0, max: elements - 1 }), { maxLength: elements }),
        ep: fc.boolean(),
        grade: fc.constantFrom('VG 150', 'VG 220', 'VG 320', 'VG 460'),
      }),
      { minLength: 0, maxLength: 10 },
    ),
  }),
);

describe('exact set cover (smallest oil set)', () => {
  it('matches brute force on random small instances: same cost (oils, then EP oils, then grades), a true cover', () => {
    fc.assert(
      fc.property(instance, ({ elements, cands }) => {
        const r = smallestCover(elements, cands);
        const covered = new Set(r.chosen.flatMap((i) => (cands[i] as CoverCandidate).covers));
        const coverable = new Set(cands.flatMap((c) => c.covers));
        expect(covered).toEqual(coverable);
        expect(r.uncoverable).toEqual([...Array(elements).keys()].filter((e) => !coverable.has(e)));
        expect(r.exact).toBe(true);
        expect(r.cost).toEqual(costOf(cands, r.chosen));
        expect(r.cost).toEqual(bruteForce(elements, cands).cost);
      }),
      { seed: 20261202, numRuns: 400 },
    );
  });

  it('breaks ties by fewer EP oils, then fewer viscosity grades', () => {
    const two = smallestCover(2, [
      { covers: [0, 1], ep: true, grade: 'VG 320' },
      { covers: [0, 1], ep: false, grade: 'VG 320' },
    ]);
    expect(two.chosen).toEqual([1]);
    const grades = smallestCover(4, [
      { covers: [0, 1], ep: false, grade: 'VG 220' },
      { covers: [2, 3], ep: false, grade: 'VG 320' },
      { covers: [0, 1], ep: false, grade: 'VG 320' },
    ]);
    expect(grades.chosen).toEqual([1, 2]);
    expect(grades.cost).toEqual({ size: 2, ep: 0, grades: 1 });
  });

  it('leaves out elements no candidate covers', () => {
    const r = smallestCover(3, [{ covers: [0], ep: false, grade: 'a' }]);
    expect(r.chosen).toEqual([0]);
    expect(r.uncoverable).toEqual([1, 2]);
    expect(smallestCover(2, []).uncoverable).toEqual([0, 1]);
  });

  it('refuses an element index outside the range, naming it', () => {
    expect(() => smallestCover(2, [{ covers: [2], ep: false, grade: 'a' }])).toThrow(/covers 2, outside 0…1/);
  });

  it('says when a node budget cut the search short (the cover is then not proven smallest)', () => {
    const cands = [...Array(12).keys()].map((i) => ({ covers: [i % 6, (i * 5 + 1) % 6], ep: i % 2 === 0, grade: `VG ${i % 3}` }));
    const r = smallestCover(6, cands, { nodeBudget: 1 });
    expect(r.exact).toBe(false);
    expect(new Set(r.chosen.flatMap((i) => cands[i]?.covers ?? [])).size).toBe(6);
  });

  it('solves 30 candidates × 60 gearboxes exactly within 1 s (issue target)', () => {
    // A deterministic pseudo-random instance (LCG, Numerical Recipes constants): each oil serves
    // about a quarter of the gearboxes, so the smallest cover has several oils and many near-ties.
    let s = 12345;
    const rnd = () => ((s = (1664525 * s + 1013904223) >>> 0) / 2 ** 32);
    const cands: CoverCandidate[] = [...Array(30).keys()].map(() => ({
      covers: [...Array(60).keys()].filter(() => rnd() < 0.25),
      ep: rnd() < 0.4,
      grade: `VG ${[150, 220, 320, 460][Math.floor(rnd() * 4)]}`,
    }));
    const t0 = performance.now();
    const r = smallestCover(60, cands);
    const ms = performance.now() - t0;
    expect(r.exact).toBe(true);
    expect(ms).toBeLessThan(1000);
    console.log(`cover: 30 candidates × 60 gearboxes, ${r.cost.size} oils, ${r.nodes} nodes, ${ms.toFixed(1)} ms`);
  });
});
