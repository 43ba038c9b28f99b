/**
 * The results that move with each change on its own: the earlier inputs with only that change
 * applied, recomputed and compared with the earlier results. Changes interact (two together may
 * move a verdict neither moves alone), so the CLI prints these beside, not instead of, the
 * results of all changes together. Pure.
 */
import { EngineInputError } from '../../engine/diagnostics';
import { parseReviewValue } from '../parse';
import type { Results } from '../results';
import { run } from '../run';
import { REVIEW_FORMAT, REVIEW_VERSION, type SignedState } from '../schema';
import { matchEntries, type InputChange } from './diff';
import { resultsMoved, type ResultMove } from './resultsMoved';
import { setIn } from './setIn';

/** Beyond this many changes only the results of all changes together are given (one run each). */
export const MAX_ATTRIBUTED_CHANGES = 20;

type Json = unknown;

const listOf = (s: SignedState, name: string): Json[] => (s as unknown as Record<string, Json[]>)[name] ?? [];

/** The earlier inputs with `change` alone applied (plain JSON, to be parsed). */
export function applyAlone(before: SignedState, after: SignedState, change: InputChange): Json {
  const [list, index, ...rest] = change.segments;
  const named = list === 'loadCases' || list === 'oils';
  const b = named ? listOf(before, list) : [];
  const a = named ? listOf(after, list) : [];
  switch (change.kind) {
    case 'changed': {
      if (!named || typeof index !== 'number') return setIn(before, change.segments, change.after);
      const pair = matchEntries(b, a).pairs.find(([, j]) => j === index);
      const at = pair ? pair[0] : index;
      // What went with the change (a VI left to ASTM D2270) goes with it here too.
      return (change.along ?? []).reduce((r: Json, x) => setIn(r, [list, at, ...x.segments.slice(2)], x.after), setIn(before, [list, at, ...rest], change.after));
    }
    case 'added': {
      const j = Math.min(index as number, b.length);
      return setIn(before, [list as string], [...b.slice(0, j), a[index as number], ...b.slice(j)]);
    }
    case 'removed':
      return setIn(before, [list as string], b.filter((_, i) => i !== index));
    case 'reordered': {
      const { pairs, removed } = matchEntries(b, a);
      const out = pairs.map(([i]) => b[i]);
      for (const i of removed) out.splice(i, 0, b[i]);
      return setIn(before, [list as string], out);
    }
  }
}

/** Per change: the results that move with it alone, or why it cannot be computed alone. */
export type Attribution = { readonly moves: ResultMove[] } | { readonly alone: 'invalid' | 'not-computable' };

export function attributeChanges(before: SignedState, after: SignedState, changes: readonly InputChange[], beforeResults: Results): Attribution[] | null {
  if (changes.length > MAX_ATTRIBUTED_CHANGES) return null;
  return changes.map((c) => {
    const parsed = parseReviewValue({ format: REVIEW_FORMAT, version: REVIEW_VERSION, ...(applyAlone(before, after, c) as object) });
    // e.g. torque given instead of power: two changes that are valid only together.
    if (!parsed.ok) return { alone: 'invalid' as const };
    try {
      return { moves: resultsMoved(beforeResults, run(parsed.review)).moves };
    } catch (e) {
      if (e instanceof EngineInputError) return { alone: 'not-computable' as const };
      throw e;
    }
  });
}
