import { parseArgs } from 'node:util';
import { EngineInputError } from '../../engine/diagnostics';
import { run } from '../../review/run';
import type { Results } from '../../review/results';
import { EXIT, UsageError, type CliIo } from '../io';
import { loadReviewFile } from '../reviewFile';
import { summaryText } from '../summary';
import { status } from '../../review/status';
import { operatingMaps, operatingMapsCsv } from '../../review/operatingMaps';
import { atomicWrite } from '../../files/atomicWrite';
import { pathClash } from '../../files/sameFile';

import { summaryCsv } from '../../report/summaryCsv';
import { resultsJson } from '../../review/pathSeries';

/** `flankfilm review FILE [--json] [--pdf OUT [--film-detail]] [--csv OUT] [--summary-csv OUT] [--map OUT.csv] [--p12 ID.p12] [--paper a4|letter]` */
export async function reviewCommand(args: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseArgs({
    args,
    allowPositionals: true,
    options: {
      json: { type: 'boolean', default: false },
      pdf: { type: 'string' },
      csv: { type: 'string' },
      'summary-csv': { type: 'string' },
      map: { type: 'string' },
      p12: { type: 'string' },
      paper: { type: 'string', default: 'a4' },
      'film-detail': { type: 'boolean', default: false },
    },
  });
  if (positionals.length !== 1) throw new UsageError('give exactly one review FILE');
  const paper = values.paper;
  if (paper !== 'a4' && paper !== 'letter') throw new UsageError('--paper is a4 or letter');
  if (values.p12 && !values.pdf) throw new UsageError('--p12 signs the record: give --pdf OUT too');
  if (values['film-detail'] && !values.pdf) throw new UsageError('--film-detail adds a page to the record: give --pdf OUT too');
  const file = positionals[0] as string;
  // An output that resolves (through links, symbolic or hard) to an input or to another output is refused before anything runs.
  const outputs = (['pdf', 'csv', 'summary-csv', 'map'] as const).filter((k) => values[k] !== undefined).map((k) => [`--${k}`, values[k] as string] as const);
  const clash = await pathClash([['the review', file], ...(values.p12 ? [['--p12', values.p12] as const] : [])], outputs);
  if (clash) throw new UsageError(clash);
  const loaded = await loadReviewFile(file);
  if (!loaded.ok) {
    io.err(`${loaded.message}\n`);
    return EXIT.invalid;
  }
  let results: Results;
  try {
    results = run(loaded.review);
  } catch (e) {
    if (e instanceof EngineInputError) {
      io.err(`${file}: ${e.field}: ${e.message}\n`);
      return EXIT.invalid;
    }
    throw e;
  }
  if (values.json) io.out(`${JSON.stringify(resultsJson(results), null, 2)}\n`);
  else io.out(summaryText(results, { status: status(loaded.review, results), review: loaded.review }));
  const summaryOut = values['summary-csv'];
  if (summaryOut) {
    try {
      await atomicWrite(summaryOut, summaryCsv(results, loaded.review.displayUnits));
      io.err(`wrote ${summaryOut}\n`);
    } catch (e) {
      io.err(`${summaryOut}: cannot write (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})\n`);
      return EXIT.invalid;
    }
  }
  if (values.map) {
    const maps = operatingMaps(loaded.review) ?? [];
    if (maps.length === 0) io.err(`${values.map}: the review has no oils, so the map has no cells (header only)\n`);
    try {
      await atomicWrite(values.map, operatingMapsCsv(maps));
    } catch (e) {
      io.err(`${values.map}: cannot write (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})\n`);
      return EXIT.invalid;
    }
  }
  if (values.pdf || values.csv) {
    const { writeOutputs } = await import('../outputs');
    return writeOutputs(loaded.review, results, { pdf: values.pdf, csv: values.csv, p12: values.p12, paper, filmDetail: values['film-detail'] }, io);
  }
  return EXIT.ok;
}
