/**
 * The fleet record: the PDF of a consolidation. It renders the FleetResult and computes nothing;
 * the inputs (every review and the candidate file) are attached, and the fingerprint with its
 * part hashes is in the document information, as in a review's record. Deterministic: the same
 * inputs give the same bytes (the creation date is the latest review date, else the epoch).
 */
import PDFDocument from 'pdfkit';
import { fleetFingerprintParts, FLEET_FINGERPRINT_SCHEME, type FleetInputs } from '../../fleet/fingerprint';
import type { FleetResult } from '../../fleet/types';
import type { FingerprintParts } from '../../review/fingerprint';
import { loadRecordFonts, type RecordFonts } from '../fonts';
import { FONT_BOLD, FONT_REGULAR, Layout } from '../layout';
import { INFO_KEYS, type Paper } from '../record';
import { DEFER_TEXT, GREY } from '../words';
import { drawAssignment, drawChosenSet, drawFitTable, drawFleetCautions, drawOilKey, drawUnserved } from './sections';
import { drawFingerprintTable, drawSignatureLines } from '../sections/backMatter';

export interface FleetRecordOptions {
  paper?: Paper;
  fonts?: RecordFonts;
}

export function fleetRecordDate(inputs: FleetInputs): Date {
  const dates = inputs.gearboxes.map((g) => g.review.date).filter((d): d is string => !!d).sort();
  const last = dates[dates.length - 1];
  const d = new Date(last ? `${last}T00:00:00Z` : 0);
  return Number.isNaN(d.getTime()) ? new Date(0) : d;
}

export async function renderFleetRecord(result: FleetResult, inputs: FleetInputs, options: FleetRecordOptions = {}): Promise<Buffer> {
  const fonts = options.fonts ?? loadRecordFonts();
  const parts = fleetFingerprintParts(inputs, result);
  const created = fleetRecordDate(inputs);
  const title = inputs.oilsFile.title ? `Lubricant consolidation — ${inputs.oilsFile.title}` : `Lubricant consolidation of ${result.gearboxes.length} gearboxes`;
  const info: Record<string, string | Date> = {
    Title: title,
    Author: 'Flankfilm',
    Subject: 'Flankfilm fleet record: candidate oils against the need of each gearbox, and the smallest oil set',
    Keywords: `flankfilm; fleet; fingerprint ${parts.combined}`,
    Creator: `Flankfilm ${parts.engineVersion}`,
    Producer: 'Flankfilm record (PDFKit)',
    CreationDate: created,
    ModDate: created,
    [INFO_KEYS.fingerprint]: parts.combined,
    [INFO_KEYS.inputs]: parts.inputs,
    [INFO_KEYS.results]: parts.results,
    [INFO_KEYS.engine]: parts.engine,
    [INFO_KEYS.engineVersion]: parts.engineVersion,
    [INFO_KEYS.scheme]: FLEET_FINGERPRINT_SCHEME,
    [INFO_KEYS.status]: 'draft',
  };
  const doc = new PDFDocument({ size: options.paper === 'letter' ? 'LETTER' : 'A4', margins: { top: 48, bottom: 54, left: 50, right: 50 }, bufferPages: true, info: info as PDFKit.DocumentInfo, lang: 'en', displayTitle: true, pdfVersion: '1.7' });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  doc.registerFont(FONT_REGULAR, Buffer.from(fonts.regular));
  doc.registerFont(FONT_BOLD, Buffer.from(fonts.bold));
  doc.font(FONT_REGULAR);
  const attached = { format: 'flankfilm.fleet-inputs', version: 1, oils: inputs.oilsFile, reviews: inputs.gearboxes.map((g) => g.review) };
  doc.file(Buffer.from(`${JSON.stringify(attached, null, 2)}\n`, 'utf8'), {
    name: 'fleet-inputs.json',
    type: 'application/json',
    description: 'The reviews and candidate oils this fleet record was made from',
    creationDate: created,
    modifiedDate: created,
    relationship: 'Source',
  } as PDFKit.Mixins.PDFAttachmentOptions);

  const L = new Layout(doc);
  drawFleetCover(L, result, title, parts, created);
  drawOilKey(L, result);
  drawFitTable(L, result);
  drawChosenSet(L, result);
  drawAssignment(L, result);
  drawUnserved(L, result);
  drawFleetCautions(L, result);
  drawFleetSignoff(L, parts);
  drawFleetFooters(L, parts);
  doc.end();
  return done;
}

function drawFleetCover(L: Layout, r: FleetResult, title: string, parts: FingerprintParts, created: Date): void {
  L.font(true, 8, GREY).text('FLANKFILM RECORD · LUBRICANT CONSOLIDATION ACROSS A PLANT', L.left, L.top, { width: L.width, characterSpacing: 0.6 });
  L.y += 8;
  L.font(true, 18).text(title, L.left, L.y, { width: L.width, lineGap: 2 });
  L.y += 10;
  L.keyValues(
    [
      ['Gearboxes', `${r.gearboxes.length}${r.failed.length ? ` (${r.failed.length} more not included: see below)` : ''}`],
      ['Candidate oils', String(r.oils.length)],
      ['Smallest oil set', r.cover.length ? `${r.cover.length} oil${r.cover.length === 1 ? '' : 's'}: ${r.cover.join('; ')}` : 'none'],
      ['Gearboxes no candidate serves', String(r.unserved.length)],
      ['Date', created.getTime() === 0 ? '—' : created.toISOString().slice(0, 10)],
      ['Engine version', `Flankfilm ${parts.engineVersion}`],
      ['Fingerprint (SHA-256)', parts.combined],
    ],
    { labelShare: 0.3, size: 9 },
  );
  L.para('Not signed. This record states the computation, not a decision.', { size: 9, color: GREY });
  L.para(DEFER_TEXT, { size: 9, bold: true });
}

function drawFleetSignoff(L: Layout, parts: FingerprintParts): void {
  L.ensure(300);
  L.heading('Sign-off', 1);
  L.para('To be completed by the engineer who accepts this consolidation.', { size: 8.5 });
  L.y += 6;
  drawSignatureLines(L);
  L.y += 4;
  drawFingerprintTable(L, parts, FLEET_FINGERPRINT_SCHEME);
  L.para('The fingerprint is SHA-256 over canonical JSON (sorted keys, no whitespace) of every review (as a review’s own fingerprint takes it) and the candidate-oil file, a summary of the results (the fit table’s marks, the set, the assignment and the unserved gearboxes) and the engine version. The inputs are attached to this PDF.', { size: 7.5, color: GREY });
}

function drawFleetFooters(L: Layout, parts: FingerprintParts): void {
  const doc = L.doc;
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const bottomMargin = doc.page.margins.bottom;
    doc.page.margins.bottom = 0; // writing below the margin must not start a new page
    const y = doc.page.height - 34;
    doc.moveTo(L.left, y - 5).lineTo(L.right, y - 5).lineWidth(0.4).strokeColor('#b0b0b0').stroke();
    doc.font(FONT_REGULAR).fontSize(7).fillColor(GREY).text(`Flankfilm fleet record · Draft · fingerprint ${parts.combined.slice(0, 16)}…`, L.left, y, { width: L.width - 80, lineBreak: false });
    doc.text(`page ${i - range.start + 1} of ${range.count}`, L.right - 80, y, { width: 80, align: 'right', lineBreak: false });
    doc.page.margins.bottom = bottomMargin;
  }
  doc.switchToPage(range.start + range.count - 1);
}
