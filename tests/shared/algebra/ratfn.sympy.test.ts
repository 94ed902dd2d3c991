import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { AlgebraError } from "@shared/algebra/errors";
import { polyGcd, polyMul } from "@shared/algebra/poly";
import { polyToText } from "@shared/algebra/polytext";
import { ratDegrees, ratDenominator, ratFromExpr, ratNumerator } from "@shared/algebra/ratfn";
import { exprPython, polyExpr, ratExpr, runPython } from "./support";

// Live comparison with Debian's python3-sympy (sympy.cancel, sympy.gcd), by value, not by string.
const PROGRAM = String.raw`
import sys, json, sympy
from sympy import Rational
syms = {n: sympy.Symbol(n) for n in ["s", "K", "a", "tau"]}
s = syms["s"]
env = dict(syms, Rational=Rational)
out = {"rat": [], "gcd": []}
req = json.load(sys.stdin)
for c in req["rat"]:
    e = eval(c["expr"], env)
    n, d = sympy.fraction(sympy.cancel(sympy.together(e)))
    N = sympy.sympify(c["num"], locals=syms)
    D = sympy.sympify(c["den"], locals=syms)
    out["rat"].append({
        "agrees": bool(sympy.expand(N * d - D * n) == 0),
        "lowest": len(sympy.gcd(N, D).free_symbols) == 0,
        "degrees": [int(sympy.degree(n, s)) if n != 0 else -1, int(sympy.degree(d, s))],
    })
for c in req["gcd"]:
    A = eval(c["a"], env)
    B = eval(c["b"], env)
    G = sympy.sympify(c["ours"], locals=syms)
    ratio = sympy.cancel(G / sympy.gcd(sympy.expand(A), sympy.expand(B)))
    out["gcd"].append(len(ratio.free_symbols) == 0)
print(json.dumps(out))
`;

const usable = (e: Parameters<typeof ratFromExpr>[0]) => {
  try {
    ratFromExpr(e);
    return true;
  } catch (err) {
    if (err instanceof AlgebraError && err.code === "division-by-zero") return false;
    throw err;
  }
};

describe("agreement with sympy (Debian python3-sympy: sympy.cancel, sympy.gcd)", () => {
  it("30 random rational functions (half with parameters K, a, tau) and 20 gcds", () => {
    const exprs = [
      ...fc.sample(ratExpr(false).filter(usable), { numRuns: 15, seed: 7 }),
      ...fc.sample(ratExpr(true).filter(usable), { numRuns: 15, seed: 11 }),
    ];
    const rat = exprs.map((e) => {
      const r = ratFromExpr(e);
      return { expr: exprPython(e), num: polyToText(ratNumerator(r)), den: polyToText(ratDenominator(r)), deg: ratDegrees(r) };
    });
    const pairs = fc.sample(fc.tuple(polyExpr(true), polyExpr(true), polyExpr(true, 2)), { numRuns: 20, seed: 5 });
    const gcd = pairs.map(([a, b, c]) => {
      const [x, y] = [a, b].map((p) => polyMul(ratNumerator(ratFromExpr(p)), ratNumerator(ratFromExpr(c))));
      return { a: `(${exprPython(a)})*(${exprPython(c)})`, b: `(${exprPython(b)})*(${exprPython(c)})`, ours: polyToText(polyGcd(x, y)) };
    });
    const res = runPython<{ rat: { agrees: boolean; lowest: boolean; degrees: [number, number] }[]; gcd: boolean[] }>(
      PROGRAM,
      { rat, gcd },
    );
    res.rat.forEach((r, i) => {
      const ctx = `${rat[i].expr} → (${rat[i].num})/(${rat[i].den})`;
      expect(r.agrees, `value differs from sympy.cancel: ${ctx}`).toBe(true);
      expect(r.lowest, `not in lowest terms per sympy.gcd: ${ctx}`).toBe(true);
      expect([rat[i].deg.num, rat[i].deg.den], ctx).toEqual(r.degrees);
    });
    res.gcd.forEach((ok, i) => expect(ok, `gcd differs from sympy.gcd: ${gcd[i].a}, ${gcd[i].b} → ${gcd[i].ours}`).toBe(true));
    expect(res.rat.length).toBe(30);
  });
});
