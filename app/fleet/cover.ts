/**
 * The smallest set of candidate oils that covers every gearbox: an exact set-cover search.
 *
 * Cost, compared in order: the number of oils, then the number of EP oils, then the number of
 * distinct viscosity grades. The search branches on the uncovered gearbox with the fewest oils
 * that serve it (every cover holds one of them), the k-th branch excluding the oils of branches
 * 1…k−1, so no cover is visited twice. A branch is cut when a lower bound on its cost cannot beat
 * the best cover found: its size is at least the chosen count plus the larger of
 *   - ⌈uncovered / the most uncovered gearboxes any one available oil serves⌉, and
 *   - the count of uncovered gearboxes no two of which share an available oil (each needs its own),
 * and its EP count and grade count can only grow. A greedy cover seeds the best.
 *
 * Remaining ties (equal size, EP count and grade count) go to the first cover found in this
 * fixed search order, so the answer is deterministic. Pure; no allocation in the inner loops
 * beyond small typed arrays per call.
 */

export interface CoverCandidate {
  /** Indices (0 … elements − 1) of the gearboxes this oil serves. */
  readonly covers: readonly number[];
  readonly ep: boolean;
  /** The viscosity grade as a key: two oils of one grade share it. */
  readonly grade: string;
}

export interface CoverCost {
  readonly size: number;
  readonly ep: number;
  readonly grades: number;
}

export interface CoverResult {
  /** Indices of the chosen candidates, ascending. */
  readonly chosen: number[];
  readonly cost: CoverCost;
  /** Gearboxes no candidate serves (left out of the cover). */
  readonly uncoverable: number[];
  /** True when the search finished: the cover is proven smallest under the cost order. */
  readonly exact: boolean;
  /** Search nodes visited. */
  readonly nodes: number;
}

/** The default bound on search nodes (a few seconds at most): far above what 30 candidates need (hundreds to a few thousand), so only much larger lists stop early, marked not proven smallest. */
export const DEFAULT_NODE_BUDGET = 250_000;

/** Negative when a is cheaper than b. */
export function compareCost(a: CoverCost, b: CoverCost): number {
  return a.size - b.size || a.ep - b.ep || a.grades - b.grades;
}

/** The cost of a set of candidate indices. */
export function costOf(candidates: readonly CoverCandidate[], chosen: readonly number[]): CoverCost {
  const grades = new Set(chosen.map((i) => candidates[i]?.grade));
  return { size: chosen.length, ep: chosen.filter((i) => candidates[i]?.ep).length, grades: grades.size };
}

export function smallestCover(elements: number, candidates: readonly CoverCandidate[], options: { nodeBudget?: number } = {}): CoverResult {
  const k = candidates.length;
  if (!Number.isInteger(elements) || elements < 0) throw new RangeError(`smallestCover: elements must be a whole number ≥ 0 (got ${elements})`);
  // Which candidates serve each element.
  const servedBy: number[][] = Array.from({ length: elements }, () => []);
  candidates.forEach((c, ci) => {
    for (const e of c.covers) {
      if (!Number.isInteger(e) || e < 0 || e >= elements) throw new RangeError(`smallestCover: candidate ${ci} covers ${e}, outside 0…${elements - 1}`);
      const list = servedBy[e] as number[];
      if (list[list.length - 1] !== ci) list.push(ci);
    }
  });
  const uncoverable: number[] = [];
  const coverCount = new Int32Array(elements);
  let uncovered = 0;
  for (let e = 0; e < elements; e++) {
    if ((servedBy[e] as number[]).length === 0) {
      uncoverable.push(e);
      coverCount[e] = 1; // counted as covered so the search ignores it
    } else uncovered++;
  }
  const covers = candidates.map((c) => [...new Set(c.covers)]);
  const state = new Int8Array(k); // 0 available, 1 chosen, −1 excluded
  const gradeUse = new Map<string, number>();
  const stack: number[] = [];
  let ep = 0;
  let best: number[] = greedy();
  let bestCost = costOf(candidates, best);
  let nodes = 0;
  const budget = options.nodeBudget ?? DEFAULT_NODE_BUDGET;
  let exhausted = false;
  const marks = new Int32Array(k);
  let markEpoch = 0;

  function gain(ci: number): number {
    let g = 0;
    for (const e of covers[ci] as number[]) if (coverCount[e] === 0) g++;
    return g;
  }

  function choose(ci: number, sign: 1 | -1): void {
    for (const e of covers[ci] as number[]) {
      if (sign === 1 && coverCount[e] === 0) uncovered--;
      coverCount[e] = (coverCount[e] as number) + sign;
      if (sign === -1 && coverCount[e] === 0) uncovered++;
    }
    const c = candidates[ci] as CoverCandidate;
    if (c.ep) ep += sign;
    gradeUse.set(c.grade, (gradeUse.get(c.grade) ?? 0) + sign);
    if (gradeUse.get(c.grade) === 0) gradeUse.delete(c.grade);
  }

  function greedy(): number[] {
    const picked: number[] = [];
    while (uncovered > 0) {
      let bi = -1;
      let bg = 0;
      for (let ci = 0; ci < k; ci++) {
        if (state[ci] !== 0) continue;
        const g = gain(ci);
        const better = g > bg || (g === bg && g > 0 && bi >= 0 && !(candidates[ci] as CoverCandidate).ep && (candidates[bi] as CoverCandidate).ep);
        if (better) {
          bi = ci;
          bg = g;
        }
      }
      if (bi < 0) break;
      state[bi] = 1;
      choose(bi, 1);
      picked.push(bi);
    }
    for (const ci of picked) {
      state[ci] = 0;
      choose(ci, -1);
    }
    ep = 0;
    gradeUse.clear();
    return picked.sort((a, b) => a - b);
  }

  function search(): void {
    if (exhausted) return;
    if (++nodes > budget) {
      exhausted = true;
      return;
    }
    if (uncovered === 0) {
      const cost: CoverCost = { size: stack.length, ep, grades: gradeUse.size };
      if (compareCost(cost, bestCost) < 0) {
        best = [...stack].sort((a, b) => a - b);
        bestCost = cost;
      }
      return;
    }
    // The uncovered element with the fewest available candidates, and the largest gain.
    let pick = -1;
    let pickCount = Infinity;
    let maxGain = 0;
    for (let ci = 0; ci < k; ci++) if (state[ci] === 0) maxGain = Math.max(maxGain, gain(ci));
    if (maxGain === 0) return;
    const order: Array<[number, number]> = [];
    for (let e = 0; e < elements; e++) {
      if (coverCount[e] !== 0) continue;
      let n = 0;
      for (const ci of servedBy[e] as number[]) if (state[ci] === 0) n++;
      if (n === 0) return; // this branch excluded every oil that serves e
      order.push([n, e]);
      if (n < pickCount) {
        pickCount = n;
        pick = e;
      }
    }
    // Lower bounds on the size of any completion.
    order.sort((a, b) => a[0] - b[0] || a[1] - b[1]);
    markEpoch++;
    let independent = 0;
    for (const [, e] of order) {
      const list = servedBy[e] as number[];
      let free = true;
      for (const ci of list) if (state[ci] === 0 && marks[ci] === markEpoch) free = false;
      if (!free) continue;
      independent++;
      for (const ci of list) marks[ci] = markEpoch;
    }
    const lb: CoverCost = { size: stack.length + Math.max(Math.ceil(uncovered / maxGain), independent), ep, grades: gradeUse.size };
    if (compareCost(lb, bestCost) >= 0) return;
    const branch = (servedBy[pick] as number[]).filter((ci) => state[ci] === 0);
    const gains = branch.map((ci) => gain(ci));
    const idx = branch.map((_, i) => i).sort((a, b) => (gains[b] as number) - (gains[a] as number) || Number((candidates[branch[a] as number] as CoverCandidate).ep) - Number((candidates[branch[b] as number] as CoverCandidate).ep) || a - b);
    const excluded: number[] = [];
    for (const i of idx) {
      const ci = branch[i] as number;
      state[ci] = 1;
      choose(ci, 1);
      stack.push(ci);
      search();
      stack.pop();
      choose(ci, -1);
      state[ci] = -1;
      excluded.push(ci);
      if (exhausted) break;
    }
    for (const ci of excluded) state[ci] = 0;
  }

  search();
  return { chosen: best, cost: bestCost, uncoverable, exact: !exhausted, nodes };
}
