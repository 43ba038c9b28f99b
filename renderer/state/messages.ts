import type { ReviewIssue } from '../../app/review/parse';
import type { RecomputeFailure } from '../worker/protocol';

/** zod's wording for a wrong type is for programmers; the field says what to type. */
export function friendlyMessage(message: string): string {
  if (/^Invalid input: expected number/.test(message)) return 'enter a number';
  if (/^Invalid input: expected string/.test(message)) return 'enter some text';
  if (/^Too small: expected string to have >=1 char/.test(message)) return 'must not be empty';
  if (/^Invalid option: expected one of/.test(message)) return 'choose one';
  if (/^Invalid ISO date/.test(message)) return 'enter the date as yyyy-mm-dd (ISO 8601)';
  return message;
}

/**
 * Messages per field path: the schema's issues, and an engine input error at its field. An engine
 * field given as a bare name (`faceWidth`) is matched to the review key that starts with it.
 */
export function messagesByPath(issues: readonly ReviewIssue[], engineError: RecomputeFailure | null): Map<string, string[]> {
  const map = new Map<string, string[]>();
  const add = (key: string, message: string) => map.set(key, [...(map.get(key) ?? []), message]);
  for (const i of issues) add(i.path, friendlyMessage(i.message));
  if (engineError?.field) add(engineError.field, engineError.message);
  return map;
}

/** Look up the messages of a field, also accepting an engine field name without the unit suffix. */
export function lookupMessages(map: ReadonlyMap<string, readonly string[]>, key: string): readonly string[] {
  const exact = map.get(key);
  if (exact) return exact;
  // A range's own message (its two ends out of order) shows at its first end.
  if (key.endsWith('[0]')) {
    const whole = map.get(key.slice(0, -3));
    if (whole) return whole;
  }
  const bare = key.replace(/_[A-Za-z0-9]+$/, '');
  return bare !== key ? (map.get(bare) ?? []) : [];
}
