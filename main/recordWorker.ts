/**
 * The record, made off the main process's event loop (a worker thread), so the window stays
 * responsive while a large review's maps and pages are computed. workerData: { review, paper,
 * fontsDir }. Posts { type: 'progress', done, total } while the operating maps are swept (the
 * long part), then { type: 'done', pdf } (its buffer transferred) or { type: 'error', user,
 * message }. Cancel is the parent terminating the worker: nothing is written until 'done'.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { EngineInputError } from '../app/engine/diagnostics';
import { loadRecordFonts } from '../app/report/fonts';
import { RecordTextError, renderRecord, type Paper } from '../app/report/record';
import { operatingMaps } from '../app/review/operatingMaps';
import { run } from '../app/review/run';
import type { Review } from '../app/review/schema';

export interface RecordJob {
  readonly review: Review;
  readonly paper: Paper;
  readonly fontsDir?: string;
}

export type RecordWorkerMessage =
  | { type: 'progress'; done: number; total: number }
  | { type: 'done'; pdf: Uint8Array }
  | { type: 'error'; user: boolean; message: string };

async function work(job: RecordJob): Promise<RecordWorkerMessage> {
  try {
    const results = run(job.review);
    // Progress in steps of the maps, plus one for the pages.
    const total = job.review.loadCases.length * Math.max(1, job.review.oils.length) + 1;
    const post = (done: number) => parentPort?.postMessage({ type: 'progress', done, total } satisfies RecordWorkerMessage);
    const maps = operatingMaps(job.review, { progress: (done) => void post(done) }) ?? [];
    const pdf = await renderRecord(job.review, results, { paper: job.paper, maps, ...(job.fontsDir ? { fonts: loadRecordFonts(job.fontsDir) } : {}) });
    post(total);
    return { type: 'done', pdf: new Uint8Array(pdf.buffer, pdf.byteOffset, pdf.byteLength) };
  } catch (e) {
    if (e instanceof EngineInputError) return { type: 'error', user: true, message: `${e.field}: ${e.message}` };
    if (e instanceof RecordTextError) return { type: 'error', user: true, message: e.message };
    return { type: 'error', user: false, message: (e as Error)?.message ?? String(e) };
  }
}

if (parentPort && workerData) {
  void work(workerData as RecordJob).then((m) => parentPort!.postMessage(m, m.type === 'done' ? [m.pdf.buffer as ArrayBuffer] : []));
}
