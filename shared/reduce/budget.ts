import { AlgebraError } from "@shared/algebra/errors";
import { limitText, withDeadline } from "@shared/algebra/timeGuard";
import { GCD_TIME_LIMIT_MS, withGcdTimeLimit } from "@shared/algebra/zgcd";

/**
 * A bound on the work of one reduction, so no document can keep the reducer busy forever: a number of
 * edges the rules may create and a wall-clock deadline. Exceeding either throws ReductionLimitError.
 * Example: const b = createBudget({ maxEdges: 1e6, timeLimitMs: 20_000 }); spend(b, 4).
 */
export interface Budget {
  edgesLeft: number;
  deadline: number;
  timeLimitMs: number;
}

export interface Limits {
  maxEdges: number;
  /** The whole reduction, gains included. */
  timeLimitMs: number;
  /** Each gcd in several variables (the fallback of the exact gcd). */
  gcdTimeLimitMs: number;
}

export class ReductionLimitError extends Error {
  readonly code = "too-complex";
  constructor(message: string) {
    super(message);
    this.name = "ReductionLimitError";
  }
}

export const DEFAULT_LIMITS: Readonly<Limits> = { maxEdges: 2_000_000, timeLimitMs: 30_000, gcdTimeLimitMs: GCD_TIME_LIMIT_MS };

/** A fresh budget. Example: createBudget() uses DEFAULT_LIMITS. */
export function createBudget(limits: Partial<Limits> = {}): Budget {
  const { maxEdges, timeLimitMs } = { ...DEFAULT_LIMITS, ...limits };
  return { edgesLeft: maxEdges, deadline: Date.now() + timeLimitMs, timeLimitMs };
}

const timeLimitMessage = (ms: number): string =>
  `The reduction ran past its time limit of ${limitText(ms)}: simplify the diagram (fewer symbolic parameters, lower powers or fewer interlocked loops).`;

/**
 * Runs a whole reduction under its time limits: the arithmetic itself watches the clock (a single expansion or
 * gcd may take longer than the limit), failing with AlgebraError "too-complex" or "gcd-time-limit".
 * Example: withinLimits({ timeLimitMs: 500 }, () => reduce(doc)).
 */
export function withinLimits<T>(limits: Partial<Limits> = {}, work: () => T): T {
  const { timeLimitMs, gcdTimeLimitMs } = { ...DEFAULT_LIMITS, ...limits };
  const fail = () => new AlgebraError("too-complex", timeLimitMessage(timeLimitMs));
  return withDeadline(timeLimitMs, fail, () => withGcdTimeLimit(gcdTimeLimitMs, work));
}

/** Charges `edges` new edges and checks the clock. Example: spend(budget, 1). */
export function spend(budget: Budget, edges: number): void {
  budget.edgesLeft -= edges;
  if (budget.edgesLeft < 0) {
    throw new ReductionLimitError(
      "The diagram is too interlocked to reduce within the work limit: split it or compute one input/output pair at a time.",
    );
  }
  if (Date.now() > budget.deadline) throw new ReductionLimitError(timeLimitMessage(budget.timeLimitMs));
}
