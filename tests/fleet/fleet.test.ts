import { describe, expect, it } from 'vitest';
import { run } from '../../app/review/run';
import { runFleet } from '../../app/fleet/fleet';
import { fitRow, withOils } from '../../app/fleet/fit';
import { AW, EP, HAND_FLEET, RO, gearbox, parsed } from './fixtures';

const oils = [RO, AW, EP];
const reviews = HAND_FLEET.map((v) => ({ source: `${v.title}.flankfilm.json`, review: parsed(gearbox(v)) }));
const needOf = (i: number) => run(withOils((reviews[i] as (typeof reviews)[number]).review, oils)).need;

describe('a hand-built fleet whose answer is known', () => {
  it('premises: G1 needs EP chemistry, G2 and G3 do not, G4 is beyond oil chemistry (each under its own policy)', () => {
    expect(needOf(0)?.chemistry).toBe('extreme-pressure');
    expect(needOf(1)?.chemistry).not.toBe('extreme-pressure');
    expect(needOf(2)?.chemistry).not.toBe('extreme-pressure');
    expect(needOf(3)?.chemistry).toBe('beyond-oil');
  });

  const r = runFleet({ gearboxes: reviews, oils });

  it('one EP oil covers every gearbox that any candidate serves', () => {
    expect(r.cover).toEqual([EP.name]);
    expect(r.coverExact).toBe(true);
    expect(r.coverCost).toEqual({ oils: 1, epOils: 1, grades: 1 });
    expect(r.fit.filter((c) => c.oil === EP.name && c.gearbox !== HAND_FLEET[3]?.title).every((c) => c.meets)).toBe(true);
    expect(r.fit.filter((c) => c.gearbox === HAND_FLEET[0]?.title && c.meets).map((c) => c.oil)).toEqual([EP.name]);
  });

  it('the gearbox no candidate serves is listed apart, with the closest candidate and its shortfall', () => {
    expect(r.unserved.map((u) => u.gearbox)).toEqual([HAND_FLEET[3]?.title]);
    const u = r.unserved[0];
    expect(u?.closest).not.toBeNull();
    expect(u?.shortfalls).toContain('beyond-oil');
    expect(r.assignment.map((a) => a.gearbox)).not.toContain(HAND_FLEET[3]?.title);
  });

  it('assigns every served gearbox an oil from the set, keeping its current oil where that oil is in the set', () => {
    expect(r.assignment).toEqual([
      { gearbox: HAND_FLEET[0]?.title, oil: EP.name, keepsCurrent: true },
      { gearbox: HAND_FLEET[1]?.title, oil: EP.name, keepsCurrent: false },
      { gearbox: HAND_FLEET[2]?.title, oil: EP.name, keepsCurrent: false },
    ]);
    expect(r.cautions.find((c) => c.id === 'flushing')?.gearboxes).toEqual([HAND_FLEET[1]?.title, HAND_FLEET[2]?.title]);
    expect(r.cautions.find((c) => c.id === 'defer')?.applies).toBe(true);
  });

  it('breaks a tie between one-oil covers by fewer EP oils', () => {
    const g3 = runFleet({ gearboxes: [reviews[2] as (typeof reviews)[number]], oils: [EP, AW] });
    expect(g3.fit.every((c) => c.meets)).toBe(true); // premise: both serve G3
    expect(g3.cover).toEqual([AW.name]);
    expect(g3.assignment[0]).toEqual({ gearbox: HAND_FLEET[2]?.title, oil: AW.name, keepsCurrent: true });
  });

  it('an oil run with the other candidates gets the same verdict as run alone', () => {
    const rv = (reviews[0] as (typeof reviews)[number]).review;
    const together = fitRow('G1', rv, oils);
    for (const o of oils) expect(fitRow('G1', rv, [o])[0]).toEqual(together.find((c) => c.oil === o.name));
  });

  it('reports progress per gearbox and carries failed reviews along', () => {
    const seen: number[] = [];
    const f = runFleet({ gearboxes: reviews.slice(0, 2), oils, failed: [{ source: 'bad.flankfilm.json', message: 'bad.flankfilm.json: not valid JSON' }], onProgress: (d) => seen.push(d) });
    expect(seen).toEqual([3, 6]);
    expect(f.failed).toHaveLength(1);
    expect(f.gearboxes).toHaveLength(2);
  });

  it('a gearbox the engine cannot compute is listed as failed, the others go on', () => {
    const broken = gearbox(HAND_FLEET[1] as (typeof HAND_FLEET)[number]);
    broken.gearPair.centerDistance_mm = 100; // far below the sum of the pitch radii: impossible mesh
    const rv = parsed(broken);
    expect(() => run(withOils(rv, oils))).toThrow();
    const f = runFleet({ gearboxes: [{ source: 'broken.flankfilm.json', review: rv }, reviews[0] as (typeof reviews)[number]], oils });
    expect(f.failed.map((x) => x.source)).toEqual(['broken.flankfilm.json']);
    expect(f.failed[0]?.message).toMatch(/centerDistance|centre distance/i);
    expect(f.cover).toEqual([EP.name]);
  });
});
