/**
 * The record export runs off main's event loop (a worker thread, main/recordWorker.ts): main
 * stays responsive while it runs, progress arrives, cancel stops it and writes nothing, and the
 * worker makes the same bytes as the CLI does in its own thread.
 */
import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createServices } from '../../main/services';
import { createReportPort, ExportCanceled } from '../../main/services/report';
import type { RecordProgress } from '../../main/services/types';
import { loadDemo } from '../report/helpers';
import { DEMO_TEXT } from './fixtures/texts';

const T = 180_000;
const WORKER = { file: resolve('tests/harness/recordWorker.cjs') };
let dir: string;
beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'flankfilm-worker-'));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

/** The longest gap between ticks of a 10 ms timer while `job` runs: how long main's event loop was blocked. */
async function longestStall(job: () => Promise<unknown>): Promise<number> {
  let last = performance.now();
  let worst = 0;
  const timer = setInterval(() => {
    const now = performance.now();
    worst = Math.max(worst, now - last);
    last = now;
  }, 10);
  try {
    await job();
  } finally {
    clearInterval(timer);
  }
  // A job that blocks until it is done never lets the timer fire: count the gap up to its end too.
  return Math.max(worst, performance.now() - last);
}

describe('record export in a worker thread', () => {
  it('gives the same bytes as rendering in this thread, with progress up to the total', async () => {
    const { review } = loadDemo();
    const progress: RecordProgress[] = [];
    const inWorker = await createReportPort(resolve('assets/fonts'), WORKER).renderRecord(review, { paper: 'a4', onProgress: (p) => progress.push(p) });
    const here = await createReportPort(resolve('assets/fonts')).renderRecord(review, { paper: 'a4' });
    expect(Buffer.from(inWorker).equals(Buffer.from(here))).toBe(true);
    expect(progress.length).toBeGreaterThan(1);
    expect(progress.at(-1)).toEqual({ done: progress.at(-1)!.total, total: review.loadCases.length * review.oils.length + 1 });
    for (let i = 1; i < progress.length; i++) expect(progress[i]!.done).toBeGreaterThanOrEqual(progress[i - 1]!.done);
  }, T);

  it('main\'s event loop stays free while the worker renders (no stall over 250 ms; the same job in this thread stalls longer)', async () => {
    const { review } = loadDemo();
    const port = createReportPort(resolve('assets/fonts'), WORKER);
    await port.renderRecord(review, { paper: 'a4' }); // warm: the worker's module loading is not the point
    const worker = await longestStall(() => port.renderRecord(review, { paper: 'a4' }));
    const here = await longestStall(() => createReportPort(resolve('assets/fonts')).renderRecord(review, { paper: 'a4' }));
    console.log(`longest event-loop stall: worker ${worker.toFixed(0)} ms, in this thread ${here.toFixed(0)} ms`);
    expect(worker).toBeLessThan(250);
    expect(here).toBeGreaterThan(worker);
  }, T);

  it('cancel stops the worker: ExportCanceled at once', async () => {
    const { review } = loadDemo();
    const control = new AbortController();
    const t0 = performance.now();
    const p = createReportPort(resolve('assets/fonts'), WORKER).renderRecord(review, { paper: 'a4', signal: control.signal, onProgress: () => control.abort() });
    await expect(p).rejects.toBeInstanceOf(ExportCanceled);
    expect(performance.now() - t0).toBeLessThan(60_000);
  }, T);

  it('through the services: cancelExport answers { canceled: true } and no file is written, no dialog asked', async () => {
    let asked = 0;
    const services = createServices({
      dialogs: {
        openPath: async () => null,
        savePath: async () => {
          asked++;
          return join(dir, 'record.pdf');
        },
        confirmClose: async () => 'cancel',
      },
      userDataDir: join(dir, 'userData'),
      clock: () => new Date(0),
      appVersion: 't',
      platform: 'linux',
      report: createReportPort(resolve('assets/fonts'), WORKER),
      onExportProgress: () => void services.cancelExport({}),
    });
    expect(await services.cancelExport({})).toEqual({ canceled: false }); // nothing running
    expect(await services.exportRecord({ text: DEMO_TEXT, paper: 'a4' })).toEqual({ canceled: true });
    expect(asked).toBe(0);
    expect(await readdir(dir)).not.toContain('record.pdf');
  }, T);
});
