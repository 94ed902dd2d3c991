/** A computation still running after this long is abandoned (worker restarted) when a newer request waits. */
export const RUNAWAY_MS = 3000;

export type WorkerResult<P, R> = { reply: R; payload: P; waiting: boolean } | { failure: string };

export interface ChannelSpec<P, M> {
  /** Names the worker in the failure message: "The <what> worker stopped: …". */
  what: string;
  /** The message for request `seq` carrying `payload`. */
  message: (seq: number, payload: P) => M;
}

/**
 * One warm worker and its queue of length one: while it works only the newest payload waits. A request may
 * be answered in several messages; the one marked `final` ends it.
 * Starting a worker costs a second or more (loading the algebra), so it is restarted only for a runaway.
 */
export class WorkerChannel<P, M, R extends { seq: number; final: boolean }> {
  private worker: Worker | null = null;
  private seq = 0;
  private inFlight: { seq: number; payload: P; at: number } | null = null;
  private waiting: { payload: P } | null = null;

  constructor(
    private readonly spawn: () => Worker,
    private readonly onResult: (r: WorkerResult<P, R>) => void,
    private readonly spec: ChannelSpec<P, M>,
    private readonly now: () => number = () => performance.now(),
  ) {
    this.worker = this.start();
  }

  request(payload: P): void {
    if (!this.inFlight) return this.send(payload);
    if (this.now() - this.inFlight.at < RUNAWAY_MS) {
      this.waiting = { payload };
      return;
    }
    this.stop();
    this.send(payload);
  }

  dispose(): void {
    this.stop();
  }

  private stop() {
    this.worker?.terminate();
    this.worker = null;
    this.inFlight = null;
  }

  private send(payload: P) {
    this.worker ??= this.start();
    this.seq += 1;
    this.inFlight = { seq: this.seq, payload, at: this.now() };
    this.waiting = null;
    this.worker.postMessage(this.spec.message(this.seq, payload));
  }

  private start(): Worker {
    const w = this.spawn();
    w.onmessage = (e: MessageEvent<R>) => {
      if (!this.inFlight || e.data.seq !== this.inFlight.seq) return;
      const { payload } = this.inFlight;
      if (!e.data.final) return this.onResult({ reply: e.data, payload, waiting: this.waiting !== null });
      this.inFlight = null;
      const next = this.waiting;
      this.onResult({ reply: e.data, payload, waiting: next !== null });
      if (next) this.send(next.payload);
    };
    w.onerror = (e) => {
      this.stop();
      this.onResult({ failure: `The ${this.spec.what} worker stopped: ${e.message || "it could not start"}` });
    };
    return w;
  }
}
