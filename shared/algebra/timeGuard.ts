import type { AlgebraError } from "@shared/algebra/errors";

/**
 * Deadlines for long exact arithmetic, so no input keeps a reduction busy for ever: one expansion or gcd can run
 * for minutes (a power of a sum of five variables, a gcd in several parameters) between two steps of the reducer.
 * A caller sets a deadline around its work; the arithmetic loops call checkClock(), which throws the error of a
 * deadline that has passed. Deadlines nest: the reducer has one for its whole time limit, the multivariate gcd
 * fallback one of its own.
 * Example: withDeadline(1000, () => new AlgebraError("too-complex", "…"), () => zPow(p, 50)).
 */
interface Deadline {
  at: number;
  fail: () => AlgebraError;
}

const active: Deadline[] = [];
/** The clock is read once every CHECK_EVERY calls: a read costs more than the loop step that asks. */
const CHECK_EVERY = 32;
let countdown = CHECK_EVERY;

/** A time limit as a message names it. Example: limitText(500) === "0.5 s". */
export const limitText = (ms: number): string => `${ms / 1000} s`;

/** Runs `work` with a deadline `ms` from now; past it, checkClock throws `fail()`. */
export function withDeadline<T>(ms: number, fail: () => AlgebraError, work: () => T): T {
  active.push({ at: Date.now() + ms, fail });
  countdown = 0;
  try {
    return work();
  } finally {
    active.pop();
  }
}

/** Throws the error of the first deadline that has passed; cheap when none is set. Example: checkClock(). */
export function checkClock(): void {
  if (active.length === 0 || --countdown > 0) return;
  countdown = CHECK_EVERY;
  const now = Date.now();
  for (const d of active) if (now > d.at) throw d.fail();
}
