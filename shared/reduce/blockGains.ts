import { AlgebraError } from "@shared/algebra/errors";
import { ratFromExpr, type RatFn } from "@shared/algebra/ratfn";
import type { Problem } from "@shared/diagram/problems";
import type { DiagramDocument } from "@shared/diagram/schema";
import type { ExprNode } from "@shared/expr/ast";
import { kindOf } from "@shared/diagram/blockKinds";

/**
 * Exact gain of every block that scales its input (role "scale") of a validated document, from its parsed
 * expression or its kind's fixed transfer. An expression whose value cannot be formed (a divisor that is identically zero, such as
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
    const kind = kindOf(block);
    if (kind.role !== "scale") continue;
    const ast = kind.fixedTransfer ?? expressions.get(block.id);
    if (!ast) continue;
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
