import fc from "fast-check";
import { parseExpression } from "@shared/expr/parse";
import { FUZZ_PARAMETERS, hostileExpression } from "./exprArbitrary";
import type { FuzzTarget } from "./harness";

interface ExprCase {
  text: string;
  allowS: boolean;
  parameters: string[];
}

/** parseExpression: a tree, or every error with a code, a message and a position inside the text. */
export const exprTarget: FuzzTarget<ExprCase> = {
  name: "expression parser",
  arbitrary: fc.record({ text: hostileExpression, allowS: fc.boolean(), parameters: fc.subarray([...FUZZ_PARAMETERS]) }),
  check({ text, allowS, parameters }) {
    const parsed = parseExpression(text, { allowS, parameters });
    if (parsed.ok) return parsed.ast ? null : "ok without a tree";
    if (parsed.errors.length === 0) return "failure without errors";
    for (const e of parsed.errors) {
      if (!e.code || e.message.trim() === "") return `error without a code or message: ${JSON.stringify(e)}`;
      if (!Number.isInteger(e.position) || e.position < 0 || e.position > text.length) return `error position ${e.position} outside the text (${text.length} chars)`;
    }
    return null;
  },
  show: (c) => `${c.allowS ? "" : "[gain] "}${c.text}`,
};
