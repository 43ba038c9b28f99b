import { readFile } from 'node:fs/promises';
import { parseArgs } from 'node:util';
import { EngineInputError } from '../../engine/diagnostics';
import { differingParts, fingerprintParts, type FingerprintPart } from '../../review/fingerprint';
import { formatIssues, parseReviewText } from '../../review/parse';
import type { Results } from '../../review/results';
import { run } from '../../review/run';
import type { Review } from '../../review/schema';
import { status } from '../../review/status';
import { checkSignedState, NO_AUDIT_WORDS } from '../../review/audit/signedState';
import { readRecord, RecordReadError } from '../../report/pdfRead';
import { INFO_KEYS } from '../../report/record';
import { EXIT, UsageError, type CliIo } from '../io';
import { loadReviewFile } from '../reviewFile';

const PART_WORDS: Readonly<Record<FingerprintPart, string>> = {
  inputs: 'inputs (the review)',
  results: 'results (the recomputed summary)',
  engine: 'engine version',
};

/**
 * `flankfilm verify PDF [--review FILE]`: recompute the review (the one attached to the record,
 * or FILE) and compare its fingerprint with the one the record carries. Exit 0 match, 3 mismatch
 * (naming the part that differs: inputs, results or engine version), 1 unreadable or invalid.
 */
export async function verifyCommand(args: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseArgs({ args, allowPositionals: true, options: { review: { type: 'string' } } });
  if (positionals.length !== 1) throw new UsageError('give exactly one record PDF');
  const pdfPath = positionals[0] as string;

  let bytes: Uint8Array;
  try {
    bytes = await readFile(pdfPath);
  } catch (e) {
    io.err(`${pdfPath}: cannot read the file (${(e as NodeJS.ErrnoException).code ?? 'unreadable'})\n`);
    return EXIT.invalid;
  }
  let contents;
  try {
    contents = readRecord(bytes);
  } catch (e) {
    if (e instanceof RecordReadError) {
      io.err(`${pdfPath}: not a readable Flankfilm record: ${e.message}\n`);
      return EXIT.invalid;
    }
    throw e;
  }
  const stored = {
    combined: contents.info[INFO_KEYS.fingerprint],
    inputs: contents.info[INFO_KEYS.inputs],
    results: contents.info[INFO_KEYS.results],
    engine: contents.info[INFO_KEYS.engine],
    engineVersion: contents.info[INFO_KEYS.engineVersion],
  };
  const hex = /^[0-9a-f]{64}$/;
  if (![stored.combined, stored.inputs, stored.results, stored.engine].every((h) => h !== undefined && hex.test(h))) {
    io.err(`${pdfPath}: not a Flankfilm record: its document information carries no fingerprint\n`);
    return EXIT.invalid;
  }

  let review: Review;
  let source: string;
  if (values.review) {
    const loaded = await loadReviewFile(values.review);
    if (!loaded.ok) {
      io.err(`${loaded.message}\n`);
      return EXIT.invalid;
    }
    review = loaded.review;
    source = values.review;
  } else {
    const att = contents.attachments.find((a) => a.name.endsWith('.flankfilm.json')) ?? contents.attachments[0];
    if (!att) {
      io.err(`${pdfPath}: the record has no attached review; give --review FILE\n`);
      return EXIT.invalid;
    }
    const parsed = parseReviewText(new TextDecoder('utf-8', { fatal: false }).decode(att.data));
    if (!parsed.ok) {
      io.err(`${pdfPath}: the attached review (${att.name}) is not valid:\n${formatIssues(parsed.issues)}\n`);
      return EXIT.invalid;
    }
    review = parsed.review;
    source = `the attached review (${att.name})`;
  }

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
  const now = fingerprintParts(review, results);
  // The signed inputs a sign-off keeps must reproduce its fingerprint; if not, they were altered.
  const altered = checkSignedState(review).kind === 'altered' ? [`  signed state: ${NO_AUDIT_WORDS.altered}`] : [];
  const differ = differingParts({ inputs: stored.inputs!, results: stored.results!, engine: stored.engine! }, now);
  if (differ.length === 0 && now.combined === stored.combined) {
    io.out(`${[`match: ${pdfPath} agrees with ${source}`, `fingerprint ${now.combined}`, `state: ${status(review, results)}`, ...altered].join('\n')}\n`);
    return EXIT.ok;
  }
  const lines = [`mismatch: ${pdfPath} does not agree with ${source}`];
  for (const p of differ) lines.push(`  differs: ${PART_WORDS[p]}`);
  if (differ.includes('engine')) lines.push(`  the record was made by Flankfilm ${stored.engineVersion ?? '(unknown)'}; this is Flankfilm ${now.engineVersion}`);
  if (differ.length === 0) lines.push('  differs: the combined fingerprint (the part hashes agree: the record’s metadata was altered)');
  lines.push(...altered, `  record fingerprint     ${stored.combined}`, `  recomputed fingerprint ${now.combined}`);
  io.out(`${lines.join('\n')}\n`);
  return EXIT.mismatch;
}
