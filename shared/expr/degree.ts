import type { ExprNode } from "@shared/expr/ast";

/** Upper bounds on the degrees in s of the numerator and denominator an expression produces as written. */
interface DegreePair {
  num: number;
  den: number;
}

function degreePair(node: ExprNode): DegreePair {
  switch (node.kind) {
    case "num":
    case "param":
      return { num: 0, den: 0 };
    case "s":
      return { num: 1, den: 0 };
    case "neg":
      return degreePair(node.arg);
    case "pow": {
      const b = degreePair(node.base);
      return { num: b.num * node.exp, den: b.den * node.exp };
    }
    case "mul":
    case "div": {
      const [l, r] = [degreePair(node.left), degreePair(node.right)];
      return node.kind === "mul"
        ? { num: l.num + r.num, den: l.den + r.den }
        : { num: l.num + r.den, den: l.den + r.num };
    }
    case "add":
    case "sub": {
      // a/b ± c/d = (a·d ± c·b)/(b·d)
      const [l, r] = [degreePair(node.left), degreePair(node.right)];
      return { num: Math.max(l.num + r.den, r.num + l.den), den: l.den + r.den };
    }
  }
}

/**
 * Cheap upper bound on max(deg numerator, deg denominator) in s of an expression, without expanding it.
 * Example: exprDegreeBound(ast of "1/(tau*s^2 + s)") === 2; of "K*(s+2)/s" === 1.
 */
export function exprDegreeBound(ast: ExprNode): number {
  const { num, den } = degreePair(ast);
  return Math.max(num, den);
}
