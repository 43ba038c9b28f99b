import { useCallback, useMemo, useReducer, useRef } from 'react';
import { parseReviewValue, type ReviewIssue } from '../../app/review/parse';
import type { Review } from '../../app/review/schema';
import { docReducer, initialDocState, type DocAction, type DocState, type Draft } from '../state/reviewState';

export interface DocumentView {
  readonly doc: DocState;
  readonly dispatch: React.Dispatch<DocAction>;
  /** The draft as a valid review, or null while an entry is invalid. */
  readonly review: Review | null;
  readonly issues: readonly ReviewIssue[];
}

/** Told of each edit (not an opening) that leaves a valid review, as it is dispatched: before React renders it. */
export type OnValidEdit = (review: Review, edition: number) => void;

/** One empty list for every valid edition, so what depends on the issues (the sheet's messages, every input) does not change with each render. */
const NO_ISSUES: readonly ReviewIssue[] = [];

/** Each draft is parsed once: at its dispatch and again when it renders, the same review object. */
const parsedDrafts = new WeakMap<Draft, ReturnType<typeof parseReviewValue>>();
function parseOnce(draft: Draft): ReturnType<typeof parseReviewValue> {
  let parsed = parsedDrafts.get(draft);
  if (!parsed) {
    parsed = parseReviewValue(draft);
    parsedDrafts.set(draft, parsed);
  }
  return parsed;
}

/**
 * The review being edited, validated by the file's schema on every edit (a few kB: well under a
 * millisecond). Every action goes through `dispatch`, which applies the (pure) reducer at once as
 * React will when it renders, so `onValidEdit` can start the recompute while the sheet renders.
 */
export function useDocument(onValidEdit?: OnValidEdit): DocumentView {
  const [doc, dispatchToReact] = useReducer(docReducer, initialDocState);
  const ahead = useRef<DocState>(initialDocState);
  const onValid = useRef(onValidEdit);
  onValid.current = onValidEdit;
  const dispatch = useCallback((action: DocAction) => {
    const before = ahead.current;
    const next = docReducer(before, action);
    ahead.current = next;
    dispatchToReact(action);
    if (action.type === 'load' || !next.draft || next.draft === before.draft) return;
    const parsed = parseOnce(next.draft);
    if (parsed.ok) onValid.current?.(parsed.review, next.edition);
  }, []);
  const parsed = useMemo(() => (doc.draft ? parseOnce(doc.draft) : null), [doc.draft]);
  return {
    doc,
    dispatch,
    review: parsed?.ok ? parsed.review : null,
    issues: parsed && !parsed.ok ? parsed.issues : NO_ISSUES,
  };
}
