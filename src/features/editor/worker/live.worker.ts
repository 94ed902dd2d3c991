import type { LiveReply, LiveRequest } from "@/features/editor/worker/liveProtocol";
import { createLiveSession } from "@/features/editor/worker/liveSession";

// The editor's one worker: the exact reduction and the analysis off the main thread, so dragging and typing
// never stall on algebra. The result is posted first, so the results panel never waits on the analysis.
const post = (reply: LiveReply) => (self as unknown as Worker).postMessage(reply);
const session = createLiveSession();

self.onmessage = (event: MessageEvent<LiveRequest>) => {
  const { seq, document, analysis, implementation = null } = event.data;
  let started = performance.now();
  const crash = (during: "result" | "analysis", err: unknown) =>
    post({ seq, final: true, stage: "crash", ms: performance.now() - started, during, crash: err instanceof Error ? err.message : String(err) });
  try {
    const { outcome, reduced } = session.reduce(document);
    post({ seq, final: analysis === null, stage: "result", ms: performance.now() - started, reduced, outcome });
  } catch (err) {
    return crash("result", err);
  }
  if (analysis === null) return;
  started = performance.now();
  try {
    const answer = session.analyze(analysis);
    const implemented = implementation && session.implement(implementation, answer);
    post({ seq, final: true, stage: "analysis", ms: performance.now() - started, answer, implementation: implemented });
  } catch (err) {
    crash("analysis", err);
  }
};
