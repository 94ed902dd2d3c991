import type { AnalysisAnswer, AnalysisQuery } from "@shared/analysis/answer";
import type { Problem } from "@shared/diagram/problems";
import type { ImplementationView, ImplementRequest } from "@shared/implement/view";
import type { ReductionResult } from "@shared/reduce/result";
import type { EditorDoc } from "@/features/editor/commands/types";

/**
 * What the editor asks its one worker: reduce this document, then analyse the pair (unless `analysis` is null),
 * then implement a block or that pair (only while the Implementation tab is open).
 */
export interface LiveQuery {
  document: EditorDoc;
  analysis: AnalysisQuery | null;
  implementation?: ImplementRequest | null;
}

export type LiveRequest = LiveQuery & { seq: number };

/** The results panel's answer: the printed result, or every problem (the document is not sent back). */
export type LiveOutcome = { ok: true; result: ReductionResult } | { ok: false; problems: Problem[] };

/**
 * The worker's answers to request `seq`, in order: the result, then the analysis with the implementation when
 * asked (the last, `final`), or the
 * message of an unexpected crash. `reduced` is false when the blocks, wires and parameters were those of the
 * previous request, so the reduction was reused (a slider move, a block dragged).
 */
export type LiveReply =
  | { seq: number; final: boolean; stage: "result"; ms: number; reduced: boolean; outcome: LiveOutcome }
  | { seq: number; final: true; stage: "analysis"; ms: number; answer: AnalysisAnswer; implementation: ImplementationView | null }
  | { seq: number; final: true; stage: "crash"; ms: number; during: "result" | "analysis"; crash: string };

/** Work limits for live results: a keystroke should never wait on a runaway reduction. */
export const LIVE_LIMITS = { timeLimitMs: 8_000 } as const;
