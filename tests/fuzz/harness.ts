import fc from "fast-check";
import { problemSchema, type Problem } from "@shared/diagram/problems";

/**
 * One fuzz target: hostile inputs of one entry point and the property every answer must have — a value, or a
 * typed error / problem list whose messages say what is wrong. `check` returns null when the answer is fine and
 * a sentence when it is not; it may throw, which the harness counts as a failure (an uncaught exception).
 */
export interface FuzzTarget<T> {
  name: string;
  arbitrary: fc.Arbitrary<T>;
  check(input: T): string | null;
  /** The input as text for the report (the harness truncates it). */
  show(input: T): string;
}

export interface CaseOutcome {
  ms: number;
  failure: string | null;
}

/** Runs one input through a target, timing it; an exception thrown is a failure naming it. */
export function runCase<T>(target: FuzzTarget<T>, input: T): CaseOutcome {
  const started = performance.now();
  let failure: string | null;
  try {
    failure = target.check(input);
  } catch (e) {
    failure = `threw ${e instanceof Error ? `${e.name}: ${e.message}` : String(e)}`;
  }
  return { ms: performance.now() - started, failure };
}

/** The input as one short line (control characters escaped). */
export const truncated = (text: string, max = 160): string => {
  const line = text.replace(/[\u0000-\u001f]/g, (c) => JSON.stringify(c).slice(1, -1));
  return line.length > max ? `${line.slice(0, max)}… (${text.length} chars)` : line;
};

// Problem codes that are about one block's expression: such a problem must name the block.
const EXPRESSION_CODES = new Set([
  "empty", "expr-too-long", "syntax", "implicit-multiplication", "ambiguous-product", "function-call",
  "unknown-name", "s-in-gain", "bad-exponent", "exponent-limit", "division-by-zero", "number-range",
]);

/** What is wrong with a problem list of a refusal (null when nothing): empty, unreadable, or a block left unnamed. */
export function problemsFault(problems: readonly Problem[], refused: boolean): string | null {
  if (refused && !problems.some((p) => p.severity === "error")) return "refused without an error problem";
  for (const p of problems) {
    if (!problemSchema.safeParse(p).success) return `malformed problem ${JSON.stringify(p)}`;
    if (p.message.trim() === "") return `problem ${p.code} has an empty message`;
    if ((EXPRESSION_CODES.has(p.code) || p.field === "expr") && !p.blockId) return `problem ${p.code} about an expression names no block: ${p.message}`;
  }
  return null;
}

/** What is wrong with a thrown error that is meant to be a typed one (null when it is one with a message). */
export function typedErrorFault(e: unknown, type: abstract new (...args: never[]) => Error): string | null {
  if (!(e instanceof type)) throw e;
  return e.message.trim() === "" ? `${type.name} with an empty message` : null;
}
