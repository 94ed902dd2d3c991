import { useEffect, useRef, useState } from "react";
import type { ReduceOutcome } from "@shared/engine/reduceDocument";
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

/** Reduces the document in a Web Worker ~250 ms after the last change. */
export function useLiveResult(doc: EditorDoc): LiveResult {
  const [state, setState] = useState<LiveResult>({ outcome: null, crash: null, pending: true, ms: null, doc: null });
  const channel = useRef<ReduceChannel | null>(null);

  useEffect(() => {
    const c = new ReduceChannel(
      () => new ReduceWorker(),
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

  useEffect(() => {
    setState((s) => (s.pending ? s : { ...s, pending: true }));
    const timer = window.setTimeout(() => channel.current?.request(doc), LIVE_DEBOUNCE_MS);
    return () => window.clearTimeout(timer);
  }, [doc]);

  return state;
}
