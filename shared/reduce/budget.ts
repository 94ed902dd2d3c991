/**
 * A bound on the work of one reduction, so no document can keep the reducer busy forever: a number of
 * edges the rules may create and a wall-clock deadline. Exceeding either throws ReductionLimitError.
 * Example: const b = createBudget({ maxEdges: 1e6, timeLimitMs: 20_000 }); spend(b, 4).
 */
export interface Budget {
  edgesLeft: number;
  deadline: number;
}

export class ReductionLimitError extends Error {
  readonly code = "too-complex";
  constructor(message: string) {
    super(message);
    this.name = "ReductionLimitError";
  }
}

export const DEFAULT_LIMITS = { maxEdges: 2_000_000, timeLimitMs: 30_000 } as const;

/** A fresh budget. Example: createBudget() uses DEFAULT_LIMITS. */
export function createBudget(limits: Partial<{ maxEdges: number; timeLimitMs: number }> = {}): Budget {
  const { maxEdges, timeLimitMs } = { ...DEFAULT_LIMITS, ...limits };
  return { edgesLeft: maxEdges, deadline: Date.now() + timeLimitMs };
}

/** Charges `edges` new edges and checks the clock. Example: spend(budget, 1). */
export function spend(budget: Budget, edges: number): void {
  budget.edgesLeft -= edges;
  if (budget.edgesLeft < 0) {
    throw new ReductionLimitError(
      "The diagram is too interlocked to reduce within the work limit: split it or compute one input/output pair at a time.",
    );
  }
  if (Date.now() > budget.deadline) {
    throw new ReductionLimitError(
      "The reduction ran past its time limit: simplify the diagram (fewer symbolic parameters or interlocked loops).",
    );
  }
}
