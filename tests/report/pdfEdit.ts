/**
 * A small PDF editor for building forged records in tests: it reads the objects of a PDF with a
 * classic cross-reference table (what pdfkit writes), lets a test change an object's dictionary
 * or stream, and writes a well-formed file again with a fresh cross-reference table — the kind of
 * forgery any PDF library makes, which a byte check of offsets alone would not catch.
 * Independent of app/report/pdfRead.ts on purpose: the forger does not use our reader.
 */
import { deflateSync, inflateSync } from 'node:zlib';

export class PdfEdit {
  private constructor(
    readonly header: string,
    /** Object number → the text between "N 0 obj\n" and "\nendobj" (latin1). */
    readonly objects: Map<number, string>,
    /** The trailer dictionary's text, "<< … >>". */
    public trailer: string,
  ) {}

  static parse(bytes: Buffer): PdfEdit {
    const s = bytes.toString('latin1');
    const startxref = Number(/startxref\s+(\d+)\s+%%EOF\s*$/.exec(s)?.[1]);
    if (!Number.isInteger(startxref)) throw new Error('pdfEdit: no startxref');
    const xref = s.slice(startxref);
    const m = /^xref\s+(\d+)\s+(\d+)\s+/.exec(xref);
    if (!m) throw new Error('pdfEdit: no classic xref table');
    const first = Number(m[1]);
    const count = Number(m[2]);
    const entries = xref.slice(m[0].length).split(/\r?\n/).slice(0, count);
    const objects = new Map<number, string>();
    let firstAt = s.length;
    // In file order, so that writing them again keeps the layout (and an unedited file stays identical).
    const inUse = entries
      .map((line, i) => ({ num: first + i, parts: line.trim().split(/\s+/) }))
      .filter((e) => e.parts[2] === 'n')
      .sort((a, b) => Number(a.parts[0]) - Number(b.parts[0]));
    inUse.forEach(({ num, parts: [off] }) => {
      const head = `${num} 0 obj\n`;
      const at = Number(off);
      firstAt = Math.min(firstAt, at);
      if (s.slice(at, at + head.length) !== head) throw new Error(`pdfEdit: object ${num} is not at ${at}`);
      const bodyStart = at + head.length;
      let searchFrom = bodyStart;
      const streamAt = s.indexOf('\nstream\n', bodyStart);
      const endobjAt = s.indexOf('\nendobj', bodyStart);
      if (streamAt >= 0 && streamAt < endobjAt) {
        const len = Number(/\/Length (\d+)/.exec(s.slice(bodyStart, streamAt))?.[1]);
        searchFrom = streamAt + 8 + len;
      }
      objects.set(num, s.slice(bodyStart, s.indexOf('\nendobj', searchFrom)));
    });
    const trailer = /trailer\s*(<<[\s\S]*?>>)\s*startxref/.exec(xref)?.[1];
    if (!trailer) throw new Error('pdfEdit: no trailer');
    return new PdfEdit(s.slice(0, firstAt), objects, trailer);
  }

  /** Object numbers whose text matches. */
  find(re: RegExp): number[] {
    return [...this.objects].filter(([, body]) => re.test(body)).map(([n]) => n);
  }

  body(num: number): string {
    const b = this.objects.get(num);
    if (b === undefined) throw new Error(`pdfEdit: no object ${num}`);
    return b;
  }

  /** The dictionary part of an object (before "stream"). */
  dict(num: number): string {
    const b = this.body(num);
    const at = b.indexOf('\nstream\n');
    return at < 0 ? b : b.slice(0, at);
  }

  setDict(num: number, dict: string): void {
    const b = this.body(num);
    const at = b.indexOf('\nstream\n');
    this.objects.set(num, at < 0 ? dict : dict + b.slice(at));
  }

  /** The stream of an object, inflated if it is FlateDecode. */
  stream(num: number): Buffer {
    const b = this.body(num);
    const at = b.indexOf('\nstream\n');
    if (at < 0) throw new Error(`pdfEdit: object ${num} has no stream`);
    const raw = Buffer.from(b.slice(at + 8, b.lastIndexOf('\nendstream')), 'latin1');
    return /\/FlateDecode/.test(b.slice(0, at)) ? inflateSync(raw) : raw;
  }

  /** Replace the stream (compressed again if it was FlateDecode), with its /Length. */
  setStream(num: number, data: Buffer, { compress = true }: { compress?: boolean } = {}): void {
    const dict = this.dict(num);
    const raw = compress && /\/FlateDecode/.test(dict) ? deflateSync(data) : data;
    this.objects.set(num, `${dict.replace(/\/Length \d+/, `/Length ${raw.length}`)}\nstream\n${raw.toString('latin1')}\nendstream`);
  }

  /** The trailer's reference for a key, e.g. ref('Info') → 66. */
  ref(key: string): number {
    const m = new RegExp(`/${key} (\\d+) 0 R`).exec(this.trailer);
    if (!m) throw new Error(`pdfEdit: no /${key} in the trailer`);
    return Number(m[1]);
  }

  /** A well-formed PDF of these objects, with a fresh cross-reference table. */
  toBuffer(): Buffer {
    const nums = [...this.objects.keys()]; // file order; new objects at the end
    const size = Math.max(...nums) + 1;
    let out = this.header;
    const offsets = new Map<number, number>();
    for (const n of nums) {
      offsets.set(n, Buffer.byteLength(out, 'latin1'));
      out += `${n} 0 obj\n${this.objects.get(n)}\nendobj\n`;
    }
    const xrefAt = Buffer.byteLength(out, 'latin1');
    out += `xref\n0 ${size}\n0000000000 65535 f \n`;
    for (let n = 1; n < size; n++) {
      const off = offsets.get(n);
      out += off === undefined ? '0000000000 65535 f \n' : `${String(off).padStart(10, '0')} 00000 n \n`;
    }
    const trailer = this.trailer.replace(/\/Size \d+/, `/Size ${size}`);
    out += `trailer\n${trailer}\nstartxref\n${xrefAt}\n%%EOF\n`;
    return Buffer.from(out, 'latin1');
  }
}

/** An incremental update: `objects` appended after the file with their own xref and a /Prev trailer. */
export function appendUpdate(bytes: Buffer, objects: ReadonlyMap<number, string>): Buffer {
  const s = bytes.toString('latin1');
  const prev = Number(/startxref\s+(\d+)\s+%%EOF\s*$/.exec(s)?.[1]);
  const oldTrailer = /trailer\s*(<<[\s\S]*?>>)\s*startxref\s+\d+\s+%%EOF\s*$/.exec(s)?.[1] ?? '';
  let out = s.endsWith('\n') ? s : `${s}\n`;
  let xref = 'xref\n';
  const size = Math.max(Number(/\/Size (\d+)/.exec(oldTrailer)?.[1] ?? 0), ...[...objects.keys()].map((n) => n + 1));
  for (const [n, body] of objects) {
    xref += `${n} 1\n${String(Buffer.byteLength(out, 'latin1')).padStart(10, '0')} 00000 n \n`;
    out += `${n} 0 obj\n${body}\nendobj\n`;
  }
  const at = Buffer.byteLength(out, 'latin1');
  const trailer = oldTrailer.replace(/\/Size \d+/, `/Size ${size}`).replace(/>>\s*$/, `/Prev ${prev}\n>>`);
  out += `${xref}trailer\n${trailer}\nstartxref\n${at}\n%%EOF\n`;
  return Buffer.from(out, 'latin1');
}
