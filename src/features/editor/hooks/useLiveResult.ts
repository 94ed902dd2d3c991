import { useLayoutEffect, useRef, useState } from "react";
import type { ReduceOutcome } from "@shared/reduce/reduceDiagram";
import type { EditorDoc } from "@/features/editor/commands/types";
import { ReduceChannel } from "@/features/editor/worker/reduceChannel";
import ReduceWorker from "@/features/editor/worker/reduce.worker.ts?worker";

const LIVE_DEBOUNCE_MS = 250;

export interface LiveResult {
  /** The latest answer (kept while the next one is computed, so the panel does not flicker). */
  outcome: ReduceOutcome | null;
  crash: string | null;
  /** True from a change until the answer for the newest document arrives. */
  pending: boolean;
  ms: number | null;
  /** The document the outcome belongs to. */
  doc: EditorDoc | null;
}

/** A worker started ahead of the session (it spends a second or more loading the engine), once it has not failed. */
let spare: { worker: Worker; failed: boolean } | null = null;

/** Starts the reduction worker while the diagram is still being fetched; the next session takes it over. */
export function warmReduceWorker(): void {
  if (spare && !spare.failed) return;
  const entry = { worker: new ReduceWorker(), failed: false };
  // An error before a channel listens would be lost: remember it, and the channel then starts its own worker.
  entry.worker.addEventListener("error", () => (entry.failed = true), { once: true });
  spare = entry;
}

function takeWorker(): Worker {
  const warm = spare;
  spare = null;
  if (warm && !warm.failed) return warm.worker;
  warm?.worker.terminate();
  return new ReduceWorker();
}

/** Reduces the document in a Web Worker: the opened document at once, later changes ~250 ms after the last one. */
export function useLiveResult(doc: EditorDoc): LiveResult {
  const [state, setState] = useState<LiveResult>({ outcome: null, crash: null, pending: true, ms: null, doc: null });
  const channel = useRef<ReduceChannel | null>(null);
  const opened = useRef(true);

  // Layout effects: the first request leaves before the browser paints the freshly rendered canvas.
  useLayoutEffect(() => {
    const c = new ReduceChannel(
      takeWorker,
      (r) =>
        setState((s) =>
          "failure" in r
            ? { ...s, pending: false, crash: r.failure }
            : {
                outcome: "outcome" in r.reply ? r.reply.outcome : null,
                crash: "crash" in r.reply ? r.reply.crash : null,
                pending: r.waiting,
                ms: r.reply.ms,
                doc: r.payload,
              },
        ),
    );
    channel.current = c;
    return () => c.dispose();
  }, []);

  useLayoutEffect(() => {
    setState((s) => (s.pending ? s : { ...s, pending: true }));
    if (opened.current) {
      opened.current = false;
      channel.current?.request(doc);
      return;
    }
    const timer = window.setTimeout(() => channel.current?.request(doc), LIVE_DEBOUNCE_MS);
    return () => window.clearTimeout(timer);
  }, [doc]);

  return state;
}
