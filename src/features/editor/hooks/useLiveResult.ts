import { useEffect, useRef, useState } from "react";
import type { ReduceOutcome } from "@shared/engine/reduceDocument";
import type { EditorDoc } from "@/features/editor/commands/types";
import type { ReduceReply, ReduceRequest } from "@/features/editor/worker/protocol";
import ReduceWorker from "@/features/editor/worker/reduce.worker.ts?worker";

export const LIVE_DEBOUNCE_MS = 250;

export interface LiveResult {
  /** The latest answer (kept while the next one is computed, so the panel does not flicker). */
  outcome: ReduceOutcome | null;
  crash: string | null;
  /** True from a change until its answer arrives. */
  pending: boolean;
  ms: number | null;
  /** The document the outcome belongs to. */
  doc: EditorDoc | null;
}

/**
 * Reduces the document in a Web Worker ~250 ms after the last change. A change while a reduction still
 * runs ends that worker and starts a fresh one: only the newest document's answer matters.
 */
export function useLiveResult(doc: EditorDoc): LiveResult {
  const [state, setState] = useState<LiveResult>({ outcome: null, crash: null, pending: true, ms: null, doc: null });
  const worker = useRef<Worker | null>(null);
  const busy = useRef(false);
  const seq = useRef(0);
  const sent = useRef(new Map<number, EditorDoc>());

  useEffect(() => () => worker.current?.terminate(), []);

  useEffect(() => {
    setState((s) => (s.pending ? s : { ...s, pending: true }));
    const timer = window.setTimeout(() => {
      if (busy.current) {
        worker.current?.terminate();
        worker.current = null;
      }
      if (!worker.current) {
        const w = new ReduceWorker();
        w.onmessage = (e: MessageEvent<ReduceReply>) => {
          const reply = e.data;
          const forDoc = sent.current.get(reply.seq) ?? null;
          sent.current.delete(reply.seq);
          if (reply.seq !== seq.current) return;
          busy.current = false;
          setState({
            outcome: "outcome" in reply ? reply.outcome : null,
            crash: "crash" in reply ? reply.crash : null,
            pending: false,
            ms: reply.ms,
            doc: forDoc,
          });
        };
        w.onerror = (e) => {
          busy.current = false;
          setState((s) => ({ ...s, pending: false, crash: `The reduction worker stopped: ${e.message || "it could not start"}` }));
        };
        worker.current = w;
      }
      seq.current += 1;
      busy.current = true;
      sent.current = new Map([[seq.current, doc]]);
      const request: ReduceRequest = { seq: seq.current, document: doc };
      worker.current.postMessage(request);
    }, LIVE_DEBOUNCE_MS);
    return () => window.clearTimeout(timer);
  }, [doc]);

  return state;
}
