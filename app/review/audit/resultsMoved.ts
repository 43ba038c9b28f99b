/**
 * The results that moved between two computations of a review: per load case and oil the
 * verdict, SB, SintS and λmin, per oil the overall verdict, and per proposed oil the change finding. A figure "moved" when it differs
 * at the three significant digits the screen shows. Cases are matched by load case and oil name.
 * Pure.
 */
import type { CaseResult, ChangeFindingCode, Results, VerdictCode } from '../results';

/** JSON codes of the figures compared (the words are the reader's: VERDICT_WORDS, SB, SintS, λmin). */
export type MovedQuantity = 'verdict' | 'scuffingSafety' | 'integralSafety' | 'lambdaMin' | 'oilVerdict' | 'changeFinding';

export interface ResultMove {
  readonly quantity: MovedQuantity;
  /** Null for the overall verdict of an oil. */
  readonly loadCase: string | null;
  readonly oil: string | null;
  /** A verdict code, a change finding code (for `changeFinding`, with `oil` the proposed oil) or a figure. */
  readonly before: VerdictCode | ChangeFindingCode | number | null;
  readonly after: VerdictCode | ChangeFindingCode | number | null;
}

export interface MovedResults {
  readonly moves: ResultMove[];
  /** Whether a verdict on both sides (of a case, or of an oil overall) changed its word; a case or oil only on one side does not count. */
  readonly verdictChanged: boolean;
}

export const QUANTITY_SYMBOLS: Readonly<Record<MovedQuantity, string>> = {
  verdict: 'verdict',
  scuffingSafety: 'SB',
  integralSafety: 'SintS',
  lambdaMin: 'λmin',
  oilVerdict: 'overall verdict',
  changeFinding: 'change finding',
};

const shown = (x: number | null): number | null => (x === null ? null : Number(x.toPrecision(3)));
const key = (c: CaseResult) => `${c.loadCase}\u0000${c.oil ?? ''}`;

export function resultsMoved(before: Results, after: Results): MovedResults {
  const moves: ResultMove[] = [];
  const was = new Map(before.cases.map((c) => [key(c), c]));
  const now = new Map(after.cases.map((c) => [key(c), c]));
  const keys = [...after.cases.map(key), ...before.cases.map(key).filter((k) => !now.has(k))];
  for (const k of keys) {
    const b = was.get(k);
    const a = now.get(k);
    const ref = (a ?? b) as CaseResult;
    const at = { loadCase: ref.loadCase, oil: ref.oil };
    const bv = b?.verdict?.code ?? null;
    const av = a?.verdict?.code ?? null;
    if (bv !== av) moves.push({ quantity: 'verdict', ...at, before: bv, after: av });
    for (const q of ['scuffingSafety', 'integralSafety', 'lambdaMin'] as const) {
      const x = shown(b ? b[q] : null);
      const y = shown(a ? a[q] : null);
      if (x !== y) moves.push({ quantity: q, ...at, before: x, after: y });
    }
  }
  const oilWas = new Map(before.verdicts.map((v) => [v.oil, v.code]));
  const oilNow = new Map(after.verdicts.map((v) => [v.oil, v.code]));
  for (const oil of [...oilNow.keys(), ...[...oilWas.keys()].filter((o) => !oilNow.has(o))]) {
    const b = oilWas.get(oil) ?? null;
    const a = oilNow.get(oil) ?? null;
    if (b !== a) moves.push({ quantity: 'oilVerdict', loadCase: null, oil, before: b, after: a });
  }
  const changeWas = new Map(before.changes.map((c) => [c.to, c.finding]));
  const changeNow = new Map(after.changes.map((c) => [c.to, c.finding]));
  for (const to of [...changeNow.keys(), ...[...changeWas.keys()].filter((o) => !changeNow.has(o))]) {
    const b = changeWas.get(to) ?? null;
    const a = changeNow.get(to) ?? null;
    if (b !== a) moves.push({ quantity: 'changeFinding', loadCase: null, oil: to, before: b, after: a });
  }
  return { moves, verdictChanged: moves.some((m) => (m.quantity === 'verdict' || m.quantity === 'oilVerdict' || m.quantity === 'changeFinding') && m.before !== null && m.after !== null) };
}
