import { readRegularFile } from '../files/readRegular';
import { formatIssues, MAX_REVIEW_BYTES, parseReviewText, type ReviewIssue } from '../review/parse';
import type { Review } from '../review/schema';

export type LoadedReview = { ok: true; review: Review; text: string } | { ok: false; message: string; issues: readonly ReviewIssue[] };

/** Read and validate a review file. Never writes to it. */
export async function loadReviewFile(path: string): Promise<LoadedReview> {
  // A regular file only, read no further than the size limit: a pipe or a device fails at once.
  const read = await readRegularFile(path, MAX_REVIEW_BYTES);
  if (!read.ok) return { ok: false, message: `${path}: ${read.reason}`, issues: [] };
  const text = read.bytes.toString('utf8');
  const parsed = parseReviewText(text);
  if (!parsed.ok) return { ok: false, message: `${path}: not a valid review:\n${formatIssues(parsed.issues)}`, issues: parsed.issues };
  return { ok: true, review: parsed.review, text };
}
