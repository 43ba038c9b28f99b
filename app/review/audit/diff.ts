/**
 * The field-level difference between two sets of review inputs (the signed state and the file,
 * or two revisions). Complete by construction: the list is empty exactly when the canonical JSON
 * of the two (what the fingerprint hashes) is the same, so every change that turns a review into
 * "Changed since signing" is named. Load cases and oils are matched by name where the names are
 * unique, so inserting a case shows as one added case, not as every later case changed. An input
 * the editor empties with another edit (followingInputs.ts) is named on that edit's line. Pure.
 */
import { canonicalJson } from '../canonicalJson';
import { fieldLabel, inputLabelOf, memberOf, panelOf, type InputLabel, type InputPanel, type InputPath } from '../inputLabels';
import { FOLLOWING_INPUTS } from '../followingInputs';
import { formatPath } from '../parse';
import type { SignedState } from '../schema';

export type ChangeKind = 'changed' | 'added' | 'removed' | 'reordered';

export interface InputChange {
  readonly kind: ChangeKind;
  /** The review path (`oils[0].kv40_mm2s`); for a removed entry its index before, else the index now. */
  readonly path: string;
  readonly segments: InputPath;
  readonly panel: InputPanel;
  /** The field's label as the screen shows it, after the name of its load case or oil. */
  readonly label: string;
  /** The label entry (unit, value words) of a field; undefined for a whole entry or an order. */
  readonly field: InputLabel | undefined;
  /** Values in the file's units; undefined where the field was empty (or the entry absent). */
  readonly before: unknown;
  readonly after: unknown;
  /**
   * Inputs the editor emptied with this change (followingInputs.ts: a VI left to ASTM D2270 when
   * a viscosity changed): named on this change's line and undone with it, not listed apart.
   */
  readonly along?: readonly InputChange[];
}

type Json = unknown;
const isObject = (v: Json): v is Record<string, Json> => typeof v === 'object' && v !== null && !Array.isArray(v);
const same = (a: Json, b: Json): boolean => (a === undefined || b === undefined ? a === b : canonicalJson(a) === canonicalJson(b));

const LIST_WORDS = { loadCases: 'Load case', oils: 'Oil' } as const;
type NamedList = keyof typeof LIST_WORDS;

/** The changes that turn `before` into `after`, in the order of the panels' fields. */
export function diffInputs(before: SignedState, after: SignedState): InputChange[] {
  const out: InputChange[] = [];
  walk(before, after, [], '', out);
  return foldFollowing(out);
}

const inEntry = (c: InputChange, list: string, index: unknown, key: string | readonly string[]): boolean =>
  c.kind === 'changed' && c.segments.length === 3 && c.segments[0] === list && c.segments[1] === index && (typeof key === 'string' ? c.segments[2] === key : key.includes(c.segments[2] as string));

/** Each input the editor emptied because another in its entry changed goes with the first such change. */
function foldFollowing(changes: InputChange[]): InputChange[] {
  let out = changes;
  for (const rule of FOLLOWING_INPUTS) {
    for (const emptied of out.filter((c) => inEntry(c, rule.list, c.segments[1], rule.field) && c.before !== undefined && c.after === undefined)) {
      const cause = out.find((c) => inEntry(c, rule.list, emptied.segments[1], rule.causes));
      if (!cause) continue;
      out = out.filter((c) => c !== emptied).map((c) => (c === cause ? { ...c, along: [...(c.along ?? []), emptied] } : c));
    }
  }
  return out;
}

function walk(b: Json, a: Json, segs: InputPath, prefix: string, out: InputChange[]): void {
  if (same(b, a)) return;
  if (isObject(b) && isObject(a)) {
    const keys = [...Object.keys(b), ...Object.keys(a).filter((k) => !(k in b))];
    for (const k of keys) walk(b[k], a[k], [...segs, k], prefix, out);
    return;
  }
  if (Array.isArray(b) && Array.isArray(a)) {
    const list = segs.length === 1 ? (segs[0] as string) : '';
    if (list === 'loadCases' || list === 'oils') return walkNamed(list, b, a, out);
    if (b.length === a.length && inputLabelOf([...segs, 0])) {
      b.forEach((x, i) => walk(x, a[i], [...segs, i], prefix, out));
      return;
    }
  }
  out.push(leaf('changed', segs, prefix, b, a));
}

function leaf(kind: ChangeKind, segs: InputPath, prefix: string, before: Json, after: Json): InputChange {
  const gear = memberOf(segs);
  const member = gear ? `${gear}: ` : '';
  return { kind, path: formatPath(segs), segments: segs, panel: panelOf(segs), label: `${prefix}${member}${fieldLabel(segs)}`, field: inputLabelOf(segs), before, after };
}

const nameOf = (entry: Json): string | undefined => (isObject(entry) && typeof entry.name === 'string' ? entry.name : undefined);
const unique = (list: readonly Json[]): boolean => {
  const names = list.map(nameOf);
  return names.every((n) => n !== undefined) && new Set(names).size === names.length;
};

/**
 * Pairs of (index before, index after). By name when each side's names are unique; an entry left
 * without a partner pairs with the unpartnered entry at its own index on the other side (a renamed
 * entry); the rest are added or removed.
 */
export function matchEntries(b: readonly Json[], a: readonly Json[]): { pairs: Array<[number, number]>; removed: number[]; added: number[] } {
  const pairs: Array<[number, number]> = [];
  const freeB = new Set(b.map((_, i) => i));
  const freeA = new Set(a.map((_, i) => i));
  if (unique(b) && unique(a)) {
    const at = new Map(a.map((e, i) => [nameOf(e), i]));
    b.forEach((e, i) => {
      const j = at.get(nameOf(e));
      if (j !== undefined) {
        pairs.push([i, j]);
        freeB.delete(i);
        freeA.delete(j);
      }
    });
  }
  for (const i of [...freeB]) {
    if (freeA.has(i)) {
      pairs.push([i, i]);
      freeB.delete(i);
      freeA.delete(i);
    }
  }
  pairs.sort((x, y) => x[1] - y[1]);
  return { pairs, removed: [...freeB], added: [...freeA].sort((x, y) => x - y) };
}

function walkNamed(list: NamedList, b: readonly Json[], a: readonly Json[], out: InputChange[]): void {
  const { pairs, removed, added } = matchEntries(b, a);
  const word = LIST_WORDS[list];
  const entryLabel = (e: Json, i: number) => `${word} “${nameOf(e) ?? `${word.toLowerCase()} ${i + 1}`}”`;
  for (const [i, j] of pairs) walk(b[i], a[j], [list, j], `${nameOf(a[j]) ?? nameOf(b[i]) ?? `${word} ${j + 1}`}: `, out);
  for (const j of added) out.push({ kind: 'added', path: formatPath([list, j]), segments: [list, j], panel: panelOf([list]), label: entryLabel(a[j], j), field: undefined, before: undefined, after: a[j] });
  for (const i of removed) out.push({ kind: 'removed', path: formatPath([list, i]), segments: [list, i], panel: panelOf([list]), label: entryLabel(b[i], i), field: undefined, before: b[i], after: undefined });
  // Same entries, other order: the fingerprint sees the order, so the audit names it.
  const order = pairs.map(([i]) => i);
  if (order.some((x, k) => k > 0 && x < (order[k - 1] as number))) {
    const beforeOrder = [...pairs].sort((x, y) => x[0] - y[0]).map(([i]) => nameOf(b[i]) ?? `${word} ${i + 1}`);
    const afterOrder = pairs.map(([, j]) => nameOf(a[j]) ?? `${word} ${j + 1}`);
    out.push({ kind: 'reordered', path: list, segments: [list], panel: panelOf([list]), label: `Order of the ${list === 'oils' ? 'oils' : 'load cases'}`, field: undefined, before: beforeOrder, after: afterOrder });
  }
}
