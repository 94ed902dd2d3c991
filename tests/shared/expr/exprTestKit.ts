import type { ExprNode } from "@shared/expr/ast";

/** Test-only readers of ExprNode: a printed prefix form, float evaluation and exact evaluation. */

const OPS = { add: "+", sub: "-", mul: "*", div: "/" } as const;

/** Fully parenthesised prefix form, e.g. "(/ (* K (+ s 2)) s)"; numbers as p or p/q. */
export function showExpr(node: ExprNode): string {
  switch (node.kind) {
    case "num":
      return node.den === 1n ? `${node.num}` : `${node.num}/${node.den}`;
    case "s":
      return "s";
    case "param":
      return node.name;
    case "neg":
      return `(neg ${showExpr(node.arg)})`;
    case "pow":
      return `(^ ${showExpr(node.base)} ${node.exp})`;
    default:
      return `(${OPS[node.kind]} ${showExpr(node.left)} ${showExpr(node.right)})`;
  }
}

/** Float value at a real s with parameter values. */
export function evalExpr(node: ExprNode, s: number, params: Record<string, number> = {}): number {
  const go = (n: ExprNode): number => {
    switch (n.kind) {
      case "num":
        return Number(n.num) / Number(n.den);
      case "s":
        return s;
      case "param":
        return params[n.name];
      case "neg":
        return -go(n.arg);
      case "pow":
        return go(n.base) ** n.exp;
      case "add":
        return go(n.left) + go(n.right);
      case "sub":
        return go(n.left) - go(n.right);
      case "mul":
        return go(n.left) * go(n.right);
      case "div":
        return go(n.left) / go(n.right);
    }
  };
  return go(node);
}

type Q = [bigint, bigint];
const gcd = (a: bigint, b: bigint): bigint => (b === 0n ? (a < 0n ? -a : a) : gcd(b, a % b));
const norm = ([p, q]: Q): Q => {
  if (q === 0n) throw new RangeError("division by zero");
  const g = gcd(p, q) * (q < 0n ? -1n : 1n);
  return [p / g, q / g];
};

/** Exact value "p/q" at a rational s with rational parameters (all given as [p, q]). */
export function evalExact(node: ExprNode, s: Q, params: Record<string, Q> = {}): string {
  const go = (n: ExprNode): Q => {
    switch (n.kind) {
      case "num":
        return [n.num, n.den];
      case "s":
        return s;
      case "param":
        return params[n.name];
      case "neg": {
        const [p, q] = go(n.arg);
        return [-p, q];
      }
      case "pow": {
        const [p, q] = go(n.base);
        return norm([p ** BigInt(n.exp), q ** BigInt(n.exp)]);
      }
      default: {
        const [[a, b], [c, d]] = [go(n.left), go(n.right)];
        if (n.kind === "add") return norm([a * d + c * b, b * d]);
        if (n.kind === "sub") return norm([a * d - c * b, b * d]);
        if (n.kind === "mul") return norm([a * c, b * d]);
        return norm([a * d, b * c]);
      }
    }
  };
  const [p, q] = go(node);
  return q === 1n ? `${p}` : `${p}/${q}`;
}
