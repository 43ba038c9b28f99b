import type { z } from 'zod';
import { REVIEW_FORMAT, REVIEW_VERSION, reviewSchema, type Review } from './schema';
import { migrate } from './migrate';
import { formatPath } from './fieldPath';

export { formatPath };
import { firstDuplicateKey } from './duplicateKeys';

/** One problem with a review file, with the path of the field and what is allowed. */
export interface ReviewIssue {
  /** Dotted path, e.g. `gearPair.pinion.teeth` or `loadCases[1].oilTemperature_C`; `(file)` for the whole file. */
  readonly path: string;
  readonly message: string;
}

export type ParseResult =
  | { readonly ok: true; readonly review: Review; readonly migratedFrom: number | null }
  | { readonly ok: false; readonly issues: readonly ReviewIssue[] };

/** A review is a few kB; anything near this is not a review (and would stall the app). */
export const MAX_REVIEW_BYTES = 1_000_000;

export function zodIssues(error: z.ZodError): ReviewIssue[] {
  return error.issues.map((i) => ({ path: formatPath(i.path), message: i.message }));
}

/** Parse the text of a review file: size, JSON, format and version, migration, then the schema. */
export function parseReviewText(text: string): ParseResult {
  if (text.length > MAX_REVIEW_BYTES) {
    return { ok: false, issues: [{ path: '(file)', message: `the file is ${(text.length / 1e6).toFixed(1)} MB; a review is at most ${MAX_REVIEW_BYTES / 1e6} MB` }] };
  }
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (e) {
    // Where, not what: V8's message quotes the text, and a foreign file's content stays out of every message.
    const at = /position (\d+)/.exec((e as Error).message);
    let where = '';
    if (at) {
      const before = text.slice(0, Number(at[1]));
      const line = before.split('\n').length;
      where = ` (line ${line}, column ${Number(at[1]) - before.lastIndexOf('\n')})`;
    } else if (/end of JSON input/.test((e as Error).message)) where = ' (it ends too early)';
    return { ok: false, issues: [{ path: '(file)', message: `not valid JSON${where}` }] };
  }
  const duplicate = firstDuplicateKey(text);
  if (duplicate !== null) return { ok: false, issues: [{ path: duplicate, message: 'this key appears twice in the same object; a review names each key once' }] };
  return parseReviewValue(raw);
}

/** Validate an already-parsed value as a review. */
export function parseReviewValue(raw: unknown): ParseResult {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    return { ok: false, issues: [{ path: '(file)', message: 'a review is a JSON object' }] };
  }
  const obj = raw as Record<string, unknown>;
  if (obj.format !== REVIEW_FORMAT) {
    // The file's own value is not echoed: a foreign file's content stays out of every message.
    const got = obj.format === undefined ? 'it has none' : `it has another ${typeof obj.format === 'string' ? 'format' : 'kind of value'}: not a Flankfilm review`;
    return { ok: false, issues: [{ path: 'format', message: `must be "${REVIEW_FORMAT}" (${got})` }] };
  }
  const version = obj.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    return { ok: false, issues: [{ path: 'version', message: `must be a whole number from 1 to ${REVIEW_VERSION}` }] };
  }
  if (version > REVIEW_VERSION) {
    return { ok: false, issues: [{ path: 'version', message: `this file is version ${version}, made by a newer Flankfilm; this build reads up to version ${REVIEW_VERSION}. Open it with a newer Flankfilm; the file was not changed.` }] };
  }
  const migrated = migrate(obj, version);
  const parsed = reviewSchema.safeParse(migrated);
  if (!parsed.success) return { ok: false, issues: zodIssues(parsed.error) };
  return { ok: true, review: parsed.data, migratedFrom: version === REVIEW_VERSION ? null : version };
}

export function formatIssues(issues: readonly ReviewIssue[]): string {
  return issues.map((i) => `${i.path}: ${i.message}`).join('\n');
}
