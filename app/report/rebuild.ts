/**
 * Rebuild a record from a review and compare it with a record file, byte for byte.
 *
 * The record is deterministic (record.ts): the same review, results and engine version give the
 * same bytes. A PKCS#7-signed record is the same file with a signature dictionary whose /M (the
 * signing time) and /Contents (the signature) are not derived from the review: /M is read back
 * from the record and used for the rebuild, /Contents is the one range left out of the
 * comparison — exactly the range the signature's /ByteRange leaves out.
 *
 * When bytes differ, the objects are compared one by one to say which part differs.
 */
import { operatingMaps } from '../review/operatingMaps';
import type { Results } from '../review/results';
import type { Review } from '../review/schema';
import { PdfFile, PdfName, PdfRef, type PdfValue } from './pdfRead';
import type { SignatureDict } from './pdfSignature';
import { renderRecord, signaturePlaceholderFor, type Paper } from './record';
import type { RecordFonts } from './fonts';

export type RecordPart = 'pages' | 'attachment' | 'document information' | 'signature' | 'document structure' | 'appended data';

export interface RebuildComparison {
  readonly same: boolean;
  /** What differs, in a fixed order; empty when `same`. */
  readonly differs: readonly RecordPart[];
}

const ORDER: readonly RecordPart[] = ['pages', 'attachment', 'document information', 'signature', 'document structure', 'appended data'];
const PLACEHOLDER = '/ByteRange [0 /********** /********** /**********]';

/** The paper of a record: US Letter if its first page is 612 × 792 pt, else A4. */
export function paperOf(pdf: PdfFile): Paper {
  for (const num of [...pdf.offsets.keys()].sort((a, b) => a - b)) {
    const v = pdf.object(num)?.value;
    if (!(v instanceof Map)) continue;
    const type = v.get('Type');
    if (type instanceof PdfName && type.name === 'Page') {
      const box = pdf.resolve(v.get('MediaBox') ?? null);
      return Array.isArray(box) && box[2] === 612 && box[3] === 792 ? 'letter' : 'a4';
    }
  }
  return 'a4';
}

/**
 * What signing does to the layout, without the signature: the trailing newline removed and the
 * /ByteRange placeholder filled in (the same steps as @signpdf's SignPdf.sign). Returns the
 * bytes and the range [start, end) of the /Contents hex string.
 */
export function layoutAsSigned(unsigned: Buffer): { bytes: Buffer; gap: [number, number] } | null {
  let pdf = unsigned;
  if (pdf[pdf.length - 1] === 0x0a) pdf = pdf.subarray(0, pdf.length - 1);
  if (pdf[pdf.length - 1] === 0x0d) pdf = pdf.subarray(0, pdf.length - 1);
  const at = pdf.indexOf(PLACEHOLDER);
  if (at < 0) return null;
  const end = at + PLACEHOLDER.length;
  const open = pdf.indexOf('<', pdf.indexOf('/Contents ', end));
  const close = pdf.indexOf('>', open);
  if (open < 0 || close < 0) return null;
  const range = [0, open, close + 1, pdf.length - (close + 1)];
  const actual = `/ByteRange [${range.join(' ')}]`.padEnd(PLACEHOLDER.length, ' ');
  const bytes = Buffer.concat([pdf.subarray(0, at), Buffer.from(actual, 'latin1'), pdf.subarray(end)]);
  return { bytes, gap: [open, close + 1] };
}

export interface RebuildOptions {
  readonly paper: Paper;
  /** The record's signature dictionary, if it has one (its /M is used for the rebuild). */
  readonly signature?: SignatureDict | null;
  readonly fonts?: RecordFonts;
}

/** The record as this engine makes it from `review`, laid out as signed if the original was. */
export async function rebuildRecord(review: Review, results: Results, options: RebuildOptions): Promise<{ bytes: Buffer; gap: [number, number] | null }> {
  const signingTime = options.signature ? (options.signature.signingTime ?? new Date(0)) : null;
  const pdf = await renderRecord(review, results, {
    paper: options.paper,
    maps: operatingMaps(review) ?? [],
    ...(options.fonts ? { fonts: options.fonts } : {}),
    ...(signingTime ? { signature: signaturePlaceholderFor(review, signingTime) } : {}),
  });
  if (!signingTime) return { bytes: pdf, gap: null };
  const laid = layoutAsSigned(pdf);
  if (!laid) throw new Error('internal: the rebuilt record has no signature placeholder');
  return laid;
}

/** Compare a record file with its rebuild; a signed record's /Contents range is left out. */
export function compareRecord(record: Uint8Array, rebuilt: { bytes: Buffer; gap: [number, number] | null }, recordSignature: SignatureDict | null): RebuildComparison {
  const rec = Buffer.from(record.buffer, record.byteOffset, record.byteLength);
  let expected = rebuilt.bytes;
  const differs = new Set<RecordPart>();
  if (rebuilt.gap) {
    // Put the record's signature into the rebuild, where the rebuild has its own gap: the
    // signature is checked on its own (pdfSignature.ts), the rest must be identical.
    const [s, e] = rebuilt.gap;
    const br = recordSignature?.byteRange;
    if (!br || br[1] !== s || br[2] !== e) differs.add('signature');
    else expected = Buffer.concat([expected.subarray(0, s), rec.subarray(s, e), expected.subarray(e)]);
  } else if (recordSignature) differs.add('signature');
  if (differs.size === 0 && Buffer.compare(rec, expected) === 0) return { same: true, differs: [] };

  if (rec.length > expected.length && Buffer.compare(rec.subarray(0, expected.length), expected) === 0) differs.add('appended data');
  else if (countEof(rec) > countEof(expected)) differs.add('appended data');
  for (const p of differingObjects(rec, expected)) differs.add(p);
  if (differs.size === 0) differs.add('document structure'); // same objects, other bytes around them (xref, trailer, padding)
  return { same: false, differs: ORDER.filter((p) => differs.has(p)) };
}

function countEof(b: Buffer): number {
  let n = 0;
  for (let i = b.indexOf('%%EOF'); i >= 0; i = b.indexOf('%%EOF', i + 5)) n++;
  return n;
}

/** Which parts differ, object by object (the classes come from whichever file has the object). */
function differingObjects(record: Buffer, expected: Buffer): RecordPart[] {
  let a: PdfFile;
  try {
    a = new PdfFile(record);
  } catch {
    return ['document structure'];
  }
  const b = new PdfFile(expected);
  const infoA = infoObjects(a);
  const infoB = infoObjects(b);
  const out = new Set<RecordPart>();
  const nums = new Set([...a.offsets.keys(), ...b.offsets.keys()]);
  for (const num of nums) {
    const x = a.span(num);
    const y = b.span(num);
    if (x && y && Buffer.compare(Buffer.from(x), Buffer.from(y)) === 0) continue;
    const holder = y ? b : a;
    out.add((y ? infoB : infoA).has(num) ? 'document information' : classify(holder, num));
  }
  if (refNum(a.trailer.get('Info')) !== refNum(b.trailer.get('Info'))) out.add('document information');
  return [...out];
}

function refNum(v: PdfValue | undefined): number | null {
  return v instanceof PdfRef ? v.num : null;
}

/** The document information dictionary and the objects its values refer to (pdfkit writes each string as its own object). */
function infoObjects(pdf: PdfFile): Set<number> {
  const out = new Set<number>();
  const ref = pdf.trailer.get('Info');
  if (!(ref instanceof PdfRef)) return out;
  out.add(ref.num);
  try {
    const d = pdf.dict(ref);
    if (d) for (const v of d.values()) if (v instanceof PdfRef) out.add(v.num);
  } catch {
    // a damaged Info dictionary: its own number is enough to name it
  }
  return out;
}

function classify(pdf: PdfFile, num: number): RecordPart {
  let v: PdfValue = null;
  try {
    v = pdf.object(num)?.value ?? null;
  } catch {
    return 'document structure';
  }
  if (!(v instanceof Map)) return 'document structure';
  const type = v.get('Type');
  const name = type instanceof PdfName ? type.name : '';
  if (name === 'EmbeddedFile' || name === 'Filespec' || v.has('EmbeddedFiles')) return 'attachment';
  if (name === 'Sig') return 'signature';
  if (name === 'Metadata') return 'document information'; // the XMP copy of the document information
  if (name === 'Catalog' || name === 'AcroForm') return 'document structure';
  if (v.has('Names') && !v.has('Type')) return 'attachment'; // a node of the attachment name tree
  return 'pages'; // pages, page tree, content streams, fonts, images, annotations
}
