import { useCallback, useRef, useState } from "react";
import { record, redo as redoStep, startHistory, undo as undoStep, type History } from "@/features/editor/commands/history";
import type { EditorDoc, Outcome } from "@/features/editor/commands/types";

export type Run = (label: string, command: (doc: EditorDoc) => Outcome, opts?: { coalesce?: string }) => Outcome;

/**
 * The document and its undo/redo history. `run` applies a named command to the current document at once
 * (so two commands in one event see each other) and records it; a refused command changes nothing.
 */
export function useEditorHistory(initial: EditorDoc) {
  const [history, setHistory] = useState<History>(() => startHistory(initial));
  const current = useRef(history);
  const commit = useCallback((next: History) => {
    current.current = next;
    setHistory(next);
  }, []);

  const run = useCallback<Run>(
    (label, command, opts) => {
      const outcome = command(current.current.present);
      if (outcome.ok) commit(record(current.current, label, outcome.doc, opts));
      return outcome;
    },
    [commit],
  );
  const undo = useCallback(() => commit(undoStep(current.current)), [commit]);
  const redo = useCallback(() => commit(redoStep(current.current)), [commit]);
  /** Starts over from `doc` (a reload or a restored draft) with an empty history. */
  const reset = useCallback((doc: EditorDoc) => commit(startHistory(doc)), [commit]);

  return {
    doc: history.present,
    run,
    undo,
    redo,
    reset,
    undoLabel: history.past[history.past.length - 1]?.label,
    redoLabel: history.future[0]?.label,
  };
}
