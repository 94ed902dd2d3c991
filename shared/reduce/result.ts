import type { Problem } from "@shared/diagram/problems";

/**
 * The reduction engine's output — the contract shared by the CLI (`--json`), the server's stored
 * `result` column and the editor's results panel. Polynomials are written in the diagram expression
 * syntax: expanded, descending powers of s, exact coefficients (integers or p/q, never decimals).
 */
export interface Cancellation {
  /** The cancelled common factor, e.g. "s - 1". */
  factor: string;
  /** Its roots at the nominal parameter values, as [re, im] pairs. */
  roots: [number, number][];
  /** True when a root has non-negative real part: a hidden unstable mode. */
  unstable: boolean;
}

export interface TransferResult {
  input: string; // input block id
  output: string; // output block id
  numerator: string;
  denominator: string;
  latex: string;
  cancelled: Cancellation[];
}

export type ReductionRule =
  | "series"
  | "parallel"
  | "feedback"
  | "move-sum"
  | "move-pickoff"
  | "eliminate-node";

export interface ReductionStep {
  index: number;
  rule: ReductionRule;
  /** One sentence a reviewer can read, e.g. "Series: c then p become c·p". */
  description: string;
  consumedBlocks: string[];
  consumedWires: string[];
  /** Id of the equivalent block the step produced (new ids are prefixed "eq"). */
  produced: string;
  expr: string;
  latex: string;
  /** Pair the step belongs to, when the trace is per pair. */
  input?: string;
  output?: string;
}

export interface ReductionResult {
  transfers: TransferResult[];
  /** Δ(s) times every block denominator, nothing cancelled: the modes of the whole interconnection. */
  characteristic: string;
  characteristicLatex: string;
  steps: ReductionStep[];
  warnings: Problem[];
}
