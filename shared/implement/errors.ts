/**
 * Why a block or pair cannot be discretised or realised, each with a stable code, the offending id where there
 * is one, and whether the choice (the command line) or the diagram is at fault.
 * Example: new ImplementError("improper", "…", "c").
 */
export type ImplementErrorCode =
  | "unknown-block" // --block names no block
  | "no-transfer" // the block passes signals on but has no transfer of its own (sum, pickoff, input, output)
  | "unknown-pair-id" // the reduction holds no such pair
  | "bad-sample-time" // Ts is not a positive finite number
  | "bad-prewarp" // the pre-warp frequency is missing or not in (0, π/Ts)
  | "dead-time" // the transfer holds e^(−sT): no finite-order realisation
  | "improper" // more zeros than poles: no state-space realisation, no causal ZOH or matched equivalent
  | "singular-at-values"; // the denominator vanishes at the chosen parameter values

/** The codes that blame the selection or options rather than the document's content. */
export const CHOICE_CODES: ReadonlySet<ImplementErrorCode> = new Set(["unknown-block", "no-transfer", "unknown-pair-id", "bad-sample-time", "bad-prewarp"]);

export class ImplementError extends Error {
  readonly code: ImplementErrorCode;
  /** The block id (or the pair "r → y") the error is about, when there is one. */
  readonly subject?: string;
  constructor(code: ImplementErrorCode, message: string, subject?: string) {
    super(message);
    this.name = "ImplementError";
    this.code = code;
    this.subject = subject;
  }
}

/** What a transfer belongs to, for messages: its words ('transfer function "c"', "the pair r → y") and its id. */
export interface Subject {
  what: string;
  id?: string;
}
