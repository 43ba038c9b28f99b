import { describe, expect, it } from 'vitest';
import { usableMaxVG, usableOverCases } from '../../app/review/gradeLimits';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';

describe('grades the lubrication method can use (common practice)', () => {
  it('dip lubrication: the faster the mesh, the lighter the heaviest grade (churning losses)', () => {
    expect(usableMaxVG('dip', 2).maxVG).toBe(1500); // common practice
    expect(usableMaxVG('dip', 7.4).maxVG).toBe(680); // common practice
    expect(usableMaxVG('dip', 20).maxVG).toBe(320); // common practice
    expect(usableMaxVG('dip', 7.4).reason).toMatch(/churn/);
    expect(usableMaxVG('spray', 1).maxVG).toBe(460); // common practice: pump, filter and nozzles
  });
  it('the most restrictive case governs and is named', () => {
    const u = usableOverCases([{ name: 'slow', lubrication: 'dip', pitchLineVelocity_mps: 1 }, { name: 'fast', lubrication: 'dip', pitchLineVelocity_mps: 12 }]);
    expect(u.maxVG).toBe(460);
    expect(u.reason).toContain('“fast”');
  });
  it('the grade finder offers no grade above the limit, and says why the heavier ones are left out', () => {
    const parsed = parseReviewValue(DEMO_REVIEWS['harrow-creek-crusher-hs-pair.flankfilm.json']);
    if (!parsed.ok) throw new Error('demo');
    const r = run(parsed.review);
    const v = Math.max(...r.cases.map((c) => c.pitchLineVelocity_mps));
    const limit = usableMaxVG('dip', v).maxVG;
    for (const g of r.gradeFinder) {
      expect(g.usableMaxVG).toBe(limit);
      for (const row of g.table) expect(row.usable).toBe(row.isoVG <= limit);
      if (g.recommendedVG !== null) expect(g.recommendedVG).toBeLessThanOrEqual(limit);
      expect(g.leftOut).toMatch(new RegExp(`above ISO VG ${limit} are left out: dip lubrication`));
    }
  });
});
