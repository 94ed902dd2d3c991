import type { EditorDoc } from "@/features/editor/commands/types";
import type { ReduceReply, ReduceRequest } from "@/features/editor/worker/protocol";

/** A reduction still running after this long is abandoned (worker restarted) when a newer document waits. */
export const RUNAWAY_MS = 3000;

export type ChannelResult = { reply: ReduceReply; doc: EditorDoc; waiting: boolean } | { failure: string };

/**
 * One warm reduction worker and its queue of length one: while it works only the newest document waits.
 * Starting a worker costs a second or more (loading the engine), so it is restarted only for a runaway.
 */
export class ReduceChannel {
  private worker: Worker | null = null;
  private seq = 0;
  private inFlight: { seq: number; doc: EditorDoc; at: number } | null = null;
  private waiting: EditorDoc | null = null;

  constructor(
    private readonly spawn: () => Worker,
    private readonly onResult: (r: ChannelResult) => void,
    private readonly now: () => number = () => performance.now(),
  ) {
    this.worker = this.start();
  }

  request(doc: EditorDoc): void {
    if (!this.inFlight) return this.send(doc);
    if (this.now() - this.inFlight.at < RUNAWAY_MS) {
      this.waiting = doc;
      return;
    }
    this.stop();
    this.send(doc);
  }

  dispose(): void {
    this.stop();
  }

  private stop() {
    this.worker?.terminate();
    this.worker = null;
    this.inFlight = null;
  }

  private send(doc: EditorDoc) {
    this.worker ??= this.start();
    this.seq += 1;
    this.inFlight = { seq: this.seq, doc, at: this.now() };
    this.waiting = null;
    const request: ReduceRequest = { seq: this.seq, document: doc };
    this.worker.postMessage(request);
  }

  private start(): Worker {
    const w = this.spawn();
    w.onmessage = (e: MessageEvent<ReduceReply>) => {
      if (!this.inFlight || e.data.seq !== this.inFlight.seq) return;
      const { doc } = this.inFlight;
      this.inFlight = null;
      const next = this.waiting;
      this.onResult({ reply: e.data, doc, waiting: next !== null });
      if (next) this.send(next);
    };
    w.onerror = (e) => {
      this.stop();
      this.onResult({ failure: `The reduction worker stopped: ${e.message || "it could not start"}` });
    };
    return w;
  }
}
