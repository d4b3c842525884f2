/**
 * Owns one solver worker. Requests are answered latest-first: while one solve runs, only the newest
 * waiting request is kept (older ones resolve as `superseded`), so typing never builds a backlog.
 * A solve that runs past `timeoutMs` has its worker terminated and replaced, and resolves as `timeout`.
 */

/** The part of a Worker this class uses, so tests can pass a fake. */
export interface WorkerLike {
  postMessage(message: unknown): void;
  terminate(): void;
  onmessage: ((event: { data: unknown }) => void) | null;
  onerror: ((event: { message?: string }) => void) | null;
}

export type Answer<Res> =
  | { status: 'done'; value: Res }
  | { status: 'superseded' }
  | { status: 'timeout'; afterMs: number }
  | { status: 'crashed'; message: string };

interface Pending<Req, Res> {
  id: number;
  request: Req;
  resolve: (a: Answer<Res>) => void;
}

export interface WorkerReply<Res> {
  id: number;
  value: Res;
}

export class SolverClient<Req, Res> {
  private worker: WorkerLike | null = null;
  private running: Pending<Req, Res> | null = null;
  private waiting: Pending<Req, Res> | null = null;
  private timer: ReturnType<typeof setTimeout> | null = null;
  private nextId = 1;
  /** A solve started ahead of its request (`prefetch`), by the request's JSON text. */
  private early: { key: string; answer: Promise<Answer<Res>> } | null = null;

  constructor(
    private readonly makeWorker: () => WorkerLike,
    private readonly timeoutMs = 10_000,
  ) {}

  /**
   * Starts a solve the page expects to ask for soon (the case it is about to open), so the worker works while the
   * page is still opening its store and drawing. The next `request` with the same JSON text gets that answer
   * instead of solving again; any other request drops it (superseded if it had not started).
   */
  prefetch(request: Req): void {
    const answer = this.post(request);
    this.early = { key: JSON.stringify(request), answer };
  }

  /** Asks for a solve. Resolves `done`, or `superseded` if a newer request replaced it before it started. */
  request(request: Req): Promise<Answer<Res>> {
    const early = this.early;
    if (early) {
      this.early = null;
      if (early.key === JSON.stringify(request)) return early.answer;
    }
    return this.post(request);
  }

  private post(request: Req): Promise<Answer<Res>> {
    return new Promise((resolve) => {
      const job = { id: this.nextId++, request, resolve };
      if (this.waiting) this.waiting.resolve({ status: 'superseded' });
      this.waiting = job;
      this.pump();
    });
  }

  /** Starts the worker now, so its script loads while the page boots rather than at the first request. */
  start(): void {
    this.ensureWorker();
  }

  /** Stops the worker; anything running or waiting resolves as superseded. */
  terminate(): void {
    this.clearTimer();
    this.worker?.terminate();
    this.worker = null;
    this.running?.resolve({ status: 'superseded' });
    this.waiting?.resolve({ status: 'superseded' });
    this.running = this.waiting = null;
  }

  private ensureWorker(): WorkerLike {
    if (this.worker) return this.worker;
    const w = this.makeWorker();
    w.onmessage = (e) => this.onReply(e.data as WorkerReply<Res>);
    w.onerror = (e) => this.onCrash(e.message ?? 'the solver stopped unexpectedly');
    this.worker = w;
    return w;
  }

  private pump(): void {
    if (this.running || !this.waiting) return;
    const job = this.waiting;
    this.waiting = null;
    this.running = job;
    this.ensureWorker().postMessage({ id: job.id, request: job.request });
    this.timer = setTimeout(() => this.onTimeout(), this.timeoutMs);
  }

  private onReply(reply: WorkerReply<Res>): void {
    if (!this.running || reply.id !== this.running.id) return; // a reply from a replaced worker
    this.clearTimer();
    const job = this.running;
    this.running = null;
    job.resolve({ status: 'done', value: reply.value });
    this.pump();
  }

  private onTimeout(): void {
    const job = this.running;
    this.restartWorker();
    job?.resolve({ status: 'timeout', afterMs: this.timeoutMs });
    this.pump();
  }

  private onCrash(message: string): void {
    const job = this.running;
    this.restartWorker();
    job?.resolve({ status: 'crashed', message });
    this.pump();
  }

  private restartWorker(): void {
    this.clearTimer();
    this.worker?.terminate();
    this.worker = null;
    this.running = null;
  }

  private clearTimer(): void {
    if (this.timer !== null) clearTimeout(this.timer);
    this.timer = null;
  }
}
