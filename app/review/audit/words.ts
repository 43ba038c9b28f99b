/**
 * A changed value in words, as the screen would show it: choices by their words, a custom
 * material as such, an empty optional field as "empty", a whole load case or oil by its name.
 * Numbers go through the caller's formatter, which knows the unit system (CLI, record, screen).
 */
import { fileUnitOf, type InputLabel } from '../inputLabels';
import type { InputChange } from './diff';

/** Formats a number of a field in the reader's units, with the unit. */
export type NumberWords = (value: number, field: InputLabel | undefined) => string;

/** In the file's units: the number as stored, then its unit. */
export const fileUnits: NumberWords = (value, field) => {
  const unit = fileUnitOf(field);
  return unit ? `${value} ${unit}` : String(value);
};

const EMPTY = 'empty';

/** One value of a change (its before or its after) in words. */
export function valueWords(change: InputChange, side: 'before' | 'after', num: NumberWords = fileUnits): string {
  const v = change[side];
  if (v === undefined || v === null) return change.kind === 'added' || change.kind === 'removed' ? '—' : (change.field?.emptyWords ?? EMPTY);
  if (change.kind === 'reordered') return (v as string[]).join(', ');
  if (change.kind === 'added' || change.kind === 'removed') {
    const name = (v as { name?: unknown }).name;
    return typeof name === 'string' ? name : '—';
  }
  const words = change.field?.words;
  if (Array.isArray(v)) return v.length ? v.map((x) => words?.[String(x)] ?? String(x)).join(', ') : 'none';
  if (typeof v === 'object') return 'Custom material';
  if (typeof v === 'boolean' || typeof v === 'string') return words?.[String(v)] ?? String(v);
  if (typeof v === 'number') return words?.[String(v)] ?? num(v, change.field);
  return String(v);
}

/** One line for a reader: "label: before → after" (", with" what went with it), or "added …" / "removed …". */
export function changeLine(change: InputChange, num: NumberWords = fileUnits): string {
  switch (change.kind) {
    case 'added':
      return `${change.label} added`;
    case 'removed':
      return `${change.label} removed`;
    default: {
      const along = (change.along ?? []).map((a) => `, with ${a.field?.label ?? a.label}: ${valueWords(a, 'before', num)} → ${valueWords(a, 'after', num)}`);
      return `${change.label}: ${valueWords(change, 'before', num)} → ${valueWords(change, 'after', num)}${along.join('')}`;
    }
  }
}
