import { fingerprint } from './fingerprint';
import type { Results, ReviewStatus } from './results';
import type { Review } from './schema';

/** The words for each state, as screens and the record show them (NAMES.md). */
export const STATUS_WORDS: Readonly<Record<ReviewStatus, string>> = {
  draft: 'Draft',
  signed: 'Signed',
  'changed-since-signing': 'Changed since signing',
};

/**
 * State of a review: 'draft' without a sign-off; 'signed' when the sign-off's fingerprint equals
 * the fingerprint recomputed now (fingerprint.ts); otherwise 'changed-since-signing'. `results`
 * must be what `run(review)` returns. Pure.
 */
export function status(review: Review, results: Results): ReviewStatus {
  if (!review.signoff) return 'draft';
  return review.signoff.fingerprint === fingerprint(review, results) ? 'signed' : 'changed-since-signing';
}
