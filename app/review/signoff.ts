import { ENGINE_VERSION } from '../engine/version';
import { fingerprint } from './fingerprint';
import type { Results } from './results';
import { MAX_SIGNOFF_HISTORY, signoffSchema, type Decision, type EarlierSignoff, type Review, type Signoff } from './schema';
import { zodIssues, type ReviewIssue } from './parse';
import { inputsOf, sameInputs } from './audit/signedState';

/** What the reviewer states; the rest of the sign-off (engine version, fingerprint) is computed. */
export interface SignoffDetails {
  reviewer: string;
  role: string;
  decision: Decision;
  organisation?: string;
  conditions?: string;
  /** ISO 8601 date-time with offset, e.g. 2026-12-01T09:30:00Z. */
  signedAt: string;
}

export type SignResult = { ok: true; review: Review; signoff: Signoff } | { ok: false; issues: ReviewIssue[] };

/**
 * Sign a review: the returned review carries a sign-off whose fingerprint covers the inputs
 * (this sign-off's own reviewer, role, organisation, decision and conditions included), the
 * results summary and the engine version (fingerprint.ts). `results` must be `run(review)`.
 * The sign-off keeps the inputs it signs (`signedState`, for the audit of later changes) and,
 * bounded to MAX_SIGNOFF_HISTORY, the earlier sign-offs it replaces, newest last. Signing the
 * same inputs again with the same details replaces the sign-off without adding to the history,
 * so the fingerprint stays the same.
 * Details the schema refuses (an empty reviewer, a malformed date) come back as issues. Pure.
 */
export function signReview(review: Review, results: Results, details: SignoffDetails): SignResult {
  const draft = {
    reviewer: details.reviewer,
    role: details.role,
    ...(details.organisation !== undefined ? { organisation: details.organisation } : {}),
    decision: details.decision,
    ...(details.conditions !== undefined ? { conditions: details.conditions } : {}),
    signedAt: details.signedAt,
    engineVersion: ENGINE_VERSION,
    fingerprint: '0'.repeat(64),
    signedState: inputsOf(review),
    ...historyAfter(review.signoff, review, details),
  };
  const checked = signoffSchema.safeParse(draft);
  if (!checked.success) {
    return { ok: false, issues: zodIssues(checked.error).map((i) => ({ ...i, path: `signoff.${i.path}` })) };
  }
  const unsigned: Review = { ...review, signoff: checked.data };
  const signoff: Signoff = { ...checked.data, fingerprint: fingerprint(unsigned, results) };
  return { ok: true, review: { ...review, signoff }, signoff };
}

/** The history of the new sign-off: the previous one's, plus the previous one unless it is re-signed as it was. */
function historyAfter(previous: Signoff | undefined, review: Review, d: SignoffDetails): { history?: EarlierSignoff[] } {
  if (!previous) return {};
  const { history = [], ...earlier } = previous;
  const restamp =
    previous.signedState !== undefined &&
    sameInputs(previous.signedState, inputsOf(review)) &&
    previous.reviewer === d.reviewer &&
    previous.role === d.role &&
    previous.organisation === d.organisation &&
    previous.decision === d.decision &&
    previous.conditions === d.conditions;
  const next = restamp ? history : [...history, earlier].slice(-MAX_SIGNOFF_HISTORY);
  return next.length ? { history: next } : {};
}
