/**
 * Compare two reviews: the inputs that changed (diff.ts) and the results that moved with them
 * (resultsMoved.ts), each review recomputed by this engine. Also the audit of a review against
 * the signed state it keeps. Pure.
 */
import { EngineInputError } from '../../engine/diagnostics';
import type { Results } from '../results';
import { run } from '../run';
import type { Review } from '../schema';
import { diffInputs, type InputChange } from './diff';
import { resultsMoved, type MovedResults } from './resultsMoved';
import { attributeChanges, type Attribution } from './attribute';
import { checkSignedState, inputsOf, type SignedStateCheck } from './signedState';

export interface Comparison {
  readonly changes: InputChange[];
  /** Null when either review cannot be computed (see `resultsError`). */
  readonly moved: MovedResults | null;
  /** Which side the engine refused, and why, in words. */
  readonly resultsError: string | null;
  /** Per change (same order), the results that move with it alone; null beyond MAX_ATTRIBUTED_CHANGES or without results. */
  readonly perChange: Attribution[] | null;
}

function compute(review: Review, side: string): Results | string {
  try {
    return run(review);
  } catch (e) {
    if (e instanceof EngineInputError) return `the ${side} review cannot be computed: ${e.message}`;
    throw e;
  }
}

/** What changed from `before` to `after`. `changes` is empty exactly when the inputs are the same. */
export function compareReviews(before: Review, after: Review): Comparison {
  const changes = diffInputs(inputsOf(before), inputsOf(after));
  if (changes.length === 0) return { changes, moved: { moves: [], verdictChanged: false }, resultsError: null, perChange: [] };
  const b = compute(before, 'earlier');
  const a = compute(after, 'later');
  if (typeof b === 'string' || typeof a === 'string') return { changes, moved: null, resultsError: [b, a].filter((x) => typeof x === 'string').join('; '), perChange: null };
  return { changes, moved: resultsMoved(b, a), resultsError: null, perChange: attributeChanges(inputsOf(before), inputsOf(after), changes, b) };
}

export type SinceSigning = { readonly check: Exclude<SignedStateCheck, { kind: 'kept' }> } | { readonly check: Extract<SignedStateCheck, { kind: 'kept' }>; readonly comparison: Comparison };

/** The changes since signing, where the file keeps a trustworthy signed state. */
export function changesSinceSigning(review: Review): SinceSigning {
  const check = checkSignedState(review);
  if (check.kind !== 'kept') return { check };
  return { check, comparison: compareReviews(check.signed, review) };
}

/** The `--json` shape: review paths, labels, values in file units; codes, not words. */
export function comparisonJson(c: Comparison): Record<string, unknown> {
  return {
    changes: c.changes.map((x, i) => {
      const alone = c.perChange?.[i];
      const along = x.along?.map((a) => ({ path: a.path, label: a.label, before: a.before ?? null, after: a.after ?? null }));
      return { kind: x.kind, path: x.path, panel: x.panel, label: x.label, before: x.before ?? null, after: x.after ?? null, ...(along ? { along } : {}), resultsMovedAlone: alone ? ('moves' in alone ? alone.moves : alone.alone) : null };
    }),
    verdictChanged: c.moved ? c.moved.verdictChanged : null,
    resultsChanged: c.moved ? c.moved.moves : null,
    ...(c.resultsError ? { resultsError: c.resultsError } : {}),
  };
}
