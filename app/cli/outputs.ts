/**
 * The files `flankfilm review` writes: the record (PDF, optionally PKCS#7-signed) and the CSV of
 * every point along the path. Each file is written atomically, so a failed run leaves any old
 * file as it was. The PKCS#12 passphrase comes from FLANKFILM_P12_PASSPHRASE, never from argv.
 */
import { readFile } from 'node:fs/promises';
import { atomicWrite, WriteRefused } from '../files/atomicWrite';
import type { Results } from '../review/results';
import type { Review } from '../review/schema';
import { resultsToCsv } from '../report/csv';
import { RecordTextError, renderRecord, signaturePlaceholderFor, type Paper } from '../report/record';
import { operatingMaps } from '../review/operatingMaps';
import { recordFilmDetail, type EhlPointResult } from '../review/ehlAtPoint';
import { signRecordPdf, SigningError } from '../report/pdfSign';
import { EXIT, type CliIo } from './io';

export interface OutputOptions {
  pdf?: string;
  csv?: string;
  /** PKCS#12 identity to sign the record with (needs `pdf`). */
  p12?: string;
  paper: Paper;
  /** Include the Film detail at least λ (a numerical EHL solve) in the record. */
  filmDetail?: boolean;
}

export const P12_PASSPHRASE_ENV = 'FLANKFILM_P12_PASSPHRASE';

export async function writeOutputs(review: Review, results: Results, options: OutputOptions, io: CliIo): Promise<number> {
  let code: number = EXIT.ok;
  if (options.p12 && !options.pdf) {
    io.err('flankfilm: --p12 signs the record: give --pdf OUT too\n');
    return EXIT.usage;
  }
  if (options.csv) {
    try {
      await atomicWrite(options.csv, resultsToCsv(results, review.displayUnits));
      io.err(`wrote ${options.csv}\n`); // stderr: stdout stays clean JSON with --json
    } catch (e) {
      io.err(`${options.csv}: cannot write the CSV (${errCode(e)})\n`);
      code = EXIT.invalid;
    }
  }
  if (options.pdf) {
    const c = await writePdf(review, results, options.pdf, options, io);
    if (c !== EXIT.ok) code = c;
  }
  return code;
}

async function writePdf(review: Review, results: Results, path: string, options: OutputOptions, io: CliIo): Promise<number> {
  let p12: Uint8Array | null = null;
  if (options.p12) {
    try {
      p12 = await readFile(options.p12);
    } catch (e) {
      io.err(`${options.p12}: cannot read the signing identity (${errCode(e)})\n`);
      return EXIT.invalid;
    }
  }
  // The PKCS#7 signature states when it was made; only the unsigned record is byte-for-byte reproducible.
  const signingTime = new Date();
  let pdf: Buffer;
  try {
    pdf = await renderRecord(review, results, {
      paper: options.paper,
      maps: operatingMaps(review) ?? [],
      ...(options.filmDetail ? { films: filmsOf(review, results) } : {}),
      ...(p12 ? { signature: signaturePlaceholderFor(review, signingTime) } : {}),
    });
    if (p12) pdf = await signRecordPdf(pdf, p12, process.env[P12_PASSPHRASE_ENV] ?? '', signingTime);
  } catch (e) {
    if (e instanceof SigningError) {
      io.err(`${options.p12}: ${e.message}\n`);
      return EXIT.invalid;
    }
    if (e instanceof RecordTextError) {
      io.err(`${path}: no record made:\n${e.message}\n`);
      return EXIT.invalid;
    }
    throw e;
  }
  try {
    await atomicWrite(path, pdf);
  } catch (e) {
    io.err(`${path}: cannot write the record (${errCode(e)})\n`);
    return EXIT.invalid;
  }
  io.err(`wrote ${path}${p12 ? ' (signed)' : ''}\n`);
  return EXIT.ok;
}

function filmsOf(review: Review, results: Results): EhlPointResult[] {
  const f = recordFilmDetail(review, results);
  return f ? [f] : [];
}

function errCode(e: unknown): string {
  if (e instanceof WriteRefused) return e.reason;
  return (e as NodeJS.ErrnoException).code ?? (e as Error).message ?? String(e);
}
