import { stat } from 'node:fs/promises';
import { basename, isAbsolute, resolve, sep } from 'node:path';
import { MAX_REVIEW_BYTES } from '../../app/review/parse';
import { explainFsError, UserError } from './errors';

export const REVIEW_EXTENSION = '.flankfilm.json';

/**
 * A path the renderer (drag and drop, recent list) or the OS handed us, checked before reading:
 * absolute, a regular file, named *.json, at most MAX_REVIEW_BYTES. Returns it resolved.
 */
export async function checkReviewPath(path: string): Promise<string> {
  if (!path || path.includes('\0') || !isAbsolute(path)) throw new UserError(`cannot open "${path}": not an absolute file path`);
  const file = resolve(path);
  if (!file.toLowerCase().endsWith('.json')) throw new UserError(`cannot open ${basename(file)}: a review is a ${REVIEW_EXTENSION} file`);
  const info = await stat(file).catch((e: unknown) => {
    const code = (e as NodeJS.ErrnoException).code;
    throw new UserError(code === 'ENOENT' ? `cannot open ${file}: the file does not exist` : `cannot open ${file}: ${explainFsError(e)}`);
  });
  if (!info.isFile()) throw new UserError(`cannot open ${file}: not a file`);
  if (info.size > MAX_REVIEW_BYTES) {
    throw new UserError(`cannot open ${basename(file)}: it is ${(info.size / 1e6).toFixed(1)} MB; a review is at most ${MAX_REVIEW_BYTES / 1e6} MB`);
  }
  return file;
}

const SLUG_MAX = 60;

/** A file-name stem from a review title: "HS pair / Crusher" → "hs-pair-crusher"; long titles cut at a word. */
export function slugOf(title: string): string {
  const slug = title
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  if (slug.length <= SLUG_MAX) return slug || 'review';
  const cut = slug.slice(0, SLUG_MAX + 1);
  const word = cut.lastIndexOf('-');
  return word > SLUG_MAX / 3 ? cut.slice(0, word) : slug.slice(0, SLUG_MAX);
}

/** The name a save dialog should propose: the current file's name, else one from the title. */
export function suggestedReviewName(path: string | null, title: string): string {
  return path ? basename(path) : `${slugOf(title)}${REVIEW_EXTENSION}`;
}

/** Add the review extension when the user typed a bare name. */
export function withReviewExtension(path: string): string {
  return path.toLowerCase().endsWith('.json') ? path : `${path}${REVIEW_EXTENSION}`;
}

export function isInside(file: string, dirs: readonly string[]): boolean {
  const f = resolve(file);
  return dirs.some((d) => f.startsWith(resolve(d) + sep));
}
