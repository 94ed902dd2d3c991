/**
 * Errors of the analysis, each with a stable code and, where there is one, the id it is about.
 * Example: new AnalysisError("degree-limit", "The denominator has degree 120; the limit is 100.").
 */
export type AnalysisErrorCode =
  | "degree-limit" // a polynomial above the numeric root-finding limit
  | "singular-at-values" // the transfer's denominator vanishes identically at the chosen parameter values
  | "unknown-break-wire" // --break names no wire
  | "unknown-parameter" // a sweep or stable-set parameter that does not occur
  | "bad-value" // a parameter value that is not a finite number
  | "delay-response"; // a transfer with dead times whose time response cannot be simulated (advanced, improper)

export class AnalysisError extends Error {
  readonly code: AnalysisErrorCode;
  /** What the error is about (a wire id, a parameter name), when there is one. */
  readonly subject?: string;
  constructor(code: AnalysisErrorCode, message: string, subject?: string) {
    super(message);
    this.name = "AnalysisError";
    this.code = code;
    this.subject = subject;
  }
}

/** Highest degree whose roots are computed (accuracy 1e-9 relative is tested up to here). */
export const ROOT_DEGREE_LIMIT = 100;
