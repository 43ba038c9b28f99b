/**
 * The record: the PDF made from a review and the results `run(review)` gave for it. Nothing here
 * recomputes physics; every figure comes from the Results. The review itself is attached as a
 * file, and the fingerprint with its three part hashes is written into the document information,
 * so `flankfilm verify` can check the record on its own.
 *
 * Deterministic: without a signature the same review and results give the same bytes. The
 * creation date comes from the review (sign-off time, else review date, else 1970-01-01), and
 * pdfkit's file ID is an MD5 of the document information, which holds no clock or random value.
 */
import type { EhlPointResult } from '../review/ehlAtPoint';
import { drawFilmDetail } from './sections/filmDetail';
import PDFDocument from 'pdfkit';
import { pdfkitAddPlaceholder } from '@signpdf/placeholder-pdfkit';
import { fingerprintParts, FINGERPRINT_SCHEME } from '../review/fingerprint';
import type { Results } from '../review/results';
import type { Review } from '../review/schema';
import { status as reviewStatus } from '../review/status';
import { meshContexts, type RecordContext } from './context';
import { MESH_WORDS } from '../review/vocabulary';
import { loadRecordFonts, type RecordFonts } from './fonts';
import { fontCoverage, undrawableMessage, undrawableText } from './glyphCoverage';
import { FONT_BOLD, FONT_REGULAR, Layout } from './layout';
import { unitsFor } from './units';
import { GREY, STATUS_LABELS } from './words';
import { drawCover } from './sections/cover';
import { drawInputs } from './sections/inputs';
import { drawCaseResults } from './sections/caseResults';
import { drawComparison } from './sections/comparison';
import { drawVerdict } from './sections/verdict';
import { drawOperatingMaps } from './sections/operatingMap';
import { drawMicropitting } from './sections/micropitting';
import type { OperatingMapResult } from '../review/operatingMaps';
import { drawMethods, drawSignoff, drawWarnings } from './sections/backMatter';

export type Paper = 'a4' | 'letter';

/** Keys of the document information that carry the fingerprint (verify reads them). */
export const INFO_KEYS = {
  fingerprint: 'FlankfilmFingerprint',
  inputs: 'FlankfilmInputsSHA256',
  results: 'FlankfilmResultsSHA256',
  engine: 'FlankfilmEngineSHA256',
  engineVersion: 'FlankfilmEngineVersion',
  scheme: 'FlankfilmFingerprintScheme',
  status: 'FlankfilmStatus',
} as const;

export interface SignaturePlaceholder {
  name: string;
  reason: string;
  location?: string;
  contactInfo?: string;
  signingTime: Date;
}

export interface RecordOptions {
  paper?: Paper;
  fonts?: RecordFonts;
  /** Reserve room for a PKCS#7 signature (fill it with signRecordPdf). */
  signature?: SignaturePlaceholder;
  /** The operating maps (app/review/operatingMaps.ts) to include; the record computes none itself. */
  maps?: readonly OperatingMapResult[];
  /** Film detail pictures to include, when asked (app/review/ehlAtPoint.ts); none by default. */
  films?: readonly EhlPointResult[];
}

/**
 * The signature placeholder of a record of `review` signed at `signingTime`: what `flankfilm
 * review --p12` writes, and what verify rebuilds a signed record with.
 */
export function signaturePlaceholderFor(review: Review, signingTime: Date): SignaturePlaceholder {
  return {
    name: review.signoff?.reviewer ?? 'Flankfilm',
    reason: review.signoff ? `Flankfilm record, ${review.signoff.decision}` : 'Flankfilm record (draft)',
    contactInfo: review.signoff?.organisation ?? '',
    location: '',
    signingTime,
  };
}

/** Creation date of the record: sign-off time, else review date, else the Unix epoch. */
export function recordDate(review: Review): Date {
  const iso = review.signoff?.signedAt ?? (review.date ? `${review.date}T00:00:00Z` : '1970-01-01T00:00:00Z');
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? new Date(0) : d;
}

/** The review id as a file-name stem ("PL 2026/014" → "PL-2026-014"), or null without an id. */
export function idStem(review: Pick<Review, 'id'>): string | null {
  const id = (review.id ?? '').replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '');
  return id || null;
}

/** File name of the attached review: it follows the review id. */
export function attachmentName(review: Review): string {
  return `${idStem(review) ?? 'review'}.flankfilm.json`;
}

/** The review holds text the record's font cannot draw (it would print as boxes); the message names each field. */
export class RecordTextError extends Error {}

export async function renderRecord(review: Review, results: Results, options: RecordOptions = {}): Promise<Buffer> {
  const fonts = options.fonts ?? loadRecordFonts();
  const undrawable = undrawableText(review, [fontCoverage(fonts.regular), fontCoverage(fonts.bold)]);
  if (undrawable.length > 0) throw new RecordTextError(undrawableMessage(undrawable));
  const parts = fingerprintParts(review, results);
  const state = reviewStatus(review, results);
  const created = recordDate(review);
  const info: Record<string, string | Date> = {
    Title: review.title,
    Author: review.signoff?.reviewer ?? 'Flankfilm',
    Subject: 'Flankfilm record: lubrication review of a cylindrical gear pair',
    Keywords: `flankfilm; fingerprint ${parts.combined}; ${STATUS_LABELS[state]}`,
    Creator: `Flankfilm ${parts.engineVersion}`,
    Producer: 'Flankfilm record (PDFKit)',
    CreationDate: created,
    ModDate: created,
    [INFO_KEYS.fingerprint]: parts.combined,
    [INFO_KEYS.inputs]: parts.inputs,
    [INFO_KEYS.results]: parts.results,
    [INFO_KEYS.engine]: parts.engine,
    [INFO_KEYS.engineVersion]: parts.engineVersion,
    [INFO_KEYS.scheme]: FINGERPRINT_SCHEME,
    [INFO_KEYS.status]: state,
  };
  const doc = new PDFDocument({
    size: options.paper === 'letter' ? 'LETTER' : 'A4',
    margins: { top: 48, bottom: 54, left: 50, right: 50 },
    bufferPages: true,
    info: info as PDFKit.DocumentInfo,
    lang: 'en',
    displayTitle: true,
    pdfVersion: '1.7',
  });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  doc.registerFont(FONT_REGULAR, Buffer.from(fonts.regular));
  doc.registerFont(FONT_BOLD, Buffer.from(fonts.bold));
  doc.font(FONT_REGULAR);

  const json = `${JSON.stringify(review, null, 2)}\n`;
  doc.file(Buffer.from(json, 'utf8'), {
    name: attachmentName(review),
    type: 'application/json',
    description: 'The Flankfilm review this record was made from',
    creationDate: created,
    modifiedDate: created,
    relationship: 'Source',
  } as PDFKit.Mixins.PDFAttachmentOptions);

  const ctx: RecordContext = { review, results, units: unitsFor(review.displayUnits), status: state, parts, layout: new Layout(doc) };
  drawCover(ctx);
  drawInputs(ctx);
  const perMesh = meshContexts(ctx, MESH_WORDS);
  for (const m of perMesh) drawCaseResults(m);
  for (const m of perMesh) drawMicropitting(m);
  for (const m of perMesh) drawComparison(m);
  if (options.maps) drawOperatingMaps(ctx, options.maps);
  if (options.films) drawFilmDetail(ctx, options.films);
  drawVerdict(ctx);
  drawMethods(ctx);
  drawWarnings(ctx);
  drawSignoff(ctx);
  drawFooters(ctx);

  if (options.signature) {
    const sig = options.signature;
    pdfkitAddPlaceholder({
      pdf: doc,
      pdfBuffer: Buffer.alloc(0),
      reason: sig.reason,
      contactInfo: sig.contactInfo ?? '',
      name: sig.name,
      location: sig.location ?? '',
      signingTime: sig.signingTime,
      appName: 'Flankfilm', // a PDF name: no spaces
    });
  }
  doc.end();
  return done;
}

/** "page X of Y" and the record's identity on every page. */
function drawFooters(ctx: RecordContext): void {
  const { layout: L, review, status, parts } = ctx;
  const doc = L.doc;
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const bottomMargin = doc.page.margins.bottom;
    doc.page.margins.bottom = 0; // writing below the margin must not start a new page
    const y = doc.page.height - 34;
    doc.moveTo(L.left, y - 5).lineTo(L.right, y - 5).lineWidth(0.4).strokeColor('#b0b0b0').stroke();
    const left = `Flankfilm record · ${review.id ?? 'no id'} · revision ${review.revision} · ${STATUS_LABELS[status]} · fingerprint ${parts.combined.slice(0, 16)}…`;
    doc.font(FONT_REGULAR).fontSize(7).fillColor(GREY).text(left, L.left, y, { width: L.width - 80, lineBreak: false });
    doc.text(`page ${i - range.start + 1} of ${range.count}`, L.right - 80, y, { width: 80, align: 'right', lineBreak: false });
    doc.page.margins.bottom = bottomMargin;
  }
  doc.switchToPage(range.start + range.count - 1);
}
