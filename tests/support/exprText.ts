import type { ExprNode } from "@shared/expr/ast";

/** How a reference CAS writes an exact number, a binary operator and a power. */
export interface CasSyntax {
  number: (num: bigint, den: bigint) => string;
  /** Between an operator and its operands, e.g. " " for "(a + b)". */
  spacing: string;
  power: string;
}

/**
 * A block expression tree as fully parenthesised text of a reference CAS, for feeding it the same expression.
 * Example: printForCas(tree of (s + 1/2)^2, NERDAMER) === "((s+(1/2)))^2".
 */
export function printForCas(e: ExprNode, syntax: CasSyntax): string {
  const print = (x: ExprNode) => printForCas(x, syntax);
  switch (e.kind) {
    case "num":
      return syntax.number(e.num, e.den);
    case "s":
      return "s";
    case "param":
      return e.name;
    case "add":
    case "sub":
    case "mul":
    case "div": {
      const op = { add: "+", sub: "-", mul: "*", div: "/" }[e.kind];
      return `(${print(e.left)}${syntax.spacing}${op}${syntax.spacing}${print(e.right)})`;
    }
    case "neg":
      return `(-${print(e.arg)})`;
    case "pow":
      return `(${print(e.base)})${syntax.power}${e.exp}`;
  }
}
