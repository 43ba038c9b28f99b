import type { Review, Signoff } from './schema';
import { DECISION_WORDS } from './vocabulary';

/**
 * What a sign-off decides on, in words: the change from the in-service oil to the one proposed
 * oil when the review has exactly that, else the review as a whole (several proposals, or none).
 */
export function decisionSubject(review: Pick<Review, 'oils'>): string {
  const inService = review.oils.filter((o) => o.role === 'in-service');
  const proposed = review.oils.filter((o) => o.role === 'proposed');
  if (inService.length === 1 && proposed.length === 1) return `the change from the in-service oil “${inService[0]?.name}” to the proposed oil “${proposed[0]?.name}”`;
  if (inService.length === 0 && proposed.length === 1) return `the proposed oil “${proposed[0]?.name}” for this duty`;
  return 'the review as a whole';
}

/** "Approved: the change from … to …" — the decision and what it names. */
export function decisionLine(signoff: Pick<Signoff, 'decision'>, review: Pick<Review, 'oils'>): string {
  return `${DECISION_WORDS[signoff.decision]}: ${decisionSubject(review)}`;
}

/**
 * A date-time as ISO 8601 for people: "2026-12-02 07:30 UTC" for a UTC stamp, the date and time
 * with its offset otherwise; the text unchanged if it is not a date-time.
 */
export function isoDateTime(stamp: string): string {
  const m = /^(\d{4}-\d{2}-\d{2})T(\d{2}:\d{2})(?::\d{2}(?:\.\d+)?)?(Z|[+-]\d{2}:\d{2})$/.exec(stamp);
  if (!m) return stamp;
  return `${m[1]} ${m[2]} ${m[3] === 'Z' ? 'UTC' : m[3]}`;
}
