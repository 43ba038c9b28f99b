/**
 * The standing record worker (main/recordWorker.ts) from main's side: one worker thread that makes
 * one record after another, started when first wanted (or by `warm`) and kept while it is idle
 * without keeping the process alive. Cancel terminates it (the next record starts a new one), as does
 * a crash; a job waiting behind another is simply dropped.
 */
import { Worker } from 'node:worker_threads';
import type { RecordJob, RecordWorkerMessage, RecordWorkerRequest } from '../recordWorker';
import { UserError } from './errors';
import type { RecordProgress } from './types';

export class ExportCanceled extends Error {
  constructor() {
    super('the export was canceled');
    this.name = 'ExportCanceled';
  }
}

export interface WorkerSpec {
  /** The worker's entry: dist/main/recordWorker.cjs when built; a bootstrap of main/recordWorker.ts under tsx. */
  readonly file: string;
  /** E.g. ['--import', 'tsx'] for the .ts entry. */
  readonly execArgv?: readonly string[];
}

interface Pending {
  readonly request: RecordWorkerRequest;
  worker: Worker;
  readonly onMessage: (m: RecordWorkerMessage) => void;
  readonly onStopped: (e: Error) => void;
}

export class RecordWorkerClient {
  private worker: Worker | null = null;
  /** How many worker threads this client has started (one, unless a cancel or a crash needed another). */
  started = 0;
  private nextId = 1;
  private readonly pending = new Map<number, Pending>();
  /** The warm-up, once asked (a worker started after a cancel or a crash is not warmed again: its first record is a cold one). */
  private warming: Promise<void> | null = null;

  constructor(
    private readonly spec: WorkerSpec,
    private readonly fontsDir?: string,
  ) {}

  /** Start the worker and have it make a record to throw away, so that the first export is warm. Resolves when it is done (or dropped); asked again, the same. */
  warm(): Promise<void> {
    return (this.warming ??= new Promise((resolve) => {
      const id = this.nextId++;
      this.send({ type: 'warm', id, ...(this.fontsDir ? { fontsDir: this.fontsDir } : {}) }, (m) => m.type !== 'progress' && this.settle(id, resolve), () => this.settle(id, resolve));
    }));
  }

  /** One record; rejects with ExportCanceled when `signal` aborts, with UserError for a review it cannot draw or compute. */
  render(job: RecordJob, onProgress?: (p: RecordProgress) => void, signal?: AbortSignal): Promise<Uint8Array> {
    return new Promise((resolve, reject) => {
      if (signal?.aborted) return reject(new ExportCanceled());
      const id = this.nextId++;
      const done = (f: () => void) => {
        signal?.removeEventListener('abort', abort);
        this.settle(id, f);
      };
      const abort = () => {
        const mine = this.pending.get(id);
        done(() => reject(new ExportCanceled()));
        if (mine) this.restartWithout(mine.worker);
      };
      signal?.addEventListener('abort', abort, { once: true });
      this.send(
        { type: 'job', id, job },
        (m) => {
          if (m.type === 'progress') onProgress?.({ done: m.done, total: m.total });
          else if (m.type === 'done') done(() => resolve(m.pdf));
          else if (m.type === 'error') done(() => reject(m.user ? new UserError(`no record made:\n${m.message}`) : new Error(m.message)));
        },
        (e) => done(() => reject(e)),
      );
    });
  }

  /** Terminate the worker; its unanswered requests fail. */
  stop(): void {
    const w = this.worker;
    if (!w) return;
    this.worker = null;
    void w.terminate();
    this.failAll(w, new Error('the record worker was stopped'));
  }

  private send(request: RecordWorkerRequest, onMessage: Pending['onMessage'], onStopped: Pending['onStopped']): void {
    const worker = this.worker ?? this.start();
    this.pending.set(request.id, { request, worker, onMessage, onStopped });
    worker.ref(); // a request in hand keeps the process alive until it is answered
    worker.postMessage(request);
  }

  private settle(id: number, f: () => void): void {
    const p = this.pending.get(id);
    this.pending.delete(id);
    if (p && ![...this.pending.values()].some((q) => q.worker === p.worker)) p.worker.unref(); // idle: it alone does not keep the process running
    f();
  }

  /** A cancel: terminate the worker that was making the canceled record, and hand its other jobs to a new one (warm-ups are dropped). */
  private restartWithout(w: Worker): void {
    if (this.worker === w) this.worker = null;
    void w.terminate();
    for (const [id, p] of this.pending) {
      if (p.worker !== w) continue;
      if (p.request.type === 'warm') {
        p.onStopped(new Error('dropped'));
        continue;
      }
      const worker = this.worker ?? this.start();
      this.pending.set(id, { ...p, worker });
      worker.ref();
      worker.postMessage(p.request);
    }
  }

  private start(): Worker {
    const w = new Worker(this.spec.file, { execArgv: [...(this.spec.execArgv ?? [])] });
    this.worker = w;
    this.started++;
    w.on('message', (m: RecordWorkerMessage) => {
      const p = this.pending.get(m.id);
      if (p?.worker === w) p.onMessage(m);
    });
    w.on('error', (e) => this.lost(w, e));
    w.on('exit', (code) => this.lost(w, new Error(`the record worker stopped (exit ${code})`)));
    return w;
  }

  /** The worker crashed or exited: its unanswered requests fail (error and exit may both come; the second finds none). */
  private lost(w: Worker, e: Error): void {
    if (this.worker === w) this.worker = null;
    this.failAll(w, e);
  }

  private failAll(w: Worker, e: Error): void {
    for (const p of [...this.pending.values()]) if (p.worker === w) p.onStopped(e);
  }
}
