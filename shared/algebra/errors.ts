/**
 * Errors of the exact algebra, each with a stable code the reducer maps onto a block or wire.
 * Example: new AlgebraError("division-by-zero", "The divisor s - s is identically zero.").
 */
export type AlgebraErrorCode =
  | "division-by-zero" // a divisor is the zero polynomial
  | "degree-limit" // a result would have degree > 1000 in s (or in a parameter)
  | "missing-parameter" // numeric evaluation without a value for a parameter
  | "not-univariate" // a one-parameter routine got s or several parameters
  | "bad-number" // a numeric literal that is not a finite decimal or p/q
  | "size-limit" // an expression whose exact numbers or terms would grow past the limits (sizeLimits.ts)
  | "too-complex" // the reduction's time limit passed inside the arithmetic (see timeGuard.ts)
  | "gcd-time-limit"; // a gcd in several variables ran past the gcd fallback's own time budget

export class AlgebraError extends Error {
  readonly code: AlgebraErrorCode;
  /** What the error is about, when there is a name to give (e.g. the missing parameter). */
  readonly subject?: string;
  constructor(code: AlgebraErrorCode, message: string, subject?: string) {
    super(message);
    this.name = "AlgebraError";
    this.code = code;
    this.subject = subject;
  }
}

/** Highest degree in s (and in any parameter) a result may have. */
export const DEGREE_LIMIT = 1000;
