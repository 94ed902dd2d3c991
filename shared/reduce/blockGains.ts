import { AlgebraError } from "@shared/algebra/errors";
import { ratFromExpr, type RatFn } from "@shared/algebra/ratfn";
import type { Problem } from "@shared/diagram/problems";
import type { DiagramDocument } from "@shared/diagram/schema";
import type { ExprNode } from "@shared/expr/ast";

/** The integrator's transfer function 1/s as an expression tree. */
const INTEGRATOR: ExprNode = { kind: "div", left: { kind: "num", num: 1n, den: 1n }, right: { kind: "s" } };

/**
 * Exact gain of every gain, transfer and integrator block of a validated document, from the parsed
 * expressions. An expression whose value cannot be formed (a divisor that is identically zero, such as
 * "1/(s - s)") is a problem naming the block and its `expr` field.
 * Example: blockGains(doc, expressions).gains.get("c") is K·(s + 2)/s.
 */
export function blockGains(
  doc: DiagramDocument,
  expressions: ReadonlyMap<string, ExprNode>,
): { gains: Map<string, RatFn>; problems: Problem[] } {
  const gains = new Map<string, RatFn>();
  const problems: Problem[] = [];
  for (const block of doc.blocks) {
    const ast = block.type === "integrator" ? INTEGRATOR : expressions.get(block.id);
    if (!ast || (block.type !== "gain" && block.type !== "transfer" && block.type !== "integrator")) continue;
    try {
      gains.set(block.id, ratFromExpr(ast));
    } catch (err) {
      if (!(err instanceof AlgebraError)) throw err;
      problems.push({
        severity: "error",
        code: err.code,
        blockId: block.id,
        field: "expr",
        message: `Block ${block.id}: ${err.message}`,
      });
    }
  }
  return { gains, problems };
}
