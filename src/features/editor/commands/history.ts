import type { EditorDoc } from "@/features/editor/commands/types";

/** One recorded command: its name and the documents before and after it. */
export interface HistoryEntry {
  label: string;
  before: EditorDoc;
  after: EditorDoc;
  /** Consecutive entries with the same key (typing into one field, nudging one block) merge into one step. */
  coalesce?: string;
  at: number;
}

export interface History {
  present: EditorDoc;
  past: HistoryEntry[];
  future: HistoryEntry[];
}

/** Steps kept for undo; the oldest fall off. */
export const HISTORY_LIMIT = 200;
/** How long after the last keystroke typing into the same field still counts as the same step. */
export const COALESCE_MS = 1500;

export const startHistory = (doc: EditorDoc): History => ({ present: doc, past: [], future: [] });

/** Records `next` as the result of the command `label`; an unchanged document records nothing. */
export function record(h: History, label: string, next: EditorDoc, opts: { coalesce?: string; now?: number } = {}): History {
  if (next === h.present) return h;
  const at = opts.now ?? Date.now();
  const last = h.past[h.past.length - 1];
  if (opts.coalesce && last?.coalesce === opts.coalesce && h.future.length === 0 && at - last.at <= COALESCE_MS) {
    return { present: next, past: [...h.past.slice(0, -1), { ...last, after: next, at }], future: [] };
  }
  const entry: HistoryEntry = { label, before: h.present, after: next, coalesce: opts.coalesce, at };
  return { present: next, past: [...h.past, entry].slice(-HISTORY_LIMIT), future: [] };
}

/** Steps back one command; the step moves to the redo list. */
export function undo(h: History): History {
  const last = h.past[h.past.length - 1];
  if (!last) return h;
  return { present: last.before, past: h.past.slice(0, -1), future: [{ ...last, coalesce: undefined }, ...h.future] };
}

/** Replays the most recently undone command. */
export function redo(h: History): History {
  const [next, ...rest] = h.future;
  if (!next) return h;
  return { present: next.after, past: [...h.past, next], future: rest };
}
