import { parseArgs } from 'node:util';
import { EngineInputError } from '../../engine/diagnostics';
import { atomicWrite, WriteRefused } from '../../files/atomicWrite';
import { formatIssues, parseReviewText } from '../../review/parse';
import { run } from '../../review/run';
import { DECISIONS, REVIEW_VERSION, type Decision } from '../../review/schema';
import { signReview } from '../../review/signoff';
import { status } from '../../review/status';
import { EXIT, UsageError, type CliIo } from '../io';
import { loadReviewFile } from '../reviewFile';

/**
 * `flankfilm sign FILE --reviewer NAME --role ROLE --decision D [--organisation O] [--conditions TEXT] [--signed-at ISO]`:
 * recompute the review and write its sign-off (signedAt, engine version, fingerprint) into FILE,
 * atomically. The rest of the file is kept as written (defaults stay implicit). An invalid
 * review, or one the engine cannot compute, exits 1 with the file untouched.
 */
export async function signCommand(args: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseArgs({
    args,
    allowPositionals: true,
    options: {
      reviewer: { type: 'string' },
      role: { type: 'string' },
      decision: { type: 'string' },
      organisation: { type: 'string' },
      conditions: { type: 'string' },
      'signed-at': { type: 'string' },
    },
  });
  if (positionals.length !== 1) throw new UsageError('give exactly one review FILE');
  if (!values.reviewer) throw new UsageError('--reviewer NAME is required');
  if (!values.role) throw new UsageError('--role ROLE is required');
  if (!values.decision) throw new UsageError(`--decision is required: ${DECISIONS.join(', ')}`);
  if (!(DECISIONS as readonly string[]).includes(values.decision)) throw new UsageError(`--decision must be one of ${DECISIONS.join(', ')}`);
  const file = positionals[0] as string;

  const loaded = await loadReviewFile(file);
  if (!loaded.ok) {
    io.err(`${loaded.message}\n`);
    return EXIT.invalid;
  }
  let results;
  try {
    results = run(loaded.review);
  } catch (e) {
    if (e instanceof EngineInputError) {
      io.err(`${file}: ${e.field}: ${e.message}\nNot signed; the file was not changed.\n`);
      return EXIT.invalid;
    }
    throw e;
  }
  const signed = signReview(loaded.review, results, {
    reviewer: values.reviewer,
    role: values.role,
    decision: values.decision as Decision,
    ...(values.organisation !== undefined ? { organisation: values.organisation } : {}),
    ...(values.conditions !== undefined ? { conditions: values.conditions } : {}),
    signedAt: values['signed-at'] ?? new Date().toISOString(),
  });
  if (!signed.ok) {
    io.err(`${file}: the sign-off is not valid:\n${formatIssues(signed.issues)}\nNot signed; the file was not changed.\n`);
    return EXIT.invalid;
  }

  // Keep the file as the author wrote it and set only its sign-off; a file of an older
  // version is written in the current one (it was migrated on reading).
  const raw = JSON.parse(loaded.text) as Record<string, unknown>;
  const out = raw.version === REVIEW_VERSION ? { ...raw, signoff: signed.signoff } : signed.review;
  const text = `${JSON.stringify(out, null, 2)}\n`;
  const check = parseReviewText(text);
  if (!check.ok || status(check.review, run(check.review)) !== 'signed') {
    io.err(`${file}: internal check failed: the signed file would not read back as signed; the file was not changed.\n`);
    return EXIT.invalid;
  }
  const previous = loaded.review.signoff;
  try {
    await atomicWrite(file, text);
  } catch (e) {
    const why = e instanceof WriteRefused ? e.reason : ((e as NodeJS.ErrnoException).code ?? (e as Error).message);
    io.err(`${file}: cannot write (${why}); the file was not changed.\n`);
    return EXIT.invalid;
  }
  if (previous) {
    const kept = signed.signoff.history?.some((h) => h.signedAt === previous.signedAt && h.fingerprint === previous.fingerprint);
    io.out(kept ? `the sign-off by ${previous.reviewer} of ${previous.signedAt} is kept in the revision history\n` : `replaced the sign-off by ${previous.reviewer} of ${previous.signedAt} (the same inputs and details signed again)\n`);
  }
  io.out(`signed ${file}: ${signed.signoff.decision} by ${signed.signoff.reviewer} at ${signed.signoff.signedAt}\nfingerprint ${signed.signoff.fingerprint}\n`);
  return EXIT.ok;
}
