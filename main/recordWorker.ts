/**
 * The record, made off the main process's event loop (a worker thread), so the window stays
 * responsive while a large review's maps and pages are computed. The worker stands: it takes one
 * job after another (main/services/recordWorkerClient.ts), so the second export finds pdfkit and
 * fontkit compiled, and a `warm` message makes a small record to throw away, so the first export
 * does too (a fresh thread's first demo record takes about twice as long as a warm one).
 *
 * Messages in: { type: 'job', id, job: { review, paper, fontsDir } } or { type: 'warm', id, fontsDir }.
 * Messages out, each with its id: { type: 'progress', done, total } while the operating maps are
 * swept (the long part), then { type: 'done', pdf } (its buffer transferred) or { type: 'error',
 * user, message }; a warm-up ends with { type: 'warmed' }. Cancel is the parent terminating the
 * worker: nothing is written until 'done'.
 */
import { parentPort } from 'node:worker_threads';
import { EngineInputError } from '../app/engine/diagnostics';
import { loadRecordFonts } from '../app/report/fonts';
import { RecordTextError, renderRecord, type Paper } from '../app/report/record';
import { DEMO_REVIEWS } from '../app/review/demo';
import { operatingMaps } from '../app/review/operatingMaps';
import { parseReviewValue } from '../app/review/parse';
import { run } from '../app/review/run';
import type { Review } from '../app/review/schema';

export interface RecordJob {
  readonly review: Review;
  readonly paper: Paper;
  readonly fontsDir?: string;
}

export type RecordWorkerRequest = { type: 'job'; id: number; job: RecordJob } | { type: 'warm'; id: number; fontsDir?: string };

export type RecordWorkerMessage =
  | { type: 'progress'; id: number; done: number; total: number }
  | { type: 'done'; id: number; pdf: Uint8Array }
  | { type: 'error'; id: number; user: boolean; message: string }
  | { type: 'warmed'; id: number };

async function work(id: number, job: RecordJob): Promise<RecordWorkerMessage> {
  try {
    const results = run(job.review);
    // Progress in steps of the maps, plus one for the pages.
    const total = job.review.loadCases.length * Math.max(1, job.review.oils.length) + 1;
    const post = (done: number) => parentPort?.postMessage({ type: 'progress', id, done, total } satisfies RecordWorkerMessage);
    const maps = operatingMaps(job.review, { progress: (done) => void post(done) }) ?? [];
    const pdf = await renderRecord(job.review, results, { paper: job.paper, maps, ...(job.fontsDir ? { fonts: loadRecordFonts(job.fontsDir) } : {}) });
    post(total);
    return { type: 'done', id, pdf: new Uint8Array(pdf.buffer, pdf.byteOffset, pdf.byteLength) };
  } catch (e) {
    if (e instanceof EngineInputError) return { type: 'error', id, user: true, message: `${e.field}: ${e.message}` };
    if (e instanceof RecordTextError) return { type: 'error', id, user: true, message: e.message };
    return { type: 'error', id, user: false, message: (e as Error)?.message ?? String(e) };
  }
}

/**
 * The warm-up review: the invented demo's first pair with one load case and two oils, so every
 * kind of page (inputs, a case, its map, the comparison of two oils, the cautions) is drawn once.
 */
export function warmUpReview(): Review {
  const demo = structuredClone(Object.values(DEMO_REVIEWS)[0]) as { loadCases: unknown[]; oils: unknown[] };
  demo.loadCases = demo.loadCases.slice(0, 1);
  demo.oils = demo.oils.slice(0, 2);
  const parsed = parseReviewValue(demo);
  if (!parsed.ok) throw new Error('the warm-up review does not parse');
  return parsed.review;
}

async function warm(id: number, fontsDir: string | undefined): Promise<RecordWorkerMessage> {
  // A failed warm-up costs only time: the next job compiles what the warm-up did not.
  try {
    await work(id, { review: warmUpReview(), paper: 'a4', ...(fontsDir ? { fontsDir } : {}) });
  } catch {
    // nothing to report: the warm-up's record is thrown away either way
  }
  return { type: 'warmed', id };
}

if (parentPort) {
  const port = parentPort;
  // One request at a time, in the order they came.
  let queue: Promise<void> = Promise.resolve();
  port.on('message', (m: RecordWorkerRequest) => {
    queue = queue.then(async () => {
      const out = m.type === 'warm' ? await warm(m.id, m.fontsDir) : await work(m.id, m.job);
      port.postMessage(out, out.type === 'done' ? [out.pdf.buffer as ArrayBuffer] : []);
    });
  });
}
