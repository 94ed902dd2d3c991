import type { ReduceOutcome } from "@shared/reduce/reduceDiagram";

/** The one message the editor sends its reduction worker: reduce this document. */
export interface ReduceRequest {
  seq: number;
  document: unknown;
}

/** The worker's answer to request `seq`: the engine's outcome, or the message of an unexpected crash. */
export type ReduceReply =
  | { seq: number; ms: number; outcome: ReduceOutcome }
  | { seq: number; ms: number; crash: string };

/** Work limits for live results: a keystroke should never wait on a runaway reduction. */
export const LIVE_LIMITS = { timeLimitMs: 8_000 } as const;
