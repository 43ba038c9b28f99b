import { formatIssues, parseReviewText, type ReviewIssue } from '../../app/review/parse';
import type { Review } from '../../app/review/schema';
import { UserError } from './errors';

const MAX_LISTED = 12;

export function listIssues(issues: readonly ReviewIssue[]): string {
  const shown = formatIssues(issues.slice(0, MAX_LISTED));
  return issues.length > MAX_LISTED ? `${shown}\n… and ${issues.length - MAX_LISTED} more` : shown;
}

/** The review in `text`, or a UserError that lists what is wrong (`doing`: "cannot save", …). */
export function reviewOf(text: string, doing: string): { review: Review; migratedFrom: number | null } {
  const parsed = parseReviewText(text);
  if (!parsed.ok) throw new UserError(`${doing}: the review is not valid:\n${listIssues(parsed.issues)}`);
  return { review: parsed.review, migratedFrom: parsed.migratedFrom };
}

export function reviewJson(review: unknown): string {
  return `${JSON.stringify(review, null, 2)}\n`;
}
