/**
 * app/report behind the ReportPort the services use. With `workerFile`, the record is made in a
 * worker thread (main/recordWorker.ts), with progress and cancel, so main's event loop stays
 * free; without, in this thread (the CLI's way; tests that want no worker).
 */
import { Worker } from 'node:worker_threads';
import { renderFleetRecord } from '../../app/report/fleet/fleetRecord';
import { resultsToCsv } from '../../app/report/csv';
import { summaryCsv } from '../../app/report/summaryCsv';
import { loadRecordFonts } from '../../app/report/fonts';
import { RecordTextError, renderRecord } from '../../app/report/record';
import { operatingMaps } from '../../app/review/operatingMaps';
import { run } from '../../app/review/run';
import type { RecordJob, RecordWorkerMessage } from '../recordWorker';
import { UserError } from './errors';
import type { RecordProgress, ReportPort } from './types';

export class ExportCanceled extends Error {
  constructor() {
    super('the export was canceled');
    this.name = 'ExportCanceled';
  }
}

export interface WorkerSpec {
  /** The worker's entry: dist/main/recordWorker.cjs when built; main/recordWorker.ts under tsx. */
  readonly file: string;
  /** E.g. ['--import', 'tsx'] for the .ts entry. */
  readonly execArgv?: readonly string[];
}

/** `fontsDir`: the app's assets/fonts (inside app.asar when packaged); default: app/report's own search. */
export function createReportPort(fontsDir?: string, worker?: WorkerSpec): ReportPort {
  return {
    renderRecord: (review, { paper, onProgress, signal }) =>
      worker ? inWorker(worker, { review, paper, ...(fontsDir ? { fontsDir } : {}) }, onProgress, signal) : inThread(review, paper, fontsDir),
    casesCsv: (results, units) => resultsToCsv(results, units),
    renderFleetRecord: async (result, inputs, { paper }) => renderFleetRecord(result, inputs, { paper, ...(fontsDir ? { fonts: loadRecordFonts(fontsDir) } : {}) }),
    summaryCsv: (results, units) => summaryCsv(results, units),
  };
}

async function inThread(review: RecordJob['review'], paper: RecordJob['paper'], fontsDir: string | undefined): Promise<Uint8Array> {
  try {
    return await renderRecord(review, run(review), { paper, maps: operatingMaps(review) ?? [], ...(fontsDir ? { fonts: loadRecordFonts(fontsDir) } : {}) });
  } catch (e) {
    if (e instanceof RecordTextError) throw new UserError(`no record made:\n${e.message}`);
    throw e;
  }
}

function inWorker(spec: WorkerSpec, job: RecordJob, onProgress?: (p: RecordProgress) => void, signal?: AbortSignal): Promise<Uint8Array> {
  return new Promise((resolve, reject) => {
    if (signal?.aborted) return reject(new ExportCanceled());
    const w = new Worker(spec.file, { workerData: job, execArgv: [...(spec.execArgv ?? [])] });
    let settled = false;
    const finish = (f: () => void) => {
      if (settled) return;
      settled = true;
      signal?.removeEventListener('abort', abort);
      f();
    };
    const abort = () => finish(() => {
      void w.terminate();
      reject(new ExportCanceled());
    });
    signal?.addEventListener('abort', abort);
    w.on('message', (m: RecordWorkerMessage) => {
      if (m.type === 'progress') onProgress?.({ done: m.done, total: m.total });
      else if (m.type === 'done') finish(() => resolve(m.pdf));
      else finish(() => reject(m.user ? new UserError(`no record made:\n${m.message}`) : new Error(m.message)));
      if (m.type !== 'progress') void w.terminate();
    });
    w.on('error', (e) => finish(() => reject(e)));
    w.on('exit', (code) => finish(() => reject(new Error(`the record worker stopped (exit ${code})`))));
  });
}
