/**
 * The checked expression tree that the expression parser produces and every consumer walks
 * (exact algebra, numeric evaluation in tests, rendering). Numbers are exact rationals.
 * Example: "2*s+0.5" → add(mul(num 2/1, s), num 1/2).
 */
export type ExprNode =
  | { kind: "num"; num: bigint; den: bigint } // exact rational, den > 0, lowest terms
  | { kind: "s" }
  | { kind: "param"; name: string }
  | { kind: "add" | "sub" | "mul" | "div"; left: ExprNode; right: ExprNode }
  | { kind: "neg"; arg: ExprNode }
  | { kind: "pow"; base: ExprNode; exp: number }; // non-negative integer exponent
