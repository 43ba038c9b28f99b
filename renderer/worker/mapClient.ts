import type { Review } from '../../app/review/schema';
import type { MapMessage, MapRequest } from './mapProtocol';

export type MapListener = (message: MapMessage) => void;

/**
 * Runs operating-map sweeps in their own Web Worker (apart from the recompute, so a sweep never
 * delays the sheet's results). Latest wins: starting a sweep abandons the one in flight, and a
 * sweep is cancelled by terminating its worker (the sweep is one synchronous call that no message
 * can interrupt); the next sweep starts a fresh worker. Messages of an abandoned run are dropped.
 * Without Web Workers it sweeps on the UI thread after a macrotask; cancel then drops the answer.
 */
export class MapClient {
  private worker: Worker | null = null;
  private running: MapRequest | null = null;
  private runs = 0;
  private workersAllowed = true;

  constructor(private readonly listener: MapListener) {}

  /** Start a sweep of `review`; returns its run number. */
  start(review: Review, cells: { temperatures?: number; loads?: number } = {}): number {
    if (this.running !== null) this.stop();
    const req: MapRequest = { run: ++this.runs, review, ...cells };
    this.send(req);
    return req.run;
  }

  private send(req: MapRequest): void {
    this.running = req;
    const worker = this.ensureWorker();
    if (worker) {
      worker.postMessage(req);
    } else {
      setTimeout(() => {
        if (this.running !== req) return;
        void import('./mapSweep').then(({ sweep }) => sweep(req, (m) => this.received(m)));
      }, 0);
    }
  }

  /** Stop the sweep in flight, if any; nothing of it arrives afterwards. */
  cancel(): boolean {
    if (this.running === null) return false;
    this.stop();
    return true;
  }

  dispose(): void {
    this.stop();
    this.worker?.terminate();
    this.worker = null;
  }

  private stop(): void {
    this.running = null;
    if (!this.worker) return;
    this.worker.onmessage = null;
    this.worker.terminate();
    this.worker = null;
  }

  private ensureWorker(): Worker | null {
    if (this.worker || !this.workersAllowed) return this.worker;
    try {
      const w = new Worker(new URL('./map.worker.ts', import.meta.url), { type: 'module', name: 'flankfilm-map' });
      w.onmessage = (e: MessageEvent<MapMessage>) => this.received(e.data);
      // The sweep's own errors come back as 'failed' messages: an error event means the worker
      // itself could not run (a sandbox that forbids it), so sweep on the UI thread instead.
      w.onerror = (e) => {
        e.preventDefault();
        const req = this.running;
        this.stop();
        this.workersAllowed = false;
        if (req) this.send(req);
      };
      this.worker = w;
    } catch {
      this.workersAllowed = false;
    }
    return this.worker;
  }

  private received(m: MapMessage): void {
    if (m.run !== this.running?.run) return;
    if (m.kind !== 'progress') this.running = null;
    this.listener(m);
  }
}
