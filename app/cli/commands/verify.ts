import { parseArgs } from 'node:util';
import { EngineInputError } from '../../engine/diagnostics';
import { ENGINE_VERSION } from '../../engine/version';
import { readRegularFile } from '../../files/readRegular';
import { differingParts, fingerprintParts, type FingerprintPart } from '../../review/fingerprint';
import { formatIssues, parseReviewText } from '../../review/parse';
import type { Results } from '../../review/results';
import { run } from '../../review/run';
import type { Review } from '../../review/schema';
import { status } from '../../review/status';
import { PdfFile, readRecord, RecordReadError, type RecordContents } from '../../report/pdfRead';
import { checkSignature, signatureDicts, type SignatureCheck, type SignatureDict } from '../../report/pdfSignature';
import { compareRecord, paperOf, rebuildRecord, type RecordPart } from '../../report/rebuild';
import { checkSignedState, NO_AUDIT_WORDS } from '../../review/audit/signedState';
import { INFO_KEYS } from '../../report/record';
import { EXIT, UsageError, type CliIo } from '../io';
import { loadReviewFile } from '../reviewFile';

/** A record is a few hundred kB; the largest review the schema accepts makes a few MB. */
export const MAX_RECORD_BYTES = 32_000_000;

const PART_WORDS: Readonly<Record<FingerprintPart, string>> = {
  inputs: 'inputs (the review)',
  results: 'results (the recomputed summary)',
  engine: 'engine version',
};

const RECORD_WORDS: Readonly<Record<RecordPart, string>> = {
  pages: 'pages (the rebuilt pages are not these)',
  attachment: 'attachment (the embedded review file)',
  'document information': 'document information',
  signature: 'signature',
  'document structure': 'document structure (cross-reference, catalogue or trailer)',
  'appended data': 'appended data (bytes added after the record was made: an incremental update)',
};

/**
 * `flankfilm verify PDF [--review FILE]`: check a record as a whole.
 *  - Rebuild the record from the review it carries (or FILE) with this engine and compare it byte
 *    for byte; for a PKCS#7-signed record everything but the signature's /Contents.
 *  - Check the PKCS#7 signature, if present: /ByteRange, message digest, signature against the
 *    embedded certificate; report the signer.
 *  - Compare the fingerprint's part hashes with the review, to say which part differs.
 * Exit 0 match; 3 mismatch (naming what differs); 4 "partial": made by another engine version,
 * so the pages cannot be rebuilt — the review against the fingerprint and the signature were
 * checked, the pages were not; 1 not a readable record or an invalid review.
 */
export async function verifyCommand(args: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseArgs({ args, allowPositionals: true, options: { review: { type: 'string' } } });
  if (positionals.length !== 1) throw new UsageError('give exactly one record PDF');
  const pdfPath = positionals[0] as string;

  const read = await readRegularFile(pdfPath, MAX_RECORD_BYTES);
  if (!read.ok) {
    io.err(`${pdfPath}: ${read.reason}\n`);
    return EXIT.invalid;
  }
  const bytes = read.bytes;
  let contents: RecordContents;
  let pdf: PdfFile;
  let sigs: SignatureDict[];
  try {
    pdf = new PdfFile(bytes);
    contents = readRecord(bytes);
    sigs = signatureDicts(pdf);
  } catch (e) {
    if (e instanceof RecordReadError) {
      io.err(`${pdfPath}: not a readable Flankfilm record: ${e.message}\n`);
      return EXIT.invalid;
    }
    throw e;
  }
  const storedVersion = contents.info[INFO_KEYS.engineVersion];
  const stored = {
    combined: contents.info[INFO_KEYS.fingerprint],
    inputs: contents.info[INFO_KEYS.inputs],
    results: contents.info[INFO_KEYS.results],
    engine: contents.info[INFO_KEYS.engine],
    engineVersion: storedVersion === undefined ? undefined : printable(storedVersion),
  };
  const hex = /^[0-9a-f]{64}$/;
  if (![stored.combined, stored.inputs, stored.results, stored.engine].every((h) => h !== undefined && hex.test(h))) {
    io.err(`${pdfPath}: not a Flankfilm record: its document information carries no fingerprint\n`);
    return EXIT.invalid;
  }

  const loaded = await reviewToCheck(pdfPath, contents, values.review);
  if (!loaded.ok) {
    io.err(`${loaded.message}\n`);
    return EXIT.invalid;
  }
  const { review, source } = loaded;
  let results: Results;
  try {
    results = run(review);
  } catch (e) {
    if (e instanceof EngineInputError) {
      io.err(`${source}: ${e.field}: ${e.message}\n`);
      return EXIT.invalid;
    }
    throw e;
  }

  const lines: string[] = [];
  let mismatch = false;
  const differ = (what: string): void => {
    mismatch = true;
    lines.push(`  differs: ${what}`);
  };

  // The signature (a record carries at most one).
  let sig: SignatureCheck | null = null;
  if (sigs.length > 1) differ(`signature (the record carries ${sigs.length} signatures; Flankfilm writes one)`);
  else if (sigs[0]) {
    sig = checkSignature(bytes, sigs[0]);
    for (const p of sig.problems) differ(`signature: ${p}`);
  }

  const otherEngine = storedVersion !== undefined && storedVersion !== ENGINE_VERSION;
  const now = fingerprintParts(review, results, otherEngine ? storedVersion : ENGINE_VERSION);
  if (otherEngine) {
    // Another engine's pages cannot be rebuilt here, and its results need not be this engine's:
    // only the review against the fingerprint's inputs hash (and the signature) can be checked.
    if (now.inputs !== stored.inputs) differ(PART_WORDS.inputs);
    if (now.engine !== stored.engine) differ('document information (the engine hash does not belong to the engine version it names)');
    if (mismatch) return report(io, 'mismatch', pdfPath, source, lines, sig, stored.combined!, now.combined, EXIT.mismatch);
    lines.push(
      `  the record was made by Flankfilm ${stored.engineVersion}; this is Flankfilm ${ENGINE_VERSION}, so its pages cannot be rebuilt`,
      '  checked: the review against the fingerprint’s inputs hash' + (sig ? ', and the PKCS#7 signature' : ''),
      '  NOT checked: the pages, the results summary; verify with Flankfilm ' + stored.engineVersion + ' to check them',
    );
    return report(io, 'partial', pdfPath, source, lines, sig, stored.combined!, null, EXIT.partial);
  }

  const parts = differingParts({ inputs: stored.inputs!, results: stored.results!, engine: stored.engine! }, now);
  for (const p of parts) differ(PART_WORDS[p]);
  // The signed inputs a sign-off keeps must reproduce its fingerprint; if not, they were altered.
  if (checkSignedState(review).kind === 'altered') differ(`signed state: ${NO_AUDIT_WORDS.altered}`);
  if (parts.length === 0 && now.combined !== stored.combined) differ('document information (the combined fingerprint does not belong to its part hashes)');

  let rebuilt;
  try {
    rebuilt = await rebuildRecord(review, results, { paper: paperOf(pdf), signature: sigs.length === 1 ? sigs[0]! : null });
  } catch (e) {
    if (e instanceof RecordReadError) {
      io.err(`${pdfPath}: not a readable Flankfilm record: ${e.message}\n`);
      return EXIT.invalid;
    }
    throw e;
  }
  const cmp = compareRecord(bytes, rebuilt, sigs.length === 1 ? sigs[0]! : null);
  for (const p of cmp.differs) {
    if (p === 'signature' && sig && !sig.ok) continue; // already named, with the reason
    if (p === 'appended data' && sig?.appended) continue;
    differ(RECORD_WORDS[p]);
  }
  if (mismatch) {
    if (parts.includes('engine')) lines.push(`  the record names Flankfilm ${stored.engineVersion ?? '(unknown)'}; this is Flankfilm ${now.engineVersion}`);
    return report(io, 'mismatch', pdfPath, source, lines, sig, stored.combined!, now.combined, EXIT.mismatch);
  }
  lines.push(`  pages, attachment and document information: rebuilt byte for byte by Flankfilm ${ENGINE_VERSION}${sig ? ' (all but the signature itself)' : ''}`);
  lines.push(`fingerprint ${now.combined}`, `state: ${status(review, results)}`);
  return report(io, 'match', pdfPath, source, lines, sig, stored.combined!, now.combined, EXIT.ok);
}

function report(io: CliIo, word: 'match' | 'mismatch' | 'partial', pdfPath: string, source: string, lines: string[], sig: SignatureCheck | null, stored: string, now: string | null, code: number): number {
  const head =
    word === 'match' ? `match: ${pdfPath} agrees with ${source}` : word === 'partial' ? `partial: ${pdfPath} was only partly checked against ${source}` : `mismatch: ${pdfPath} does not agree with ${source}`;
  const out = [head];
  const subject = sig?.subject ? printable(sig.subject) : null;
  if (sig) out.push(sig.ok ? `  signature: valid, signed by ${subject ?? '(no subject)'} (the certificate is not checked against any authority)` : `  signature: NOT valid${subject ? `; it names ${subject}` : ''}`);
  else out.push('  signature: none (an unsigned record)');
  out.push(...lines);
  if (word !== 'match') {
    out.push(`  record fingerprint     ${stored}`);
    if (now) out.push(`  recomputed fingerprint ${now}`);
  }
  io.out(`${out.join('\n')}\n`);
  return code;
}

/** Text from the record (a certificate's subject, a version string) as the terminal may show it: control characters become '?', at most 200 characters. */
function printable(text: string): string {
  return text.replace(/[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g, '?').slice(0, 200);
}

async function reviewToCheck(pdfPath: string, contents: RecordContents, reviewPath: string | undefined): Promise<{ ok: true; review: Review; source: string } | { ok: false; message: string }> {
  if (reviewPath) {
    const loaded = await loadReviewFile(reviewPath);
    return loaded.ok ? { ok: true, review: loaded.review, source: reviewPath } : { ok: false, message: loaded.message };
  }
  const att = contents.attachments.find((a) => a.name.endsWith('.flankfilm.json')) ?? contents.attachments[0];
  if (!att) return { ok: false, message: `${pdfPath}: the record has no attached review; give --review FILE` };
  const parsed = parseReviewText(new TextDecoder('utf-8', { fatal: false }).decode(att.data));
  // The attachment's name is the forger's text too: print only safe characters of it.
  const name = printable(att.name.replace(/[^\p{L}\p{N}._ -]/gu, '?')).slice(0, 80);
  if (!parsed.ok) return { ok: false, message: `${pdfPath}: the attached review (${name}) is not valid:\n${formatIssues(parsed.issues)}` };
  return { ok: true, review: parsed.review, source: `the attached review (${name})` };
}
