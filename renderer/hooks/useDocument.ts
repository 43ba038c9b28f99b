import { useCallback, useRef, useState, useSyncExternalStore } from 'react';
import type { ReviewIssue } from '../../app/review/parse';
import type { Review } from '../../app/review/schema';
import { DocStore } from '../state/docStore';
import type { DocAction, DocState } from '../state/reviewState';

export interface DocumentView {
  readonly doc: DocState;
  readonly dispatch: React.Dispatch<DocAction>;
  /** The draft as a valid review, or null while an entry is invalid. */
  readonly review: Review | null;
  readonly issues: readonly ReviewIssue[];
  /** The document outside React: each input subscribes to its own path (state/context.ts). */
  readonly store: DocStore;
}

/** Told of each edit (not an opening) that leaves a valid review, as it is dispatched: before React renders it. */
export type OnValidEdit = (review: Review, edition: number) => void;

/**
 * The review being edited, in a DocStore: every action goes through `dispatch`, which applies it
 * at once, so `onValidEdit` can start the recompute before the sheet renders the edit, and then
 * re-renders the sheet's frame and only the inputs the edit changed.
 */
export function useDocument(onValidEdit?: OnValidEdit): DocumentView {
  const [store] = useState(() => new DocStore());
  const onValid = useRef(onValidEdit);
  onValid.current = onValidEdit;
  const dispatch = useCallback(
    (action: DocAction) => {
      const before = store.getState();
      const next = store.dispatch(action);
      if (action.type === 'load' || !next.draft || next.draft === before.draft) return;
      const parsed = store.getParsed();
      if (parsed.review) onValid.current?.(parsed.review, next.edition);
    },
    [store],
  );
  const doc = useSyncExternalStore(store.subscribe, store.getState);
  const parsed = store.parsedOf(doc.draft);
  return { doc, dispatch, review: parsed.review, issues: parsed.issues, store };
}
