import { FINGERPRINT_SCHEME, type FingerprintParts } from '../../review/fingerprint';
import type { Layout } from '../layout';
import type { RecordContext } from '../context';
import { drawStatusIcon, STATUS_COLOURS } from '../icons';
import { basisTag, METHODS } from '../../review/methods';
import { MESH_WORDS } from '../../review/vocabulary';
import { caseTitle } from './caseResults';
import { DECISION_WORDS, GREY, STATUS_LABELS } from '../words';
import { revisionHistory, type Signing } from '../../review/audit/history';
import { pathsInWords } from '../../review/pathWords';
import type { Signoff } from '../../review/schema';
import { decisionLine, decisionSubject, isoDateTime } from '../../review/decisionSubject';

/** Methods and sources: the static list, then the assumptions the engine states for this review. */
export function drawMethods(ctx: RecordContext): void {
  const L = ctx.layout;
  L.newPage();
  L.heading('Methods and sources');
  L.para('Every formula the computation uses, with its standard or paper. “[memory]” marks a form or value recalled and checked against our own arithmetic but not read from the text; “common practice” marks a rule of thumb with no single source.', { size: 8.5 });
  L.table(
    [
      { header: 'Topic', width: 0.11 },
      { header: 'Quantity', width: 0.19 },
      { header: 'Formula', width: 0.43 },
      { header: 'Source', width: 0.27 },
    ],
    METHODS.map((m) => [m.topic, m.quantity, m.formula, sourceWithTag(m.source, basisTag(m.basis))]),
    { fontSize: 7, zebra: true },
  );
  L.heading('Assumptions for this review', 2);
  for (const a of ctx.results.assumptions) L.bullet(a, { size: 8.5 });
  const friction = [...new Set(ctx.results.cases.map((c) => c.frictionSource).filter((s): s is string => !!s))];
  const film = [...new Set(ctx.results.cases.map((c) => c.filmFormula).filter((s): s is string => !!s))];
  if (film.length) L.bullet(`Film formula used: ${film.join(', ')}.`, { size: 8.5 });
  if (friction.length) L.bullet(`Friction coefficient from: ${friction.join(', ')}.`, { size: 8.5 });
  for (const o of ctx.results.oils) L.bullet(`${o.name}: viscosity index from ${o.viscosityIndexSource}; lubricant factor XL = ${o.lubricantFactorXL}.`, { size: 8.5 });
}

const SEVERITY_WORDS: Readonly<Record<string, string>> = { info: 'note', warning: 'warning', error: 'error' };

/** Warnings and validity notes from the engine. */
export function drawWarnings(ctx: RecordContext): void {
  const { layout: L, results } = ctx;
  L.heading('Warnings and validity notes', 1);
  // A planetary stage: the stage's checks, then each mesh's geometry checks and case warnings.
  const meshes = results.meshes ?? [{ mesh: null, gear: results.gear, cases: results.cases }];
  const where = (mesh: string | null, what: string) => (mesh ? `${MESH_WORDS[mesh as keyof typeof MESH_WORDS]} mesh: ${what}` : what);
  // Words only: the codes and field paths stay in `--json`; a path inside a message becomes its label.
  const row = (at: string, severity: string, message: string) => [at, SEVERITY_WORDS[severity] ?? severity, pathsInWords(message)];
  const rows: string[][] = [
    ...(results.planetary?.checks ?? []).map((c) => row('Planetary stage', c.severity, c.message)),
    ...meshes.flatMap((m) => m.gear.checks.map((c) => row(where(m.mesh, 'Gear pair'), c.severity, c.message))),
    ...results.oils.flatMap((o) => o.warnings.map((w) => row(`Oil: ${o.name}`, w.severity, w.message))),
    ...meshes.flatMap((m) => m.cases.flatMap((c) => c.warnings.map((w) => row(where(m.mesh, caseTitle(c)), w.severity, w.message)))),
  ];
  if (rows.length === 0) {
    L.para('The engine raised no warnings: every formula was used inside its stated validity range, and the gear pair passed its design checks.', { size: 9 });
    return;
  }
  L.table(
    [
      { header: 'Where', width: 0.24 },
      { header: 'Severity', width: 0.1 },
      { header: 'Message', width: 0.66 },
    ],
    rows,
    { fontSize: 7.5, zebra: true },
  );
}

/** The sign-off block and the fingerprint with its parts. */
export function drawSignoff(ctx: RecordContext): void {
  const { layout: L, review, status, parts } = ctx;
  const doc = L.doc;
  L.ensure(330);
  L.heading('Sign-off', 1);
  const top = L.y;
  drawStatusIcon(doc, status, L.left, top, 13);
  L.font(true, 11, STATUS_COLOURS[status]).text(STATUS_LABELS[status], L.left + 19, top, { width: L.width - 19 });
  L.y += 4;
  const s = review.signoff;
  if (s) {
    L.keyValues(
      [
        ['Reviewer', s.reviewer],
        ['Role', s.role],
        ['Organisation', s.organisation ?? '—'],
        ['Decision', decisionLine(s, review)],
        ['Conditions', s.conditions ?? '—'],
        ['Signed at', isoDateTime(s.signedAt)],
        ['Engine version at signing', s.engineVersion],
        ['Fingerprint at signing', s.fingerprint],
      ],
      { labelShare: 0.3, size: 8.5 },
    );
    if (s.history?.length) drawRevisionHistory(ctx, s);
    if (status === 'changed-since-signing') {
      L.para('The fingerprint recomputed for this record differs from the one signed: this sign-off does not cover the record as it stands. Sign the review again after checking the changes.', { size: 8.5 });
    }
  } else {
    L.para(`Not signed. The reviewer signs the review in Flankfilm (Sign off…) and exports the record again, or signs below. The decision is on ${decisionSubject(review)}.`, { size: 8.5 });
    L.y += 6;
    drawSignatureLines(L);
    L.y += 4;
  }
  drawFingerprintTable(L, parts, FINGERPRINT_SCHEME);
  L.para(
    'The fingerprint is SHA-256 over canonical JSON (sorted keys, no whitespace) of the review without its sign-off’s fingerprint and signing time, a defined summary of the results (per case the key figures and verdict codes, and the verdict per oil) and the engine version. The review is attached to this PDF; `flankfilm verify` recomputes it and names the part that differs.',
    { size: 7.5, color: GREY },
  );
}

/** At most this many changed fields are named on a line; the rest are counted. */
const NAMED_CHANGES = 8;

/** What changed with a field (the VI the editor recomputes when KV40 or KV100 change), as the screen names it. */
function alongWords(c: NonNullable<Signing['changes']>[number]): string {
  return c.along?.length ? ` (with ${c.along.map((a) => a.field?.label ?? a.label).join(', ')})` : '';
}

function changedWords(line: Signing): string {
  if (line.changes === null) return line.first ? 'earliest signing kept in the file' : 'not known: that signing kept no signed inputs';
  if (line.changes.length === 0) return 'no input changed';
  const named = line.changes.slice(0, NAMED_CHANGES).map((c) => `${c.panel}: ${c.label}${c.kind === 'added' ? ' (added)' : c.kind === 'removed' ? ' (removed)' : alongWords(c)}`);
  const more = line.changes.length - named.length;
  return `${named.join('; ')}${more > 0 ? `; and ${more} more` : ''}`;
}

/** One line a signing the file keeps: who, when, the decision, the fields changed since the previous signing. */
function drawRevisionHistory(ctx: RecordContext, signoff: Signoff): void {
  const L = ctx.layout;
  L.heading('Revision history', 2);
  L.table(
    [
      { header: 'Signed at', width: 0.19 },
      { header: 'By', width: 0.23 },
      { header: 'Decision', width: 0.16 },
      { header: 'Inputs changed since the previous signing', width: 0.42 },
    ],
    revisionHistory(signoff).map((h) => [h.signedAt, `${h.reviewer} (${h.role})`, DECISION_WORDS[h.decision], changedWords(h)]),
    { fontSize: 7.5, zebra: true },
  );
  L.para('The file keeps the earlier sign-offs with the inputs each signed, the latest few only; the fingerprint covers them.', { size: 7.5, color: GREY });
}

function sourceWithTag(source: string, tag: string): string {
  return tag && !source.includes(tag) ? `${source} ${tag}` : source;
}

/** Blank lines for a signature by hand: reviewer, role, decision, date. */
export function drawSignatureLines(L: Layout): void {
  for (const label of ['Reviewer', 'Role and organisation', 'Decision and conditions', 'Date and signature']) {
    L.ensure(24);
    const y = L.y + 14;
    L.font(false, 8.5).text(label, L.left, y - 10, { width: 150, lineBreak: false });
    L.doc.moveTo(L.left + 150, y).lineTo(L.right, y).lineWidth(0.5).strokeColor(GREY).stroke();
    L.y = y + 8;
  }
}

/** The fingerprint and its part hashes, under its own heading. */
export function drawFingerprintTable(L: Layout, parts: FingerprintParts, scheme: string): void {
  L.heading('Fingerprint of this record', 2);
  L.keyValues(
    [
      ['Fingerprint (SHA-256)', parts.combined],
      ['Inputs', parts.inputs],
      ['Results summary', parts.results],
      ['Engine version', `${parts.engine} (Flankfilm ${parts.engineVersion})`],
      ['Scheme', scheme],
    ],
    { labelShare: 0.22, size: 7.5 },
  );
}
