import { describe, expect, it } from "vitest";
import type { AnalysisQuery } from "@shared/analysis/answer";
import type { EditorDoc } from "@/features/editor/commands/types";
import { LiveChannel, type LiveChannelResult } from "@/features/editor/worker/liveChannel";
import type { LiveQuery, LiveRequest } from "@/features/editor/worker/liveProtocol";
import { RUNAWAY_MS } from "@/features/editor/worker/workerChannel";
import { unityLoop } from "../support";

/** Stands in for a Web Worker: records requests; the test answers them, the result first, then the analysis. */
class FakeWorker {
  onmessage: ((e: MessageEvent) => void) | null = null;
  onerror: ((e: ErrorEvent) => void) | null = null;
  sent: LiveRequest[] = [];
  terminated = false;
  postMessage(m: LiveRequest) {
    this.sent.push(m);
  }
  terminate() {
    this.terminated = true;
  }
  result(seq: number) {
    this.onmessage?.({ data: { seq, final: false, stage: "result", ms: 1, reduced: true, outcome: { ok: false, problems: [] } } } as MessageEvent);
  }
  analysis(seq: number) {
    this.onmessage?.({ data: { seq, final: true, stage: "analysis", ms: 1, answer: { ok: false, problems: [], parameters: [] } } } as MessageEvent);
  }
  answer(seq: number) {
    this.result(seq);
    this.analysis(seq);
  }
}

function setup() {
  const workers: FakeWorker[] = [];
  const results: LiveChannelResult[] = [];
  let clock = 0;
  const channel = new LiveChannel(
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

const analysis = (K: number): AnalysisQuery => ({ input: "r", output: "y", break: null, values: { K }, settlingBand: 0.02, sweepParameter: "K", withSweep: true });
const docs = (n: number): EditorDoc[] => Array.from({ length: n }, (_, i) => ({ ...unityLoop(), title: `v${i}` }));
const queries = (n: number): LiveQuery[] => docs(n).map((document, i) => ({ document, analysis: analysis(i + 1) }));

describe("the editor worker's channel (common practice: latest-wins queue for live results)", () => {
  it("keeps one worker warm and, while it works, lets only the newest request wait", () => {
    const { channel, workers, results } = setup();
    const [a, b, c] = queries(3);
    channel.request(a);
    channel.request(b);
    channel.request(c);
    expect(workers).toHaveLength(1);
    expect(workers[0].sent).toEqual([{ ...a, seq: 1 }]);
    workers[0].answer(1);
    expect(results).toEqual([
      { reply: expect.objectContaining({ seq: 1, stage: "result" }), payload: a, waiting: true },
      { reply: expect.objectContaining({ seq: 1, stage: "analysis" }), payload: a, waiting: true },
    ]);
    expect(workers[0].sent.map((m) => m.analysis?.values.K)).toEqual([1, 3]);
    workers[0].answer(2);
    expect(results[3]).toMatchObject({ payload: c, waiting: false });
  });

  it("passes the result on at once but sends the next request only after the final answer", () => {
    const { channel, workers, results } = setup();
    const [a, b] = queries(2);
    channel.request(a);
    workers[0].result(1);
    expect(results).toMatchObject([{ reply: { stage: "result" }, payload: a, waiting: false }]);
    channel.request(b);
    expect(workers[0].sent).toHaveLength(1);
    workers[0].analysis(1);
    expect(workers[0].sent.map((m) => m.document)).toEqual([a.document, b.document]);
  });

  it("abandons a runaway request for a newer one, and ignores the stale answer", () => {
    const { channel, workers, results, tick } = setup();
    const [a, b] = queries(2);
    channel.request(a);
    tick(RUNAWAY_MS + 1);
    channel.request(b);
    expect(workers[0].terminated).toBe(true);
    expect(workers).toHaveLength(2);
    workers[0].answer(1);
    expect(results).toEqual([]);
    workers[1].answer(2);
    expect(results).toMatchObject([{ payload: b, waiting: false }, { payload: b, waiting: false }]);
  });

  it("reports a worker that fails to start, and starts another on the next request", () => {
    const { channel, workers, results } = setup();
    workers[0].onerror?.({ message: "boom" } as ErrorEvent);
    expect(results).toEqual([{ failure: "The editor worker stopped: boom" }]);
    channel.request(queries(1)[0]);
    expect(workers).toHaveLength(2);
  });
});
