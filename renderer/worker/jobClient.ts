/**
 * One long synchronous job at a time in its own Web Worker, latest wins: starting a job abandons
 * the one in flight, and a job is cancelled by terminating its worker (no message can interrupt
 * a synchronous call); the next job starts a fresh worker. Messages of an abandoned run are
 * dropped. Where workers cannot run (a sandbox that forbids them) the job runs on the UI thread
 * after a macrotask, and cancel then drops its answer. The same scheme as the map's client.
 */
export interface JobMessage {
  readonly run: number;
  readonly kind: string;
}

export interface JobOptions<Req, Msg> {
  /** `new Worker(new URL('./x.worker.ts', import.meta.url), …)`, written where the bundler can see it. */
  readonly createWorker: () => Worker;
  /** The same job on the UI thread. */
  readonly runInline: (req: Req, post: (m: Msg) => void) => Promise<void>;
  /** Kinds that end a run (the rest, such as progress, do not). */
  readonly finalKinds: readonly string[];
}

export class JobClient<Req extends { readonly run: number }, Msg extends JobMessage> {
  private worker: Worker | null = null;
  private running: Req | null = null;
  private runs = 0;
  private workersAllowed = true;

  constructor(
    private readonly options: JobOptions<Req, Msg>,
    private readonly listener: (m: Msg) => void,
  ) {}

  /** Start a job; returns its run number. */
  start(make: (run: number) => Req): number {
    if (this.running !== null) this.stop();
    const req = make(++this.runs);
    this.send(req);
    return req.run;
  }

  cancel(): boolean {
    if (this.running === null) return false;
    this.stop();
    return true;
  }

  dispose(): void {
    this.stop();
  }

  private send(req: Req): void {
    this.running = req;
    const worker = this.ensureWorker();
    if (worker) worker.postMessage(req);
    else
      setTimeout(() => {
        if (this.running === req) void this.options.runInline(req, (m) => this.received(m));
      }, 0);
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
      const w = this.options.createWorker();
      w.onmessage = (e: MessageEvent<Msg>) => this.received(e.data);
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

  private received(m: Msg): void {
    if (m.run !== this.running?.run) return;
    if (this.options.finalKinds.includes(m.kind)) this.running = null;
    this.listener(m);
  }
}
