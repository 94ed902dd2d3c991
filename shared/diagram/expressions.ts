import type { ExprNode } from "@shared/expr/ast";
import { BLOCK_KINDS, hasExpression } from "@shared/diagram/blockKinds";
import { boundedMemo } from "@shared/expr/boundedMemo";
import { exprDegreeBound } from "@shared/expr/degree";
import { inDecimalRange, MAX_DECIMAL_EXPONENT } from "@shared/expr/decimal";
import { parseExpression, type ParseResult } from "@shared/expr/parse";
import type { Problem } from "@shared/diagram/problems";
import { LIMITS, type DiagramDocument } from "@shared/diagram/schema";

const SEP = "\u0000"; // never in an expression or a parameter name

/** Block expressions parsed once per text, kind and parameter list (a diagram repeats them; an edit changes few). */
const parseBlockExpression = boundedMemo(4000, (key: string): ParseResult => {
  const [allowS, sRefusal, parameters, text] = key.split(SEP);
  return parseExpression(text, { allowS: allowS === "s", sRefusal: sRefusal || undefined, parameters: parameters ? parameters.split(",") : [] });
});

/**
 * Parses every block expression against the declared parameters and checks the cheap
 * degree bound of the whole diagram (sum over blocks of max(deg num, deg den) as written, fixed transfers included),
 * so a diagram whose result could exceed the degree limit is refused before any algebra runs.
 * Every error of an expression is its own problem. Example: a gain "2*s" → problem "s-in-gain" on that block,
 * field "expr", position 2; "K*(s+" with K undeclared → "unknown-name" at 0 and "syntax" at 5.
 */
export function expressionProblems(doc: DiagramDocument): { problems: Problem[]; expressions: Map<string, ExprNode> } {
  const problems: Problem[] = [];
  const expressions = new Map<string, ExprNode>();
  const parameters = Object.keys(doc.parameters ?? {}).join(",");
  let degree = 0;
  for (const block of doc.blocks) {
    const fixed = BLOCK_KINDS[block.type].fixedTransfer;
    if (fixed) degree += exprDegreeBound(fixed);
    if (!hasExpression(block)) continue;
    const { mayContainS, sRefusal } = BLOCK_KINDS[block.type].expression;
    const parsed = parseBlockExpression([mayContainS ? "s" : "", sRefusal ?? "", parameters, block.expr].join(SEP));
    if (!parsed.ok) {
      for (const { code, message, position } of parsed.errors) {
        problems.push({ severity: "error", code, message: `Block "${block.id}", expr: ${message}`, blockId: block.id, field: "expr", position });
      }
      continue;
    }
    if (!expressions.has(block.id)) expressions.set(block.id, parsed.ast);
    degree += exprDegreeBound(parsed.ast);
  }
  if (degree > LIMITS.resultDegree) {
    problems.push({
      severity: "error",
      code: "degree-limit",
      message:
        `The blocks together reach degree ${degree} in s (sum of each block's degree as written), above the limit of ` +
        `${LIMITS.resultDegree}; the closed-loop result could be too large to compute exactly — split the diagram`,
    });
  }
  return { problems, expressions };
}

/**
 * Checks of parameter specs: a value, min or max beyond the exact-number range is an error (the analysis takes
 * values exactly, as expressions take numbers); a range that excludes the value is a warning.
 * Example: { value: 5, min: 0, max: 2 } → "parameter-out-of-range"; 1e-320 → "parameter-number-range".
 */
export function parameterProblems(doc: DiagramDocument): Problem[] {
  const problems: Problem[] = [];
  for (const [name, spec] of Object.entries(doc.parameters ?? {})) {
    const { value, min, max } = typeof spec === "number" ? { value: spec, min: undefined, max: undefined } : spec;
    const field = `parameters.${name}`;
    const outOfRange = Object.entries({ value, min, max }).find(([, x]) => x !== undefined && !inDecimalRange(x));
    if (outOfRange) {
      const message = `Parameter ${name} has ${outOfRange[0]} ${outOfRange[1]}, beyond the exact-number range (powers of ten up to ±${MAX_DECIMAL_EXPONENT}); use 0 or a value within it`;
      problems.push({ severity: "error", code: "parameter-number-range", message, field });
    } else if (min !== undefined && max !== undefined && min > max) {
      const message = `Parameter ${name} has min ${min} above max ${max}; swap them`;
      problems.push({ severity: "warning", code: "parameter-min-above-max", message, field });
    } else if ((min !== undefined && value < min) || (max !== undefined && value > max)) {
      const message = `Parameter ${name} has value ${value} outside its range [${min ?? "−∞"}, ${max ?? "∞"}]`;
      problems.push({ severity: "warning", code: "parameter-out-of-range", message, field });
    }
  }
  return problems;
}
