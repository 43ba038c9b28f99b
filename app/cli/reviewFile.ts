import { readFile } from 'node:fs/promises';
import { formatIssues, parseReviewText, type ReviewIssue } from '../review/parse';
import type { Review } from '../review/schema';

export type LoadedReview = { ok: true; review: Review; text: string } | { ok: false; message: string; issues: readonly ReviewIssue[] };

/** Read and validate a review file. Never writes to it. */
export async function loadReviewFile(path: string): Promise<LoadedReview> {
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code ?? 'unreadable';
    return { ok: false, message: `${path}: cannot read the file (${code})`, issues: [] };
  }
  const parsed = parseReviewText(text);
  if (!parsed.ok) return { ok: false, message: `${path}: not a valid review:\n${formatIssues(parsed.issues)}`, issues: parsed.issues };
  return { ok: true, review: parsed.review, text };
}
