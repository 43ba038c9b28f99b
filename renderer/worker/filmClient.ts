import type { FilmMessage, FilmRequest } from './filmProtocol';

export type FilmListener = (message: FilmMessage) => void;

/**
 * Solves the numerical film in its own Web Worker, apart from the recompute and the map. Latest
 * wins: a new request drops the answer of the one before (a solve is short, so it is left to
 * finish rather than terminated). Without Web Workers it solves on the UI thread after a macrotask.
 */
export class FilmClient {
  private worker: Worker | null = null;
  private runs = 0;
  private latest = 0;
  private pending: FilmRequest | null = null;
  private workersAllowed = true;

  constructor(private readonly listener: FilmListener) {}

  start(req: Omit<FilmRequest, 'run'>): number {
    const full: FilmRequest = { ...req, run: ++this.runs };
    this.latest = full.run;
    this.send(full);
    return full.run;
  }

  private send(req: FilmRequest): void {
    this.pending = req;
    const worker = this.ensureWorker();
    if (worker) {
      worker.postMessage(req);
      return;
    }
    setTimeout(() => {
      if (this.latest !== req.run) return;
      void import('./filmCompute').then(({ computeFilm }) => this.received(computeFilm(req)));
    }, 0);
  }

  dispose(): void {
    this.latest = 0;
    this.worker?.terminate();
    this.worker = null;
  }

  private ensureWorker(): Worker | null {
    if (this.worker || !this.workersAllowed) return this.worker;
    try {
      const w = new Worker(new URL('./film.worker.ts', import.meta.url), { type: 'module', name: 'flankfilm-film' });
      w.onmessage = (e: MessageEvent<FilmMessage>) => this.received(e.data);
      // An error event means the worker itself could not run (a sandbox that forbids it): solve here instead.
      w.onerror = (e) => {
        e.preventDefault();
        w.terminate();
        this.worker = null;
        this.workersAllowed = false;
        const req = this.pending;
        if (req && this.latest === req.run) this.send(req);
      };
      this.worker = w;
    } catch {
      this.workersAllowed = false;
    }
    return this.worker;
  }

  private received(m: FilmMessage): void {
    if (m.run !== this.latest) return;
    this.pending = null;
    this.listener(m);
  }
}
