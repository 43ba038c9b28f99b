/**
 * `flankfilm fleet FILES|DIR --oils CANDIDATES [--json] [--csv OUT] [--pdf OUT] [--paper a4|letter]`
 *
 * Every gearbox (one review each; a folder gives its `*.flankfilm.json`) against every candidate
 * oil, the smallest oil set and the assignment. A review that cannot be read is named and left
 * out; the others go on, and the exit code is then 1. A bad candidate file stops the run (exit 1)
 * with its file and field named. An output never overwrites an input.
 */
import { readdir, readFile, stat } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { parseArgs } from 'node:util';
import { EngineInputError } from '../../engine/diagnostics';
import { atomicWrite } from '../../files/atomicWrite';
import { fleetToCsv } from '../../fleet/csv';
import { runFleet, type FleetGearboxInput } from '../../fleet/fleet';
import { parseOilsText } from '../../fleet/oilsFile';
import type { FleetFailure, FleetResult } from '../../fleet/types';
import { formatIssues } from '../../review/parse';
import { fleetSummaryText } from '../fleetSummary';
import { EXIT, UsageError, type CliIo } from '../io';
import { loadReviewFile } from '../reviewFile';

const REVIEW_SUFFIX = '.flankfilm.json';

const errCode = (e: unknown): string => (e as NodeJS.ErrnoException).code ?? (e as Error).message ?? String(e);

/** The review files named: a file as given, a folder as its `*.flankfilm.json` in name order. */
async function reviewPaths(args: readonly string[], failed: FleetFailure[]): Promise<string[]> {
  const out: string[] = [];
  for (const a of args) {
    let isDir = false;
    try {
      isDir = (await stat(a)).isDirectory();
    } catch (e) {
      failed.push({ source: a, message: `${a}: cannot read the file (${errCode(e)})` });
      continue;
    }
    if (!isDir) {
      out.push(a);
      continue;
    }
    const names = (await readdir(a)).filter((n) => n.endsWith(REVIEW_SUFFIX)).sort();
    if (names.length === 0) failed.push({ source: a, message: `${a}: the folder holds no ${REVIEW_SUFFIX} files` });
    out.push(...names.map((n) => join(a, n)));
  }
  return out;
}

export async function fleetCommand(args: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseArgs({
    args,
    allowPositionals: true,
    options: {
      oils: { type: 'string' },
      json: { type: 'boolean', default: false },
      csv: { type: 'string' },
      pdf: { type: 'string' },
      paper: { type: 'string', default: 'a4' },
    },
  });
  if (positionals.length === 0) throw new UsageError('give the review FILES or a DIR of them');
  if (!values.oils) throw new UsageError('give the candidate oils: --oils CANDIDATES.flankfilm-oils.json');
  const paper = values.paper;
  if (paper !== 'a4' && paper !== 'letter') throw new UsageError('--paper is a4 or letter');

  const failed: FleetFailure[] = [];
  const paths = await reviewPaths(positionals, failed);
  const inputs = new Set([...paths, values.oils].map((p) => resolve(p)));
  for (const out of [values.csv, values.pdf]) {
    if (out && inputs.has(resolve(out))) throw new UsageError(`${out} is an input; an output never overwrites an input`);
  }
  if (values.csv && values.pdf && resolve(values.csv) === resolve(values.pdf)) throw new UsageError('--csv and --pdf name the same file');

  let oilsText: string;
  try {
    oilsText = await readFile(values.oils, 'utf8');
  } catch (e) {
    io.err(`${values.oils}: cannot read the candidate-oil file (${errCode(e)})\n`);
    return EXIT.invalid;
  }
  const oils = parseOilsText(oilsText);
  if (!oils.ok) {
    io.err(`${values.oils}: not a valid candidate-oil file:\n${formatIssues(oils.issues)}\n`);
    return EXIT.invalid;
  }

  const gearboxes: FleetGearboxInput[] = [];
  for (const p of paths) {
    const loaded = await loadReviewFile(p);
    if (loaded.ok) gearboxes.push({ source: p, review: loaded.review });
    else failed.push({ source: p, message: loaded.message });
  }
  for (const f of failed) io.err(`${f.message}\n`);

  let result: FleetResult;
  try {
    result = runFleet({ gearboxes, oils: oils.oils, failed });
  } catch (e) {
    if (e instanceof EngineInputError) {
      io.err(`${values.oils}: ${e.field}: ${e.message}\n`);
      return EXIT.invalid;
    }
    throw e;
  }
  for (const f of result.failed.slice(failed.length)) io.err(`${f.source}: ${f.message}\n`);

  io.out(values.json ? `${JSON.stringify(result, null, 2)}\n` : fleetSummaryText(result));
  let code: number = result.failed.length > 0 ? EXIT.invalid : EXIT.ok;
  if (values.csv) {
    try {
      await atomicWrite(values.csv, fleetToCsv(result));
      io.err(`wrote ${values.csv}\n`);
    } catch (e) {
      io.err(`${values.csv}: cannot write the CSV (${errCode(e)})\n`);
      code = EXIT.invalid;
    }
  }
  if (values.pdf) {
    const { writeFleetRecord } = await import('../fleetRecord');
    const c = await writeFleetRecord(result, { gearboxes, oilsFile: oils.file }, values.pdf, paper, io);
    if (c !== EXIT.ok) code = c;
  }
  return code;
}
