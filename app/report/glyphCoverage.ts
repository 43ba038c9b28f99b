/**
 * Which characters the record's font can draw: read from the TrueType 'cmap' table (Apple
 * TrueType Reference Manual / OpenType spec, "cmap — Character to Glyph Index Mapping"), the
 * Windows Unicode subtables: format 12 (full repertoire) if present, else format 4 (BMP).
 * A character mapped to glyph 0 (.notdef) prints as a box: that is what this refuses.
 */
import type { Review } from '../review/schema';
import { formatPath } from '../review/fieldPath';

export type Covers = (codePoint: number) => boolean;

const cache = new WeakMap<Uint8Array, Covers>();

/** The coverage of a TrueType font (cached per font buffer). */
export function fontCoverage(ttf: Uint8Array): Covers {
  let c = cache.get(ttf);
  if (!c) cache.set(ttf, (c = readCoverage(ttf)));
  return c;
}

function readCoverage(ttf: Uint8Array): Covers {
  const v = new DataView(ttf.buffer, ttf.byteOffset, ttf.byteLength);
  const numTables = v.getUint16(4);
  let cmap = -1;
  for (let i = 0; i < numTables; i++) {
    const rec = 12 + 16 * i;
    if (String.fromCharCode(ttf[rec]!, ttf[rec + 1]!, ttf[rec + 2]!, ttf[rec + 3]!) === 'cmap') cmap = v.getUint32(rec + 8);
  }
  if (cmap < 0) throw new Error('the font has no cmap table');
  const subtables = v.getUint16(cmap + 2);
  let f4 = -1;
  let f12 = -1;
  for (let i = 0; i < subtables; i++) {
    const rec = cmap + 4 + 8 * i;
    const platform = v.getUint16(rec);
    const encoding = v.getUint16(rec + 2);
    const at = cmap + v.getUint32(rec + 4);
    const format = v.getUint16(at);
    if (platform === 3 && encoding === 10 && format === 12) f12 = at;
    if (platform === 3 && encoding === 1 && format === 4) f4 = at;
  }
  if (f12 >= 0) {
    const groups: Array<[number, number]> = [];
    const n = v.getUint32(f12 + 12);
    for (let i = 0; i < n; i++) {
      const g = f12 + 16 + 12 * i;
      groups.push([v.getUint32(g), v.getUint32(g + 4)]);
    }
    return (cp) => groups.some(([a, b]) => cp >= a && cp <= b);
  }
  if (f4 < 0) throw new Error('the font has no Unicode cmap subtable');
  const segX2 = v.getUint16(f4 + 6);
  const ends = f4 + 14;
  const starts = ends + segX2 + 2;
  const deltas = starts + segX2;
  const rangeOffsets = deltas + segX2;
  return (cp) => {
    if (cp > 0xffff) return false;
    for (let s = 0; s < segX2; s += 2) {
      if (cp > v.getUint16(ends + s)) continue;
      const start = v.getUint16(starts + s);
      if (cp < start) return false;
      const ro = v.getUint16(rangeOffsets + s);
      const delta = v.getUint16(deltas + s);
      if (ro === 0) return ((cp + delta) & 0xffff) !== 0;
      const glyph = v.getUint16(rangeOffsets + s + ro + 2 * (cp - start));
      return glyph !== 0 && ((glyph + delta) & 0xffff) !== 0;
    }
    return false;
  };
}

export interface UndrawableText {
  /** The review field, e.g. `loadCases[0].name`. */
  readonly path: string;
  readonly char: string;
}

/** The first character of each text field of the review that a font cannot draw. */
export function undrawableText(review: Review, covers: readonly Covers[]): UndrawableText[] {
  const out: UndrawableText[] = [];
  const walk = (v: unknown, path: Array<string | number>): void => {
    if (typeof v === 'string') {
      for (const ch of v) {
        const cp = ch.codePointAt(0)!;
        if (cp === 0x0a || cp === 0x09 || cp === 0x0d) continue;
        if (!covers.every((c) => c(cp))) {
          out.push({ path: formatPath(path), char: ch });
          return;
        }
      }
    } else if (Array.isArray(v)) v.forEach((x, i) => walk(x, [...path, i]));
    else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) walk(x, [...path, k]);
  };
  walk(review, []);
  return out;
}

/** "loadCases[0].name: the record's font cannot draw "漢" (U+6F22) …" */
export function undrawableMessage(items: readonly UndrawableText[]): string {
  return items
    .map((i) => `${i.path}: the record's font (DejaVu Sans) cannot draw "${i.char}" (U+${i.char.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}), so the record would show a box; write it with Latin, Greek or Cyrillic letters`)
    .join('\n');
}
