#!/usr/bin/env node
/**
 * The `flankfilm` command. Exit codes: 0 success, 1 invalid input (a message names the field),
 * 2 usage error, 3 a record that does not match its review (verify) or reviews that differ (diff),
 * 4 a record of another engine version, checked only in part (verify).
 */
import { runCli } from './runCli';

runCli(process.argv.slice(2), { out: (s) => process.stdout.write(s), err: (s) => process.stderr.write(s) })
  .then((code) => {
    process.exitCode = code;
  })
  .catch((e: unknown) => {
    // Last line of defence: an engineer sees one sentence, not a stack trace.
    process.stderr.write(`flankfilm: internal error: ${(e as Error)?.message ?? String(e)}\n`);
    process.exitCode = 1;
  });
