import type { ReviewIssue } from '../../app/review/parse';
import { inputLabelOf } from '../../app/review/inputLabels';
import { parsePath, pathsInWords } from '../../app/review/pathWords';
import type { RecomputeFailure } from '../worker/protocol';

/**
 * zod's wording for a wrong type is for programmers; the field says what to type. A path inside a
 * message (an engine error names its field) is given as the field's label.
 */
export function friendlyMessage(message: string, path?: string): string {
  return pathsInWords(schemaWords(message, path));
}

function schemaWords(message: string, path?: string): string {
  // A value none of a union's forms accepts: on a choice (the FZG stage), nothing was chosen.
  if (message === 'Invalid input') return path && inputLabelOf(parsePath(path))?.words ? 'choose one' : 'not a valid value here';
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
  for (const i of issues) add(i.path, friendlyMessage(i.message, i.path));
  if (engineError?.field) add(engineError.field, friendlyMessage(engineError.message, engineError.field));
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
