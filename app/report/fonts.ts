/**
 * The record's fonts: DejaVu Sans and DejaVu Sans Bold (assets/fonts, Bitstream Vera licence,
 * LICENSE-DejaVu.txt), which carry Greek, ° and the unit signs; pdfkit embeds a subset.
 */
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export interface RecordFonts {
  readonly regular: Uint8Array;
  readonly bold: Uint8Array;
}

const REGULAR = 'DejaVuSans.ttf';
const BOLD = 'DejaVuSans-Bold.ttf';

function candidateDirs(): string[] {
  const dirs: string[] = [];
  if (process.env.FLANKFILM_FONTS_DIR) dirs.push(process.env.FLANKFILM_FONTS_DIR);
  try {
    // app/report/fonts.ts → ../../assets/fonts (source tree); a bundle may sit one level deeper.
    const here = dirname(fileURLToPath(import.meta.url));
    dirs.push(resolve(here, '../../assets/fonts'), resolve(here, '../assets/fonts'), resolve(here, 'assets/fonts'));
  } catch {
    // import.meta.url is empty in a CommonJS bundle; fall through to the working folder.
  }
  dirs.push(resolve(process.cwd(), 'assets/fonts'));
  return dirs;
}

let cached: RecordFonts | null = null;

/** Read the two TTF files from `dir`, or from the first assets/fonts folder found. */
export function loadRecordFonts(dir?: string): RecordFonts {
  if (!dir && cached) return cached;
  const dirs = dir ? [dir] : candidateDirs();
  for (const d of dirs) {
    if (existsSync(join(d, REGULAR)) && existsSync(join(d, BOLD))) {
      const fonts = { regular: readFileSync(join(d, REGULAR)), bold: readFileSync(join(d, BOLD)) };
      if (!dir) cached = fonts;
      return fonts;
    }
  }
  throw new Error(`the record's fonts (${REGULAR}, ${BOLD}) were not found in ${dirs.join(', ')}`);
}
