import type { RecomputeRequest, RecomputeResponse } from './protocol';

export type RecomputeListener = (response: RecomputeResponse) => void;

/**
 * Runs the review's recompute off the UI thread, latest wins: while the worker is busy only the
 * newest request waits; older ones are dropped unsent, and an answer for an older edition than
 * the newest asked is dropped too. If a Web Worker cannot start (a sandbox that forbids it), it
 * falls back to computing on the UI thread after a macrotask, still latest-wins.
 */
export class RecomputeClient {
  private worker: Worker | null = null;
  private busy = false;
  private pending: RecomputeRequest | null = null;
  private inFlight: RecomputeRequest | null = null;
  private newest = -1;

  constructor(private readonly listener: RecomputeListener) {
    try {
      this.worker = new Worker(new URL('./recompute.worker.ts', import.meta.url), { type: 'module', name: 'flankfilm-recompute' });
      this.worker.onmessage = (e: MessageEvent<RecomputeResponse>) => this.answered(e.data);
      this.worker.onerror = (e) => {
        e.preventDefault();
        this.worker?.terminate();
        this.worker = null;
        this.busy = false;
        this.pending ??= this.inFlight;
        this.flush();
      };
    } catch {
      this.worker = null;
    }
  }

  request(req: RecomputeRequest): void {
    this.newest = Math.max(this.newest, req.edition);
    this.pending = req;
    this.flush();
  }

  dispose(): void {
    this.worker?.terminate();
    this.worker = null;
    this.pending = null;
  }

  private flush(): void {
    if (this.busy || !this.pending) return;
    const req = this.pending;
    this.pending = null;
    this.inFlight = req;
    this.busy = true;
    if (this.worker) {
      this.worker.postMessage(req);
    } else {
      setTimeout(() => {
        void import('./compute').then(({ compute }) => this.answered(compute(req)));
      }, 0);
    }
  }

  private answered(res: RecomputeResponse): void {
    this.busy = false;
    this.inFlight = null;
    if (res.edition >= this.newest) this.listener(res);
    this.flush();
  }
}
