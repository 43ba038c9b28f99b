import type { CaseResult, VerdictCode } from './results';
import type { Policy } from './schema';

export const SEVERITY: Readonly<Record<VerdictCode, number>> = { 'aw-suffices': 0, 'ep-warranted': 1, 'beyond-oil': 2 };

/**
 * The scuffing margin of one case with one oil: the least ratio of a safety to its policy minimum
 * over the methods in use (SB/SB,min, SintS/SintS,min). An undefined safety (no temperature rise)
 * is no limit: +∞.
 */
export function scuffingMargin(c: CaseResult, p: Policy): number {
  const flash = p.scuffingMethods !== 'integral' && c.scuffingSafety !== null ? c.scuffingSafety / p.scuffingSafetyMin : Infinity;
  const integral = p.scuffingMethods !== 'flash' && c.integralSafety !== null ? c.integralSafety / p.integralSafetyMin : Infinity;
  return Math.min(flash, integral);
}

/**
 * The governing case among `cases` (each with a verdict): the most severe verdict word, and among
 * those the smallest scuffing margin; ties go to the larger time share, then to the first listed.
 */
export function governingCase<T extends { c: CaseResult; share: number }>(cases: readonly T[], p: Policy): T | null {
  let gov: T | null = null;
  let govKey: [number, number, number] = [-1, Infinity, -1];
  for (const x of cases) {
    if (!x.c.verdict) continue;
    const key: [number, number, number] = [SEVERITY[x.c.verdict.code], scuffingMargin(x.c, p), x.share];
    const better = key[0] > govKey[0] || (key[0] === govKey[0] && (key[1] < govKey[1] || (key[1] === govKey[1] && key[2] > govKey[2])));
    if (gov === null || better) {
      gov = x;
      govKey = key;
    }
  }
  return gov;
}
