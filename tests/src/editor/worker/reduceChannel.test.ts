import { describe, expect, it } from "vitest";
import type { EditorDoc } from "@/features/editor/commands/types";
import type { ReduceRequest } from "@/features/editor/worker/protocol";
import { ReduceChannel, type ChannelResult } from "@/features/editor/worker/reduceChannel";
import { RUNAWAY_MS } from "@/features/editor/worker/workerChannel";
import { unityLoop } from "../support";

/** Stands in for a Web Worker: records requests; the test answers them. */
class FakeWorker {
  onmessage: ((e: MessageEvent) => void) | null = null;
  onerror: ((e: ErrorEvent) => void) | null = null;
  sent: ReduceRequest[] = [];
  terminated = false;
  postMessage(m: ReduceRequest) {
    this.sent.push(m);
  }
  terminate() {
    this.terminated = true;
  }
  answer(seq: number) {
    this.onmessage?.({ data: { seq, ms: 1, outcome: { ok: false, problems: [] } } } as MessageEvent);
  }
}

function setup() {
  const workers: FakeWorker[] = [];
  const results: ChannelResult[] = [];
  let clock = 0;
  const channel = new ReduceChannel(
    () => {
      const w = new FakeWorker();
      workers.push(w);
      return w as unknown as Worker;
    },
    (r) => results.push(r),
    () => clock,
  );
  return { channel, workers, results, tick: (ms: number) => (clock += ms) };
}

const docs = (n: number): EditorDoc[] => Array.from({ length: n }, (_, i) => ({ ...unityLoop(), title: `v${i}` }));

describe("reduction worker channel (common practice: latest-wins queue for live results)", () => {
  it("keeps one worker warm and, while it works, lets only the newest document wait", () => {
    const { channel, workers, results } = setup();
    const [a, b, c] = docs(3);
    channel.request(a);
    channel.request(b);
    channel.request(c);
    expect(workers).toHaveLength(1);
    expect(workers[0].sent.map((m) => m.document)).toEqual([a]);
    workers[0].answer(1);
    expect(results).toEqual([{ reply: expect.objectContaining({ seq: 1 }), payload: a, waiting: true }]);
    expect(workers[0].sent.map((m) => m.document)).toEqual([a, c]);
    workers[0].answer(2);
    expect(results[1]).toMatchObject({ payload: c, waiting: false });
  });

  it("abandons a runaway reduction for a newer document, and ignores the stale answer", () => {
    const { channel, workers, results, tick } = setup();
    const [a, b] = docs(2);
    channel.request(a);
    tick(RUNAWAY_MS + 1);
    channel.request(b);
    expect(workers[0].terminated).toBe(true);
    expect(workers).toHaveLength(2);
    workers[0].answer(1);
    expect(results).toEqual([]);
    workers[1].answer(2);
    expect(results).toMatchObject([{ payload: b, waiting: false }]);
  });

  it("reports a worker that fails to start", () => {
    const { channel, workers, results } = setup();
    workers[0].onerror?.({ message: "boom" } as ErrorEvent);
    expect(results).toEqual([{ failure: "The reduction worker stopped: boom" }]);
    channel.request(docs(1)[0]);
    expect(workers).toHaveLength(2);
  });
});
