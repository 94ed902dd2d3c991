import { describe, expect, it } from "vitest";
import type { AnalysisQuery, AnalysisRequest } from "@shared/analysis/answer";
import { AnalysisChannel, type AnalysisChannelResult } from "@/features/editor/worker/analysisChannel";
import { unityLoop } from "../support";

/** Stands in for a Web Worker: records requests; the test answers them. */
class FakeWorker {
  onmessage: ((e: MessageEvent) => void) | null = null;
  onerror: ((e: ErrorEvent) => void) | null = null;
  sent: AnalysisRequest[] = [];
  postMessage(m: AnalysisRequest) {
    this.sent.push(m);
  }
  terminate() {}
  answer(seq: number) {
    this.onmessage?.({ data: { seq, ms: 1, ok: false, problems: [], parameters: [] } } as MessageEvent);
  }
}

const query = (K: number): AnalysisQuery => ({
  document: unityLoop(),
  input: "r",
  output: "y",
  break: null,
  values: { K },
  settlingBand: 0.02,
  sweepParameter: "K",
  withSweep: true,
});

describe("analysis worker channel (common practice: latest-wins queue, shared with the reduction channel)", () => {
  it("sends the whole query with a sequence number and skips slider values overtaken while it works", () => {
    const workers: FakeWorker[] = [];
    const results: AnalysisChannelResult[] = [];
    const channel = new AnalysisChannel(() => {
      const w = new FakeWorker();
      workers.push(w);
      return w as unknown as Worker;
    }, (r) => results.push(r));
    const [a, b, c] = [query(1), query(2), query(3)];
    channel.request(a);
    channel.request(b);
    channel.request(c);
    expect(workers[0].sent).toEqual([{ ...a, seq: 1 }]);
    workers[0].answer(1);
    expect(results[0]).toMatchObject({ payload: a, waiting: true });
    expect(workers[0].sent.map((m) => m.values.K)).toEqual([1, 3]);
    workers[0].answer(2);
    expect(results[1]).toMatchObject({ payload: c, waiting: false });
  });

  it("names the analysis worker when it fails", () => {
    const workers: FakeWorker[] = [];
    const results: AnalysisChannelResult[] = [];
    new AnalysisChannel(() => {
      const w = new FakeWorker();
      workers.push(w);
      return w as unknown as Worker;
    }, (r) => results.push(r));
    workers[0].onerror?.({ message: "out of memory" } as ErrorEvent);
    expect(results).toEqual([{ failure: "The analysis worker stopped: out of memory" }]);
  });
});
