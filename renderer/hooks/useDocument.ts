import { useMemo, useReducer } from 'react';
import { parseReviewValue, type ReviewIssue } from '../../app/review/parse';
import type { Review } from '../../app/review/schema';
import { docReducer, initialDocState, type DocAction, type DocState } from '../state/reviewState';

export interface DocumentView {
  readonly doc: DocState;
  readonly dispatch: React.Dispatch<DocAction>;
  /** The draft as a valid review, or null while an entry is invalid. */
  readonly review: Review | null;
  readonly issues: readonly ReviewIssue[];
}

/** One empty list for every valid edition, so what depends on the issues (the sheet's messages, every input) does not change with each render. */
const NO_ISSUES: readonly ReviewIssue[] = [];

/** The review being edited, validated by the file's schema on every edit (a few kB: well under a millisecond). */
export function useDocument(): DocumentView {
  const [doc, dispatch] = useReducer(docReducer, initialDocState);
  const parsed = useMemo(() => (doc.draft ? parseReviewValue(doc.draft) : null), [doc.draft]);
  return {
    doc,
    dispatch,
    review: parsed?.ok ? parsed.review : null,
    issues: parsed && !parsed.ok ? parsed.issues : NO_ISSUES,
  };
}
