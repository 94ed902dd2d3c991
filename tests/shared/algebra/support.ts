// Test support for the exact algebra: hand-built expression trees, an independent exact evaluator,
// the one float-comparison helper, random expressions for fast-check, and the Debian sympy runner.
import fc from "fast-check";
import type { Poly } from "@shared/algebra/poly";
import { q, qAdd, qDiv, qMul, qNeg, qPow, qSub, type Q } from "@shared/algebra/rational";
import type { ZPoly } from "@shared/algebra/zpoly";
import type { ExprNode } from "@shared/expr/ast";
import { runPythonSync } from "../../support/python";
import { printForCas, type CasSyntax } from "../../support/exprText";

export const num = (n: number, d = 1): ExprNode => {
  const r = q(n, d);
  return { kind: "num", num: r.n, den: r.d };
};
export const s: ExprNode = { kind: "s" };
export const par = (name: string): ExprNode => ({ kind: "param", name });
export const add = (l: ExprNode, r: ExprNode): ExprNode => ({ kind: "add", left: l, right: r });
export const sub = (l: ExprNode, r: ExprNode): ExprNode => ({ kind: "sub", left: l, right: r });
export const mul = (l: ExprNode, r: ExprNode): ExprNode => ({ kind: "mul", left: l, right: r });
export const div = (l: ExprNode, r: ExprNode): ExprNode => ({ kind: "div", left: l, right: r });
export const neg = (a: ExprNode): ExprNode => ({ kind: "neg", arg: a });
export const pow = (b: ExprNode, e: number): ExprNode => ({ kind: "pow", base: b, exp: e });

/** |a − b| ≤ rtol·max(|a|, |b|) + atol: the one approximate-equality rule for floats in these tests. */
export const close = (a: number, b: number, rtol = 1e-9, atol = 0): boolean =>
  Math.abs(a - b) <= rtol * Math.max(Math.abs(a), Math.abs(b)) + atol;

export type Point = Record<string, Q>; // "s" and every parameter

/** Exact value of an expression tree at a point, straight from the tree (independent of the algebra). */
export function evalExpr(e: ExprNode, at: Point): Q {
  switch (e.kind) {
    case "num":
      return q(e.num, e.den);
    case "s":
      return at.s;
    case "param":
      return at[e.name];
    case "add":
      return qAdd(evalExpr(e.left, at), evalExpr(e.right, at));
    case "sub":
      return qSub(evalExpr(e.left, at), evalExpr(e.right, at));
    case "mul":
      return qMul(evalExpr(e.left, at), evalExpr(e.right, at));
    case "div":
      return qDiv(evalExpr(e.left, at), evalExpr(e.right, at));
    case "neg":
      return qNeg(evalExpr(e.arg, at));
    case "pow":
      return qPow(evalExpr(e.base, at), e.exp);
  }
}

/** Exact value of a polynomial at a point, read from its documented q·z representation. */
export function evalPoly(p: Poly, at: Point): Q {
  const walk = (z: ZPoly): Q => {
    if (typeof z === "bigint") return q(z);
    let acc = q(0);
    for (let i = z.c.length - 1; i >= 0; i--) acc = qAdd(qMul(acc, at[z.v]), walk(z.c[i]));
    return acc;
  };
  return qMul(p.q, walk(p.z));
}

export const PARAMS = ["K", "a", "tau"];

const smallQ = fc.tuple(fc.integer({ min: -6, max: 6 }), fc.integer({ min: 1, max: 4 })).map(([n, d]) => num(n, d));

/** A polynomial expression: a sum of 1–4 monomials c·s^i·K^j·a^k·tau^l (parameters only if `symbolic`). */
export const polyExpr = (symbolic: boolean, maxS = 3): fc.Arbitrary<ExprNode> =>
  fc
    .array(
      fc.tuple(
        smallQ,
        fc.integer({ min: 0, max: maxS }),
        fc.array(fc.integer({ min: 0, max: symbolic ? 2 : 0 }), { minLength: 3, maxLength: 3 }),
      ),
      { minLength: 1, maxLength: 4 },
    )
    .map((terms) =>
      terms
        .map(([c, i, ps]) => ps.reduce((t, e, k) => (e ? mul(t, pow(par(PARAMS[k]), e)) : t), mul(c, pow(s, i))))
        .reduce((x, y) => add(x, y)),
    );

/** A rational expression (P·C)/(Q·C) whose parts often share the factor C; the caller drops zero divisors. */
export const ratExpr = (symbolic: boolean): fc.Arbitrary<ExprNode> =>
  fc
    .tuple(polyExpr(symbolic), polyExpr(symbolic), fc.option(polyExpr(symbolic, 2), { nil: undefined }))
    .map(([p, d, c]) => (c ? div(mul(p, c), mul(d, c)) : div(p, d)));

export const randomPoint = (symbolic: boolean): fc.Arbitrary<Point> =>
  fc
    .array(fc.tuple(fc.integer({ min: -50, max: 50 }), fc.integer({ min: 1, max: 9 })), { minLength: 4, maxLength: 4 })
    .map((v) => {
      const pt: Point = { s: q(v[0][0] * 7 + 3, v[0][1] * 11) };
      PARAMS.forEach((name, i) => (pt[name] = symbolic ? q(v[i + 1][0], v[i + 1][1]) : q(1)));
      return pt;
    });

/** Runs a Python program under Debian's python3 with JSON on stdin; a missing sympy FAILS the test with a hint. */
export const runPython = <T>(program: string, input: unknown, timeoutMs = 60_000): T =>
  runPythonSync<T>({ code: program }, input, timeoutMs);

const SYMPY: CasSyntax = { number: (n, d) => `Rational(${n}, ${d})`, spacing: " ", power: "**" };

/** Fully parenthesised text of a tree in Python syntax, for the sympy reference. */
export const exprPython = (e: ExprNode): string => printForCas(e, SYMPY);
