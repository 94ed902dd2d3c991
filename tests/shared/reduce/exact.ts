import { ratDiv, ratEquals, ratFromExpr, ratToText, type RatFn } from "@shared/algebra/ratfn";
import { parseExpression } from "@shared/expr/parse";
import type { ReduceOutcome } from "@shared/reduce/reduceDiagram";
import type { TransferResult } from "@shared/reduce/result";

/** The exact value of an expression written in the diagram syntax (test reference values). */
export function exact(text: string, parameters: string[] = []): RatFn {
  const parsed = parseExpression(text, { allowS: true, parameters });
  if (!parsed.ok) throw new Error(`bad reference expression ${text}: ${parsed.message}`);
  return ratFromExpr(parsed.ast);
}

/** The value of a printed transfer, numerator over denominator. */
export const transferValue = (t: TransferResult, parameters: string[] = []): RatFn =>
  ratDiv(exact(t.numerator, parameters), exact(t.denominator, parameters));

/** Compares by value, with both sides printed on failure. */
export function sameValue(actual: RatFn, expected: RatFn): true | string {
  return ratEquals(actual, expected) || `${ratToText(actual)} ≠ ${ratToText(expected)}`;
}

/** The result of a successful reduction, or a thrown error listing the problems. */
export function resultOf(out: ReduceOutcome) {
  if (!out.ok) throw new Error(`reduction failed: ${out.problems.map((p) => `${p.code}: ${p.message}`).join("; ")}`);
  return out.result;
}
