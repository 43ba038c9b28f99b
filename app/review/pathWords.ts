/**
 * Field paths in words, for what a person reads: `oils[0].baseOil` is "Oils · In-service oil:
 * Base oil" (the entry by its name in the draft), and a path inside a message (an engine error says
 * `loadCases[0].oilTemperature_C = 250 °C is outside …`) becomes the field's label. The paths
 * themselves stay in `--json` and in the DOM's data attributes. Pure.
 */
import { fieldLabel, inputLabelOf, memberOf, panelOf, type InputPath } from './inputLabels';

/** `loadCases[1].oilTemperature_C` → ['loadCases', 1, 'oilTemperature_C'] (formatPath's inverse). */
export function parsePath(path: string): InputPath {
  const out: Array<string | number> = [];
  for (const m of path.matchAll(/([^.[\]]+)|\[(\d+)\]/g)) out.push(m[2] !== undefined ? Number(m[2]) : (m[1] as string));
  return out;
}

const LIST_WORDS = { loadCases: 'load case', oils: 'oil' } as const;

/** The name the draft gives entry `index` of a list, or "oil 2" / "load case 1". */
function entryName(draft: unknown, list: 'loadCases' | 'oils', index: number): string {
  const entries = (draft as Record<string, unknown> | null | undefined)?.[list];
  const name = Array.isArray(entries) ? (entries[index] as { name?: unknown } | undefined)?.name : undefined;
  return typeof name === 'string' && name.trim() ? name.trim() : `${LIST_WORDS[list]} ${index + 1}`;
}

/**
 * Where a field is, in words: its panel, its load case or oil by name, pinion or wheel, and its
 * label ("Duty · Load case 1: Pinion torque T1"). A path the screen has no field for is named by
 * its panel and entry only.
 */
export function pathWords(path: string, draft: unknown, system: 'si' | 'us' = 'si'): string {
  if (path === '(file)') return 'The file';
  const segs = parsePath(path);
  const head = segs[0];
  const parts: string[] = [];
  let rest = segs;
  if ((head === 'loadCases' || head === 'oils') && typeof segs[1] === 'number') {
    parts.push(entryName(draft, head, segs[1]));
    rest = segs.slice(2);
  }
  const gear = memberOf(segs);
  // The wheel of an internal pair is its ring, as the sheet calls it.
  if (gear) parts.push(gear === 'Wheel' && isInternalPair(draft) ? 'Ring' : gear);
  const where = [panelOf(segs), ...parts].join(' · ');
  return rest.length && inputLabelOf(segs) ? `${where}: ${fieldLabel(segs, system)}` : where;
}

const isInternalPair = (draft: unknown): boolean => ((draft as { gearPair?: { kind?: unknown } } | null | undefined)?.gearPair?.kind ?? null) === 'internal';

/** The top-level keys of a review whose fields a path can name. */
const HEADS = 'gearPair|loadCases|oils|policy|planetary|displayUnits|signoff|title|reviewId|date';

/** A review path as it appears inside a message (not inside a word). */
const PATH_IN_TEXT = new RegExp(`\\b(?:${HEADS})(?:\\[\\d+\\]|\\.[A-Za-z][A-Za-z0-9_]*)+`, 'g');

/** True for a review path (an engine error may instead name a bare quantity such as `faceWidth`). */
export function isReviewPath(field: string): boolean {
  return REVIEW_PATH.test(field);
}
const REVIEW_PATH = new RegExp(`^(?:${HEADS})\\b`);

/** The message with every review path in it replaced by the field's label (the message sits at the field, or after its words). */
export function pathsInWords(message: string, system: 'si' | 'us' = 'si'): string {
  return message.replace(PATH_IN_TEXT, (p) => {
    const segs = parsePath(p);
    if (inputLabelOf(segs)) return fieldLabel(segs, system);
    const [list, index] = segs;
    if (segs.length === 2 && (list === 'loadCases' || list === 'oils') && typeof index === 'number') return `${LIST_WORDS[list]} ${index + 1}`;
    // A field without a label of its own: its last name in words ("faceWidth_mm" → "face width").
    const last = segs.filter((x): x is string => typeof x === 'string').at(-1) ?? '';
    return last.replace(/_[A-Za-z0-9]+$/, '').replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
  });
}

/** A path that leads a line of a message, with what comes before it (a list mark) and the colon after it. */
const LEADING_PATH = new RegExp(`^(\\s*(?:[-•]\\s*)?)((?:${HEADS})(?:\\[\\d+\\]|\\.[A-Za-z][A-Za-z0-9_]*)*|\\(file\\))(?=:)`, 'gm');

/**
 * A message for the screen: a path that leads a line ("loadCases[0].name: …", as a list of problems
 * gives them) becomes where the field is in words, by its entry's name in the draft ("Duty ·
 * Crusher peak: Name: …"); any other path in it becomes the field's label (pathsInWords).
 */
export function messageInWords(message: string, draft: unknown, system: 'si' | 'us' = 'si'): string {
  const marked = message.replace(LEADING_PATH, (_m, lead: string, path: string) => `${lead}\u0000${pathWords(path, draft, system)}\u0001`);
  // Words already put in stay as they are; only the rest of each line is searched for paths.
  return marked.replace(/\u0000([^\u0001]*)\u0001|([^\u0000]+)/g, (_m, words: string | undefined, rest: string | undefined) => words ?? pathsInWords(rest ?? '', system));
}
