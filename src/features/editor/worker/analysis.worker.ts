import type { AnalysisReply, AnalysisRequest } from "@shared/analysis/answer";
import { createAnalyzer } from "@/features/editor/worker/analyzeQuery";

// Runs the analysis off the main thread; the analyser keeps the last preparation, so slider moves stay fast.
const post = (reply: AnalysisReply) => (self as unknown as Worker).postMessage(reply);
const analyze = createAnalyzer();

self.onmessage = (event: MessageEvent<AnalysisRequest>) => {
  const { seq, ...query } = event.data;
  const started = performance.now();
  try {
    const answer = analyze(query);
    post({ ...answer, seq, ms: performance.now() - started });
  } catch (err) {
    post({ seq, ms: performance.now() - started, crash: err instanceof Error ? err.message : String(err) });
  }
};
