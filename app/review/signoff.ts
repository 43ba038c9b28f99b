import { ENGINE_VERSION } from '../engine/version';
import { fingerprint } from './fingerprint';
import type { Results } from './results';
import { signoffSchema, type Decision, type Review, type Signoff } from './schema';
import { zodIssues, type ReviewIssue } from './parse';

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
  };
  const checked = signoffSchema.safeParse(draft);
  if (!checked.success) {
    return { ok: false, issues: zodIssues(checked.error).map((i) => ({ ...i, path: `signoff.${i.path}` })) };
  }
  const unsigned: Review = { ...review, signoff: checked.data };
  const signoff: Signoff = { ...checked.data, fingerprint: fingerprint(unsigned, results) };
  return { ok: true, review: { ...review, signoff }, signoff };
}
