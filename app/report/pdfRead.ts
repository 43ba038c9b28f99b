/**
 * Reads back what a Flankfilm record carries: its document information (the fingerprint keys)
 * and its attached files. A small reader for the PDFs pdfkit writes (classic xref table, no
 * object streams), with a linear scan of "N G obj" as a fallback. Throws RecordReadError for a
 * file that is not such a PDF.
 */
import { inflateSync } from 'node:zlib';
import { MAX_REVIEW_BYTES } from '../review/parse';

export class RecordReadError extends Error {}

export type PdfValue = null | boolean | number | string | Uint8Array | PdfName | PdfRef | PdfValue[] | PdfDict;
export class PdfName {
  constructor(readonly name: string) {}
}
export class PdfRef {
  constructor(
    readonly num: number,
    readonly gen: number,
  ) {}
}
export type PdfDict = Map<string, PdfValue>;

const WS = new Set([0x00, 0x09, 0x0a, 0x0c, 0x0d, 0x20]);
const DELIM = new Set([0x28, 0x29, 0x3c, 0x3e, 0x5b, 0x5d, 0x7b, 0x7d, 0x2f, 0x25]);

class Parser {
  pos: number;
  constructor(
    readonly b: Uint8Array,
    pos: number,
  ) {
    this.pos = pos;
  }
  skip(): void {
    const b = this.b;
    while (this.pos < b.length) {
      const c = b[this.pos]!;
      if (WS.has(c)) this.pos++;
      else if (c === 0x25) {
        while (this.pos < b.length && b[this.pos] !== 0x0a && b[this.pos] !== 0x0d) this.pos++;
      } else break;
    }
  }
  token(): string {
    this.skip();
    const start = this.pos;
    while (this.pos < this.b.length && !WS.has(this.b[this.pos]!) && !DELIM.has(this.b[this.pos]!)) this.pos++;
    return latin1(this.b.subarray(start, this.pos));
  }
  value(): PdfValue {
    this.skip();
    const b = this.b;
    const c = b[this.pos];
    if (c === undefined) throw new RecordReadError('unexpected end of file');
    if (c === 0x2f) {
      this.pos++;
      const start = this.pos;
      while (this.pos < b.length && !WS.has(b[this.pos]!) && !DELIM.has(b[this.pos]!)) this.pos++;
      return new PdfName(latin1(b.subarray(start, this.pos)).replace(/#([0-9A-Fa-f]{2})/g, (_, h: string) => String.fromCharCode(parseInt(h, 16))));
    }
    if (c === 0x3c && b[this.pos + 1] === 0x3c) {
      this.pos += 2;
      const d: PdfDict = new Map();
      for (;;) {
        this.skip();
        if (b[this.pos] === 0x3e && b[this.pos + 1] === 0x3e) {
          this.pos += 2;
          return d;
        }
        const k = this.value();
        if (!(k instanceof PdfName)) throw new RecordReadError('malformed dictionary');
        d.set(k.name, this.value());
      }
    }
    if (c === 0x3c) {
      const end = b.indexOf(0x3e, this.pos);
      if (end < 0) throw new RecordReadError('unterminated hex string');
      const hex = latin1(b.subarray(this.pos + 1, end)).replace(/\s+/g, '');
      this.pos = end + 1;
      const out = new Uint8Array(Math.ceil(hex.length / 2));
      for (let i = 0; i < out.length; i++) out[i] = parseInt(hex.slice(2 * i, 2 * i + 2).padEnd(2, '0'), 16);
      return out;
    }
    if (c === 0x28) return this.literal();
    if (c === 0x5b) {
      this.pos++;
      const arr: PdfValue[] = [];
      for (;;) {
        this.skip();
        if (b[this.pos] === 0x5d) {
          this.pos++;
          return arr;
        }
        arr.push(this.value());
      }
    }
    const t = this.token();
    if (t === 'true') return true;
    if (t === 'false') return false;
    if (t === 'null') return null;
    if (/^[+-]?(\d+\.?\d*|\.\d+)$/.test(t)) {
      // "N G R" is a reference
      const save = this.pos;
      if (/^\d+$/.test(t)) {
        const g = this.token();
        if (/^\d+$/.test(g)) {
          const r = this.token();
          if (r === 'R') return new PdfRef(Number(t), Number(g));
        }
      }
      this.pos = save;
      return Number(t);
    }
    throw new RecordReadError(`unexpected token "${t.slice(0, 20)}" at byte ${this.pos}`);
  }
  literal(): Uint8Array {
    const b = this.b;
    this.pos++;
    const out: number[] = [];
    let depth = 1;
    while (this.pos < b.length) {
      const c = b[this.pos++]!;
      if (c === 0x5c) {
        const n = b[this.pos++]!;
        const map: Record<number, number> = { 0x6e: 0x0a, 0x72: 0x0d, 0x74: 0x09, 0x62: 0x08, 0x66: 0x0c, 0x28: 0x28, 0x29: 0x29, 0x5c: 0x5c };
        if (map[n] !== undefined) out.push(map[n]);
        else if (n >= 0x30 && n <= 0x37) {
          let v = n - 0x30;
          for (let k = 0; k < 2 && b[this.pos]! >= 0x30 && b[this.pos]! <= 0x37; k++) v = v * 8 + (b[this.pos++]! - 0x30);
          out.push(v & 0xff);
        } else if (n === 0x0d) {
          if (b[this.pos] === 0x0a) this.pos++;
        } else if (n !== 0x0a) out.push(n);
      } else if (c === 0x28) {
        depth++;
        out.push(c);
      } else if (c === 0x29) {
        if (--depth === 0) return Uint8Array.from(out);
        out.push(c);
      } else out.push(c);
    }
    throw new RecordReadError('unterminated string');
  }
}

export function latin1(b: Uint8Array): string {
  return Buffer.from(b.buffer, b.byteOffset, b.byteLength).toString('latin1');
}

/** A PDF text string: UTF-16BE with a byte-order mark, else PDFDocEncoding (taken as Latin-1). */
export function pdfTextString(bytes: Uint8Array): string {
  if (bytes[0] === 0xfe && bytes[1] === 0xff) {
    let s = '';
    for (let i = 2; i + 1 < bytes.length; i += 2) s += String.fromCharCode((bytes[i]! << 8) | bytes[i + 1]!);
    return s;
  }
  return latin1(bytes);
}

interface PdfObject {
  value: PdfValue;
  stream: Uint8Array | null;
}

export class PdfFile {
  readonly offsets = new Map<number, number>();
  /** Nesting of object() → resolve(/Length) → object(): a stream whose length refers back to itself stops here. */
  private depth = 0;
  trailer: PdfDict = new Map();
  constructor(readonly b: Uint8Array) {
    if (latin1(b.subarray(0, 5)) !== '%PDF-') throw new RecordReadError('not a PDF (no %PDF- header)');
    if (!this.readXref()) this.scan();
  }

  /** The classic xref table at startxref and, through /Prev, those of earlier revisions (the newest entry wins). */
  private readXref(): boolean {
    try {
      const tail = latin1(this.b.subarray(Math.max(0, this.b.length - 1024)));
      const m = /startxref\s+(\d+)\s+%%EOF\s*$/.exec(tail);
      if (!m) return false;
      const seen = new Set<number>();
      for (let at: number | null = Number(m[1]); at !== null; ) {
        if (seen.has(at) || seen.size >= 32) throw new RecordReadError('the cross-reference sections form a loop');
        seen.add(at);
        const t = this.readSection(at);
        if (!t) return false;
        if (seen.size === 1) this.trailer = t;
        const prev = t.get('Prev');
        at = typeof prev === 'number' && Number.isInteger(prev) && prev >= 0 && prev < this.b.length ? prev : null;
      }
      return true;
    } catch (e) {
      if (e instanceof RecordReadError) throw e;
      return false;
    }
  }

  private readSection(at: number): PdfDict | null {
    const p = new Parser(this.b, at);
    if (p.token() !== 'xref') return null;
    for (;;) {
      const save = p.pos;
      const first = p.token();
      if (first === 'trailer') break;
      const count = Number(p.token());
      if (!/^\d+$/.test(first) || !Number.isInteger(count) || count > this.b.length / 18) {
        p.pos = save;
        return null;
      }
      for (let i = 0; i < count; i++) {
        const off = Number(p.token());
        p.token();
        const kind = p.token();
        const num = Number(first) + i;
        if (kind === 'n' && !this.offsets.has(num)) this.offsets.set(num, off);
      }
    }
    const t = p.value();
    return t instanceof Map ? t : null;
  }

  private scan(): void {
    const text = latin1(this.b);
    const re = /(?:^|[\r\n\s])(\d+)\s+(\d+)\s+obj\b/g;
    for (let m = re.exec(text); m; m = re.exec(text)) this.offsets.set(Number(m[1]), m.index + (m[0].length - m[0].trimStart().length));
    const t = text.lastIndexOf('trailer');
    if (t < 0) throw new RecordReadError('no trailer: not a PDF Flankfilm can read');
    const v = new Parser(this.b, t + 7).value();
    if (!(v instanceof Map)) throw new RecordReadError('malformed trailer');
    this.trailer = v;
  }

  object(num: number): PdfObject | null {
    const off = this.offsets.get(num);
    if (off === undefined) return null;
    if (this.depth > 32) throw new RecordReadError(`object ${num}: references nest too deep (a loop)`);
    this.depth++;
    try {
      return this.parseObject(num, off);
    } finally {
      this.depth--;
    }
  }

  /** Bytes of object `num` from "N G obj" to the end of "endobj" (null if absent or malformed). */
  span(num: number): Uint8Array | null {
    const off = this.offsets.get(num);
    if (off === undefined) return null;
    const end = Buffer.from(this.b.buffer, this.b.byteOffset, this.b.byteLength).indexOf('endobj', off, 'latin1');
    return end < 0 ? null : this.b.subarray(off, end + 6);
  }

  private parseObject(num: number, off: number): PdfObject | null {
    const p = new Parser(this.b, off);
    if (Number(p.token()) !== num) return null;
    p.token();
    if (p.token() !== 'obj') return null;
    const value = p.value();
    p.skip();
    let stream: Uint8Array | null = null;
    if (value instanceof Map && latin1(this.b.subarray(p.pos, p.pos + 6)) === 'stream') {
      let start = p.pos + 6;
      if (this.b[start] === 0x0d) start++;
      if (this.b[start] === 0x0a) start++;
      const len = this.resolve(value.get('Length') ?? null);
      if (typeof len !== 'number' || len < 0 || start + len > this.b.length) throw new RecordReadError(`object ${num}: bad stream length`);
      stream = this.b.subarray(start, start + len);
    }
    return { value, stream };
  }

  resolve(v: PdfValue): PdfValue {
    for (let i = 0; i < 32 && v instanceof PdfRef; i++) v = this.object(v.num)?.value ?? null;
    return v;
  }

  dict(v: PdfValue): PdfDict | null {
    const r = this.resolve(v);
    return r instanceof Map ? r : null;
  }
}

export interface RecordContents {
  /** Document information, as text. */
  readonly info: Readonly<Record<string, string>>;
  readonly attachments: ReadonlyArray<{ name: string; data: Uint8Array }>;
}

/** More attachments than a record carries (it carries one): the file is not a record. */
const MAX_ATTACHMENTS = 16;

/** Document information and attached files of a PDF made by Flankfilm. */
export function readRecord(bytes: Uint8Array): RecordContents {
  const pdf = new PdfFile(bytes);
  const info: Record<string, string> = {};
  const infoDict = pdf.dict(pdf.trailer.get('Info') ?? null);
  if (infoDict) {
    for (const [k, v] of infoDict) {
      const r = pdf.resolve(v);
      if (r instanceof Uint8Array) info[k] = pdfTextString(r);
      else if (r instanceof PdfName) info[k] = r.name;
      else if (typeof r === 'number' || typeof r === 'boolean') info[k] = String(r);
    }
  }
  const attachments: Array<{ name: string; data: Uint8Array }> = [];
  const root = pdf.dict(pdf.trailer.get('Root') ?? null);
  const names = pdf.dict(root?.get('Names') ?? null);
  const tree = pdf.dict(names?.get('EmbeddedFiles') ?? null);
  // A name tree is a tree: a node seen twice (a Kids entry pointing back up) is refused at once,
  // as are trees deeper or wider than any record has, so a crafted file cannot loop or stall.
  const seen = new Set<number>();
  let entries = 0;
  const visit = (node: PdfDict | null, depth: number): void => {
    if (!node) return;
    if (depth > 16) throw new RecordReadError('the attachment name tree is nested more than 16 levels deep');
    const arr = pdf.resolve(node.get('Names') ?? null);
    if (Array.isArray(arr)) {
      for (let i = 0; i + 1 < arr.length; i += 2) {
        if (++entries > MAX_ATTACHMENTS) throw new RecordReadError(`the record lists more than ${MAX_ATTACHMENTS} attachments`);
        const spec = pdf.dict(arr[i + 1] ?? null);
        const fallback = pdf.resolve(arr[i] ?? null);
        if (spec) {
          const file = fileOf(pdf, spec, fallback instanceof Uint8Array ? pdfTextString(fallback) : `attachment-${i / 2}`);
          if (file) attachments.push(file);
        }
      }
    }
    const kids = pdf.resolve(node.get('Kids') ?? null);
    if (Array.isArray(kids)) {
      for (const k of kids) {
        if (k instanceof PdfRef) {
          if (seen.has(k.num)) throw new RecordReadError(`the attachment name tree refers to itself (object ${k.num})`);
          seen.add(k.num);
        }
        visit(pdf.dict(k), depth + 1);
      }
    }
  };
  const treeRef = names?.get('EmbeddedFiles');
  if (treeRef instanceof PdfRef) seen.add(treeRef.num);
  visit(tree, 0);
  return { info, attachments };
}

function fileOf(pdf: PdfFile, spec: PdfDict, fallbackName: string): { name: string; data: Uint8Array } | null {
  const uf = pdf.resolve(spec.get('UF') ?? spec.get('F') ?? null);
  const name = uf instanceof Uint8Array ? pdfTextString(uf) : fallbackName;
  const ef = pdf.dict(spec.get('EF') ?? null);
  const ref = ef?.get('F') ?? ef?.get('UF');
  if (!(ref instanceof PdfRef)) return null;
  const obj = pdf.object(ref.num);
  if (!obj?.stream || !(obj.value instanceof Map)) return null;
  const filter = pdf.resolve(obj.value.get('Filter') ?? null);
  const filters = Array.isArray(filter) ? filter : filter ? [filter] : [];
  let data: Uint8Array = obj.stream;
  for (const f of filters) {
    if (f instanceof PdfName && f.name === 'FlateDecode') {
      try {
        // Bounded: a small stream that inflates past a review's size limit fails at once.
        data = inflateSync(data, { maxOutputLength: MAX_REVIEW_BYTES + 1 });
      } catch (e) {
        if ((e as NodeJS.ErrnoException).code === 'ERR_BUFFER_TOO_LARGE' || e instanceof RangeError) {
          throw new RecordReadError(`attachment ${name}: it inflates past ${MAX_REVIEW_BYTES / 1e6} MB, the size limit of a review`);
        }
        throw new RecordReadError(`attachment ${name}: the compressed stream is damaged (${(e as Error).message})`);
      }
      if (data.length > MAX_REVIEW_BYTES) throw new RecordReadError(`attachment ${name}: it inflates past ${MAX_REVIEW_BYTES / 1e6} MB, the size limit of a review`);
    } else throw new RecordReadError(`attachment ${name}: unsupported filter ${f instanceof PdfName ? f.name : String(f)}`);
  }
  return { name, data };
}
