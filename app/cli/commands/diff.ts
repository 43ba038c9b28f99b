import { readFile } from 'node:fs/promises';
import { parseArgs } from 'node:util';
import { changesSinceSigning, compareReviews, comparisonJson, type Comparison } from '../../review/audit/compare';
import { NO_AUDIT_WORDS } from '../../review/audit/signedState';
import { QUANTITY_SYMBOLS, type ResultMove } from '../../review/audit/resultsMoved';
import { changeLine, type NumberWords } from '../../review/audit/words';
import { INPUT_PANELS } from '../../review/inputLabels';
import { formatIssues, MAX_REVIEW_BYTES, parseReviewText } from '../../review/parse';
import { run } from '../../review/run';
import { REVIEW_FORMAT, REVIEW_VERSION, type Review } from '../../review/schema';
import { status, STATUS_WORDS } from '../../review/status';
import { CHANGE_WORDS, DECISION_WORDS, VERDICT_WORDS } from '../../review/vocabulary';
import type { ChangeFindingCode, ReviewStatus, VerdictCode } from '../../review/results';
import { EngineInputError } from '../../engine/diagnostics';
import { formatNumber, unitsFor } from '../../report/units';
import { EXIT, UsageError, type CliIo } from '../io';

type Loaded = { ok: true; review: Review; version: number } | { ok: false; message: string };

/** Read a review for comparing: a file of another kind, or of a version this build cannot read, is named as such. */
async function load(path: string): Promise<Loaded> {
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (e) {
    return { ok: false, message: `${path}: cannot read the file (${(e as NodeJS.ErrnoException).code ?? 'unreadable'})` };
  }
  let raw: unknown;
  try {
    raw = text.length > MAX_REVIEW_BYTES ? undefined : JSON.parse(text);
  } catch {
    raw = undefined;
  }
  const obj = raw && typeof raw === 'object' && !Array.isArray(raw) ? (raw as Record<string, unknown>) : null;
  if (obj && typeof obj.format === 'string' && obj.format !== REVIEW_FORMAT) {
    return { ok: false, message: `${path}: this is a "${obj.format}" file, not a review ("${REVIEW_FORMAT}"); diff compares review files only.` };
  }
  const parsed = parseReviewText(text);
  if (!parsed.ok) return { ok: false, message: `${path}: not a valid review:\n${formatIssues(parsed.issues)}` };
  return { ok: true, review: parsed.review, version: typeof obj?.version === 'number' ? obj.version : REVIEW_VERSION };
}

/** Numbers of inputs as the screen shows them: the review's unit system, up to ten significant digits. */
function inputNumbers(review: Review): NumberWords {
  const u = unitsFor(review.displayUnits);
  return (value, field) => {
    if (field?.kind) return u.fmt(value, field.kind, 10);
    const n = formatNumber(value, 10);
    return field?.unit ? (field.unit === '°' ? `${n}°` : `${n} ${field.unit}`) : n;
  };
}

const figure = (q: ResultMove['quantity'], v: ResultMove['before']): string => {
  if (v === null) return '—';
  if (q === 'verdict' || q === 'oilVerdict') return VERDICT_WORDS[v as VerdictCode];
  if (q === 'changeFinding') return CHANGE_WORDS[v as ChangeFindingCode];
  return formatNumber(v as number, 3);
};

/** The readable list: changes by panel, then the results that moved with them. */
/** Moved figures grouped by load case and oil, one line each. */
function movedLines(moves: readonly ResultMove[], indent: string): string[] {
  const byCase = new Map<string, ResultMove[]>();
  for (const m of moves) {
    const where = m.loadCase === null ? `Overall, ${m.oil ?? ''}` : `${m.loadCase}${m.oil ? ` — ${m.oil}` : ''}`;
    byCase.set(where, [...(byCase.get(where) ?? []), m]);
  }
  return [...byCase].map(([where, ms]) => `${indent}${where}: ${ms.map((m) => `${QUANTITY_SYMBOLS[m.quantity]} ${figure(m.quantity, m.before)} → ${figure(m.quantity, m.after)}`).join('; ')}`);
}

const ALONE_WORDS = { invalid: 'valid only together with another change', 'not-computable': 'cannot be computed on its own' } as const;

function comparisonText(c: Comparison, units: NumberWords): string[] {
  const lines: string[] = [];
  for (const panel of INPUT_PANELS) {
    const here = c.changes.map((x, i) => [x, c.perChange?.[i]] as const).filter(([x]) => x.panel === panel);
    if (!here.length) continue;
    lines.push('', panel);
    for (const [x, alone] of here) {
      lines.push(`  ${changeLine(x, units)}`);
      if (!alone || c.changes.length === 1) continue; // a single change: its results are those below
      if ('alone' in alone) lines.push(`      on its own: ${ALONE_WORDS[alone.alone]}`);
      else if (alone.moves.length === 0) lines.push('      on its own: no result moves');
      else lines.push('      on its own, moves:', ...movedLines(alone.moves, '        '));
    }
  }
  if (c.resultsError) lines.push('', `Results: ${c.resultsError}`);
  if (c.moved) {
    lines.push('', c.moved.moves.length ? `Results that moved${c.changes.length > 1 ? ' (all changes together)' : ''}` : 'No result moved (verdicts, SB, SintS and λmin as before).');
    lines.push(...movedLines(c.moved.moves, '  '));
    lines.push('', c.moved.verdictChanged ? 'The verdict changed.' : 'The verdict did not change.');
  }
  lines.push('', `${c.changes.length} ${c.changes.length === 1 ? 'change' : 'changes'}.`);
  return lines;
}

/**
 * `flankfilm diff REVIEW [OTHER] [--json]`: with one file, the changes since it was signed (from
 * the signed state its sign-off keeps); with two, the changes from the first to the second.
 * Exit 0 no differences, 3 differences, 1 an invalid or unsuitable file, 2 usage.
 */
export async function diffCommand(args: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseArgs({ args, allowPositionals: true, options: { json: { type: 'boolean' } } });
  if (positionals.length < 1 || positionals.length > 2) throw new UsageError('give one signed review, or two reviews to compare');
  const loaded: Loaded[] = [];
  for (const p of positionals) loaded.push(await load(p));
  const bad = loaded.filter((l): l is Extract<Loaded, { ok: false }> => !l.ok);
  if (bad.length) {
    io.err(`${bad.map((b) => b.message).join('\n')}\n`);
    return EXIT.invalid;
  }
  const ok = loaded as Array<Extract<Loaded, { ok: true }>>;
  return positionals.length === 2 ? twoFiles(positionals as [string, string], ok as [Extract<Loaded, { ok: true }>, Extract<Loaded, { ok: true }>], values.json === true, io) : sinceSigning(positionals[0] as string, (ok[0] as Extract<Loaded, { ok: true }>).review, values.json === true, io);
}

function twoFiles(paths: [string, string], [a, b]: [Extract<Loaded, { ok: true }>, Extract<Loaded, { ok: true }>], json: boolean, io: CliIo): number {
  const c = compareReviews(a.review, b.review);
  const migrated = a.version !== b.version ? `${paths[0]} is file version ${a.version}, ${paths[1]} version ${b.version}; both were read as version ${REVIEW_VERSION} (migrated on reading, the files unchanged).` : null;
  if (json) {
    io.out(`${JSON.stringify({ ...comparisonJson(c), ...(migrated ? { note: migrated } : {}) }, null, 2)}\n`);
  } else {
    const who = (p: string, r: Review) => `${p}: ${r.title}, revision ${r.revision}, ${stateWords(stateOf(r))}`;
    const lines = [`Changes from ${paths[0]} to ${paths[1]}`, `  ${who(paths[0], a.review)}`, `  ${who(paths[1], b.review)}`, ...(migrated ? [`  ${migrated}`] : [])];
    if (c.changes.length === 0) lines.push('', 'No differences in the inputs.');
    else lines.push(...comparisonText(c, inputNumbers(b.review)));
    io.out(`${lines.join('\n')}\n`);
  }
  return c.changes.length === 0 ? EXIT.ok : EXIT.mismatch;
}

/** The state of a review; null where the engine refuses its inputs (the comparison says why). */
function stateOf(r: Review): ReviewStatus | null {
  try {
    return status(r, run(r));
  } catch (e) {
    if (e instanceof EngineInputError) return null;
    throw e;
  }
}
const stateWords = (s: ReviewStatus | null) => (s ? STATUS_WORDS[s] : 'cannot be computed');

function sinceSigning(path: string, review: Review, json: boolean, io: CliIo): number {
  const so = review.signoff;
  if (!so) {
    io.err(`${path}: not signed, so there is no signed state to compare with. Sign it first, or compare two files: flankfilm diff A B\n`);
    return EXIT.invalid;
  }
  const since = changesSinceSigning(review);
  const state = stateOf(review);
  const header = [`Changes since signing: ${review.title}, revision ${review.revision}`, `  signed by ${so.reviewer} (${so.role}) at ${so.signedAt}: ${DECISION_WORDS[so.decision]}`, `  status: ${stateWords(state)}`];
  if (!('comparison' in since)) {
    const kind = since.check.kind === 'draft' ? 'not-kept' : since.check.kind;
    const same = state === 'signed';
    if (json) io.out(`${JSON.stringify({ changes: null, verdictChanged: null, resultsChanged: null, audit: kind, status: state }, null, 2)}\n`);
    else io.out(`${[...header, '', same ? 'The fingerprint matches: nothing changed since signing.' : 'The fingerprint does not match: the review changed since signing.', NO_AUDIT_WORDS[kind]].join('\n')}\n`);
    return same ? EXIT.ok : EXIT.mismatch;
  }
  const c = since.comparison;
  const unconfirmed = since.check.confirmed ? null : `Signed with Flankfilm ${so.engineVersion}; this is another version, so the signed state cannot be checked against its fingerprint here.`;
  if (json) {
    io.out(`${JSON.stringify({ ...comparisonJson(c), audit: since.check.confirmed ? 'kept' : 'unconfirmed', status: state }, null, 2)}\n`);
  } else {
    const lines = [...header, ...(unconfirmed ? [`  ${unconfirmed}`] : [])];
    if (c.changes.length === 0) lines.push('', 'No changes since signing.');
    else lines.push(...comparisonText(c, inputNumbers(review)));
    io.out(`${lines.join('\n')}\n`);
  }
  return c.changes.length === 0 ? EXIT.ok : EXIT.mismatch;
}
