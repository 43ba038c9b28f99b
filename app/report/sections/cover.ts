import { drawStatusIcon, STATUS_COLOURS } from '../icons';
import type { RecordContext } from '../context';
import type { Review } from '../../review/schema';
import { decisionLine } from '../../review/decisionSubject';
import { DEFER_TEXT, GREY, INK, STATUS_LABELS } from '../words';
import { ROLE_WORDS } from '../../review/vocabulary';
import { drawChanges, drawNeedAndFindings } from './decision';

/** Cover: title, id, revision, state, date; the change findings first, then the duty's need and each oil's finding. */
export function drawCover(ctx: RecordContext): void {
  const { layout: L, review, results, status, parts } = ctx;
  const doc = L.doc;
  L.font(true, 8, GREY).text('FLANKFILM RECORD · LUBRICATION REVIEW OF A CYLINDRICAL GEAR PAIR', L.left, L.top, { width: L.width, characterSpacing: 0.6 });
  L.y += 8;
  L.font(true, 18).text(review.title, L.left, L.y, { width: L.width, lineGap: 2 });
  L.y += 10;

  const rows: Array<[string, string]> = [
    ['Review id', review.id ?? '—'],
    ['Revision', String(review.revision)],
    ['Date', review.date ?? '—'],
    ['Engine version', `Flankfilm ${parts.engineVersion}`],
    ['Fingerprint (SHA-256)', parts.combined],
  ];
  L.keyValues(rows, { labelShare: 0.26, size: 9 });

  // State, with its icon and word
  const y = L.y + 2;
  drawStatusIcon(doc, status, L.left, y, 16);
  L.font(true, 13, STATUS_COLOURS[status]).text(STATUS_LABELS[status], L.left + 24, y + 1, { width: L.width - 24 });
  L.y = y + 20;
  const s = review.signoff;
  if (s) {
    const line =
      status === 'signed'
        ? `Signed by ${s.reviewer} (${s.role}${s.organisation ? `, ${s.organisation}` : ''}) on ${s.signedAt.slice(0, 10)}. ${decisionLine(s, review)}.`
        : `The sign-off by ${s.reviewer} (${s.signedAt.slice(0, 10)}) no longer matches: an input, a result or the engine version has changed since signing. The sign-off is shown on the last page for reference only.`;
    L.para(line, { size: 9 });
    if (s.conditions) L.para(`Conditions of the decision: ${s.conditions}`, { size: 9 });
  } else {
    L.para('Not signed. This record has no sign-off yet; it states the computation, not a decision.', { size: 9, color: GREY });
  }
  L.y += 6;

  drawChanges(ctx, results);
  drawNeedAndFindings(ctx, results);
  L.y += 4;
  drawJob(ctx);
  L.y += 6;
  cautionBox(ctx, DEFER_TEXT);
}

/** The job in one paragraph, with the scope and what was not assessed. */
function drawJob(ctx: RecordContext): void {
  const { layout: L, review, results } = ctx;
  const oils = review.oils.map((o) => `“${o.name}” (${ROLE_WORDS[o.role].toLowerCase()})`).join(', ');
  const cases = review.loadCases.map((c) => `“${c.name}”`).join(', ');
  L.heading('The job', 2);
  L.para(
    `This review checks the lubrication of ${gearSetWords(ctx)}, ` +
      `under ${review.loadCases.length} load case${review.loadCases.length === 1 ? '' : 's'} (${cases})` +
      (review.oils.length ? `, for ${review.oils.length} candidate oil${review.oils.length === 1 ? '' : 's'}: ${oils}. ` : ', with no oil in scope. ') +
      'Along the line of action from A to E it computes the geometry (ISO 21771), the load sharing and Hertz contact stress (ISO 6336-2, ISO/TS 6336-20), ' +
      'the elastohydrodynamic film and the specific film thickness λ, the flash and contact temperatures and the scuffing safety by the flash temperature ' +
      'and integral temperature methods (ISO/TS 6336-20 and -21), the local film λGF and, for an oil whose FVA 54 micropitting failure stage is given, the micropitting safety Sλ (ISO/TS 6336-22), ' +
      'and from them whether anti-wear chemistry suffices, EP chemistry is warranted, or the duty is beyond oil chemistry.',
    { size: 9 },
  );
  const notAssessed = [
    'tooth-root bending strength (ISO 6336-3)',
    'pitting and wear life (ISO 6336-2 life factors)',
    ...micropittingNotAssessed(review),
    'the thermal rating of the housing and the sump temperature it reaches (the oil temperature is an input)',
    'the dynamic and load-distribution factors Kv, KHβ and KHα (inputs, see the assumptions)',
  ];
  L.para(`Not assessed: ${notAssessed.join('; ')}.`, { size: 9 });
  if (review.notes) L.para(`Notes: ${review.notes}`, { size: 8.5, color: GREY });
  if (results.title !== review.title) L.para(`Results title: ${results.title}`, { size: 8, color: GREY });
}

/** The gear set in words: the pair and its kind, or the planetary stage and its meshes. */
function gearSetWords(ctx: RecordContext): string {
  const { review, units } = ctx;
  const gs = review.gearPair ?? review.planetary;
  if (!gs) return 'no gear set';
  const kind = gs.helixAngle_deg > 0 ? `helical (β = ${gs.helixAngle_deg}°)` : 'spur';
  const size = `mn = ${units.fmt(gs.normalModule_mm, 'length')}, b = ${units.fmt(gs.faceWidth_mm, 'length')}`;
  if (review.gearPair) {
    const gp = review.gearPair;
    return `one ${gp.kind === 'internal' ? 'internal (pinion in a ring)' : 'external'} ${kind} gear pair, z1/z2 = ${gp.pinion.teeth}/${gp.wheel.teeth}, ${size}`;
  }
  const p = review.planetary as NonNullable<typeof review.planetary>;
  return (
    `one ${kind} planetary stage, sun/planet/ring zS/zP/zR = ${p.sun.teeth}/${p.planet.teeth}/${p.ring.teeth} with ${p.planets} planet${p.planets === 1 ? '' : 's'}, the ${p.held} held, ${size}; ` +
    'each of its two meshes (sun–planet, external; planet–ring, internal) is reviewed as a pair in the carrier frame and the verdict is that of the mesh that governs'
  );
}

export function cautionBox(ctx: RecordContext, text: string): void {
  const L = ctx.layout;
  const doc = L.doc;
  L.font(false, 8.5);
  const h = doc.heightOfString(text, { width: L.width - 36, lineGap: 1.5 }) + 14;
  L.ensure(h + 4);
  const top = L.y;
  doc.save();
  doc.rect(L.left, top, L.width, h).lineWidth(0.8).strokeColor(GREY).stroke();
  // A hollow "i" disc: an information mark, no verdict colour.
  doc.circle(L.left + 14, top + 14, 6).lineWidth(1).strokeColor(INK).stroke();
  doc.rect(L.left + 13.3, top + 12.5, 1.4, 4.5).fillColor(INK).fill();
  doc.rect(L.left + 13.3, top + 10, 1.4, 1.4).fillColor(INK).fill();
  doc.restore();
  L.font(false, 8.5).text(text, L.left + 28, top + 7, { width: L.width - 36, lineGap: 1.5 });
  L.y = top + h + 6;
}

/** Micropitting is assessed for each oil whose FVA 54 failure stage is given; for the others only the λGF screen is. */
function micropittingNotAssessed(review: Review): string[] {
  const without = review.oils.filter((o) => o.micropittingFailureStage === undefined);
  if (without.length === 0) return [];
  if (without.length === review.oils.length) return ['the micropitting safety Sλ (no oil gives its FVA 54 micropitting failure stage, so only the λGF screen is given; ISO/TS 6336-22)'];
  return [`the micropitting safety Sλ of ${without.map((o) => `“${o.name}”`).join(', ')} (no FVA 54 micropitting failure stage given, so only the λGF screen)`];
}
