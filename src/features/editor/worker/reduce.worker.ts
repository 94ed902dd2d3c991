import { reduceDocument } from "@shared/reduce/reduceDiagram";
import { LIVE_LIMITS, type ReduceReply, type ReduceRequest } from "@/features/editor/worker/protocol";

// Runs the exact engine off the main thread so dragging and typing never stall on algebra.
const post = (reply: ReduceReply) => (self as unknown as Worker).postMessage(reply);

self.onmessage = (event: MessageEvent<ReduceRequest>) => {
  const { seq, document } = event.data;
  const started = performance.now();
  try {
    const outcome = reduceDocument(document, { limits: LIVE_LIMITS });
    post({ seq, ms: performance.now() - started, outcome });
  } catch (err) {
    post({ seq, ms: performance.now() - started, crash: err instanceof Error ? err.message : String(err) });
  }
};
