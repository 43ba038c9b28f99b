import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { resultsToCsv } from '../../app/report/csv';
import { renderRecord } from '../../app/report/record';
import type { FuzzOptions } from './fuzzer';

/** The output checks the fuzzer applies: the CSV of every accepted case, the record's text (pdftotext) for a sample. */
export function fuzzOutputs(): Pick<FuzzOptions, 'csv' | 'recordText'> {
  const dir = mkdtempSync(join(tmpdir(), 'flankfilm-fuzz-'));
  return {
    csv: (results) => resultsToCsv(results),
    recordText: async (review, results) => {
      const pdf = join(dir, 'record.pdf');
      writeFileSync(pdf, await renderRecord(review, results));
      const r = spawnSync('pdftotext', ['-q', pdf, '-'], { encoding: 'utf8' });
      if (r.status !== 0) throw new Error(`pdftotext failed: ${r.stderr}`);
      return r.stdout;
    },
  };
}
