/**
 * The record export runs off main's event loop (a worker thread, main/recordWorker.ts): main
 * stays responsive while it runs, progress arrives, cancel stops it and writes nothing, and the
 * worker makes the same bytes as the CLI does in its own thread. The worker stands: one thread
 * makes one record after another, a warm-up makes a record to throw away, and an idle worker does
 * not keep the process alive.
 */
import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createServices } from '../../main/services';
import { spawnSync } from 'node:child_process';
import { createReportPort, ExportCanceled } from '../../main/services/report';
import { RecordWorkerClient } from '../../main/services/recordWorkerClient';
import { UserError } from '../../main/services/errors';
import { warmUpReview } from '../../main/recordWorker';
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

  it('one standing worker makes record after record, warm-up first, each the same bytes as this thread\'s', async () => {
    const { review } = loadDemo();
    const client = new RecordWorkerClient(WORKER, resolve('assets/fonts'));
    const here = Buffer.from(await createReportPort(resolve('assets/fonts')).renderRecord(review, { paper: 'a4' }));
    await Promise.all([client.warm(), client.warm()]); // asked twice, warmed once
    const first = await client.render({ review, paper: 'a4', fontsDir: resolve('assets/fonts') });
    const second = await client.render({ review, paper: 'a4', fontsDir: resolve('assets/fonts') });
    expect(Buffer.from(first).equals(here)).toBe(true);
    expect(Buffer.from(second).equals(here)).toBe(true);
    expect(client.started).toBe(1);
    client.stop();
  }, T);

  it('after a cancel the next record starts a new worker; a job queued behind the canceled one still gets its record', async () => {
    const { review } = loadDemo();
    const client = new RecordWorkerClient(WORKER, resolve('assets/fonts'));
    const here = Buffer.from(await createReportPort(resolve('assets/fonts')).renderRecord(review, { paper: 'a4' }));
    const control = new AbortController();
    const canceled = client.render({ review, paper: 'a4', fontsDir: resolve('assets/fonts') }, () => control.abort(), control.signal);
    const queued = client.render({ review, paper: 'a4', fontsDir: resolve('assets/fonts') });
    await expect(canceled).rejects.toBeInstanceOf(ExportCanceled);
    expect(Buffer.from(await queued).equals(here)).toBe(true);
    expect(client.started).toBe(2);
    client.stop();
  }, T);

  it('a record the font cannot draw is refused in words, and the same worker makes the next one', async () => {
    const { review } = loadDemo();
    const client = new RecordWorkerClient(WORKER, resolve('assets/fonts'));
    const broken = { ...review, loadCases: review.loadCases.map((lc, i) => (i === 0 ? { ...lc, name: 'Crusher 齿' } : lc)) };
    const refused = client.render({ review: broken, paper: 'a4', fontsDir: resolve('assets/fonts') });
    await expect(refused).rejects.toBeInstanceOf(UserError);
    await expect(refused).rejects.toThrow(/no record made:[\s\S]*cannot draw "齿"/);
    expect((await client.render({ review, paper: 'a4', fontsDir: resolve('assets/fonts') })).length).toBeGreaterThan(1000);
    expect(client.started).toBe(1);
    client.stop();
  }, T);

  it('an idle standing worker does not keep the process alive', () => {
    // A child process makes one record in a standing worker and then has nothing left to do: it must exit by itself.
    const script = [
      "const { createReportPort } = await import('./main/services/report.ts');",
      "const { loadDemo } = await import('./tests/report/helpers.ts');",
      "const port = createReportPort('assets/fonts', { file: './tests/harness/recordWorker.cjs' });",
      "const pdf = await port.renderRecord(loadDemo().review, { paper: 'a4' });",
      'console.log(pdf.length);',
    ].join('\n');
    const child = spawnSync(process.execPath, ['--import', 'tsx', '--input-type=module', '-e', script], { encoding: 'utf8', timeout: 120_000 });
    expect(child.error, child.stderr).toBeUndefined(); // a timeout would be an error here
    expect(child.status, child.stderr).toBe(0);
    expect(Number(child.stdout.trim())).toBeGreaterThan(1000);
  }, T);

  it('the warm-up review is a small, valid review from the invented demo', () => {
    const r = warmUpReview();
    expect(r.loadCases).toHaveLength(1);
    expect(r.oils).toHaveLength(2);
    expect(String(r.id)).toMatch(/^HC-DEMO-/);
  });
});
