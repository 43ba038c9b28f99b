/**
 * The floor of the recompute: a bare loop doing the transcendental operations the recompute cannot
 * avoid, counted from the engine's per-point formulas. `floor_ratio` = recompute / floor.
 *   a case point:   mechanics 2 √ (radii of curvature), Blok 3 √, film 3 ln + 4 exp
 *                   (h_min, h_c, h_Y and the thermal factor φT);
 *   a grade-finder cell (one grade × load case): 4 ln + 4 exp (η, G, the load and the
 *                   Murch–Wilson group); its points only multiply (engine/sweep's per-point factors).
 */
import { run } from '../../app/review/run';
import type { Review } from '../../app/review/schema';

export interface OpCount {
  sqrt: number;
  log: number;
  exp: number;
}

const PER = { casePoint: { sqrt: 5, log: 3, exp: 4 }, finderCell: { sqrt: 0, log: 4, exp: 4 } } as const;

export function opCount(review: Review): OpCount {
  const results = run(review);
  const casePoints = results.cases.reduce((s, c) => s + c.path.n, 0);
  const tables = new Set(results.gradeFinder.map((g) => JSON.stringify(g.table.map((r) => r.isoVG))));
  const rows = [...tables].reduce((s, t) => s + (JSON.parse(t) as unknown[]).length, 0);
  const finderCells = rows * review.loadCases.length;
  const n = (k: keyof OpCount) => casePoints * PER.casePoint[k] + finderCells * PER.finderCell[k];
  return { sqrt: n('sqrt'), log: n('log'), exp: n('exp') };
}

/** The same count of operations on varying arguments, summed so the loop cannot be dropped. */
export function floorLoop(ops: OpCount): number {
  let acc = 0;
  for (let i = 0; i < ops.sqrt; i++) acc += Math.sqrt(1.0001 + i * 1e-7);
  for (let i = 0; i < ops.log; i++) acc += Math.log(1.0001 + i * 1e-7);
  for (let i = 0; i < ops.exp; i++) acc += Math.exp(-1.0001 - i * 1e-9);
  return acc;
}
