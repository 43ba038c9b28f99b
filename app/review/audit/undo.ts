/**
 * Undo one change since signing in the review being edited: the edit that puts the signed value
 * back, as a path and a value for the editor's "set" (an undefined value removes the key). Undoing
 * every listed change gives the signed inputs again, and so the state Signed. Pure.
 */
import type { InputPath } from '../inputLabels';
import { matchEntries, type InputChange } from './diff';
import { getIn, setIn } from './setIn';

export interface UndoEdit {
  readonly path: InputPath;
  readonly value: unknown;
}

type Json = unknown;
const listAt = (root: Json, name: string): Json[] => {
  const v = (root as Record<string, Json> | null)?.[name];
  return Array.isArray(v) ? v : [];
};

/** The edit of `draft` (the review as plain JSON) that undoes `change`; `signed` is the signed state. */
export function undoEdit(draft: Json, signed: Json, change: InputChange): UndoEdit {
  const list = String(change.segments[0]);
  switch (change.kind) {
    case 'changed': {
      if (!change.along?.length) return { path: change.segments, value: change.before };
      // One edit for the change and what went with it: their entry, each signed value put back.
      const entry = change.segments.slice(0, 2);
      const value = [change, ...change.along].reduce((e: Json, c) => setIn(e, c.segments.slice(2), c.before), getIn(draft, entry));
      return { path: entry, value };
    }
    case 'added': {
      const j = change.segments[1] as number;
      return { path: [list], value: listAt(draft, list).filter((_, k) => k !== j) };
    }
    case 'removed': {
      const now = listAt(draft, list);
      const i = Math.min(change.segments[1] as number, now.length);
      return { path: [list], value: [...now.slice(0, i), change.before, ...now.slice(i)] };
    }
    case 'reordered': {
      // The matched entries in their signed order; an added entry keeps its place.
      const now = listAt(draft, list);
      const { pairs, added } = matchEntries(listAt(signed, list), now);
      const out = [...pairs].sort((x, y) => x[0] - y[0]).map(([, j]) => now[j]);
      for (const j of added) out.splice(j, 0, now[j]);
      return { path: [list], value: out };
    }
  }
}
