import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { AlgebraError } from "@shared/algebra/errors";
import { polyConst, polyEquals, polyFromCoeffs, polyGcd, polyMul, polyParam, polyS, polyAdd, type Poly } from "@shared/algebra/poly";
import { polyToText } from "@shared/algebra/polytext";
import {
  ratAdd, ratConst, ratDegrees, ratDenominator, ratDiv, ratEquals, ratField, ratFromExpr, ratIsOne, ratIsZero, ratMul,
  ratNeg, ratNumerator, ratOne, ratReduceTracked, ratSub, ratToLatex, ratToText, ratZero, type RatFn,
} from "@shared/algebra/ratfn";
import { q, qDiv, qEquals } from "@shared/algebra/rational";
import type { ExprNode } from "@shared/expr/ast";
import {
  add, div, evalExpr, evalPoly, mul, neg, num, par, pow, randomPoint, ratExpr, s, sub, type Point,
} from "./support";

const K = par("K");
const a = par("a");
const b = par("b");
const tau = par("tau");
const text = (e: ExprNode): [string, string] => {
  const r = ratFromExpr(e);
  return [polyToText(ratNumerator(r)), polyToText(ratDenominator(r))];
};
const P = (...desc: number[]): Poly => polyFromCoeffs(desc.map((x) => q(x)));

describe("ratFromExpr: canonical lowest terms (common practice: monic numeric denominator, nothing in common)", () => {
  const table: [string, ExprNode, string, string][] = [
    ["1/(0.5*s + 1)", div(num(1), add(mul(num(1, 2), s), num(1))), "2", "s + 2"],
    ["K*(s+2)/(2*s)", div(mul(K, add(s, num(2))), mul(num(2), s)), "1/2*K*s + K", "s"],
    ["(s^2 - 1)/(s^2 + s)", div(sub(pow(s, 2), num(1)), add(pow(s, 2), s)), "s - 1", "s"],
    ["(2s + 4)/(4s^2 + 8s)", div(add(mul(num(2), s), num(4)), add(mul(num(4), pow(s, 2)), mul(num(8), s))), "1/2", "s"],
    ["K(s+a)/(K(s+a)(s+b))", div(mul(K, add(s, a)), mul(mul(K, add(s, a)), add(s, b))), "1", "s + b"],
    ["(tau s + 1)/(2 tau s^2 + 2s)", div(add(mul(tau, s), num(1)), add(mul(mul(num(2), tau), pow(s, 2)), mul(num(2), s))), "1/2", "s"],
    ["1/(tau s + 1)", div(num(1), add(mul(tau, s), num(1))), "1", "tau*s + 1"],
    ["1/(2 tau s + 4)", div(num(1), add(mul(mul(num(2), tau), s), num(4))), "1/2", "tau*s + 2"],
    ["(s+1)^3/(s+1)^2", div(pow(add(s, num(1)), 3), pow(add(s, num(1)), 2)), "s + 1", "1"],
    ["0*s/(s+1)", div(mul(num(0), s), add(s, num(1))), "0", "1"],
    ["-1/(-s - 1)", div(num(-1), sub(neg(s), num(1))), "1", "s + 1"],
    ["(K s + K)/(K^2 s + K^2)", div(add(mul(K, s), K), add(mul(pow(K, 2), s), pow(K, 2))), "1", "K"],
    ["(s^2 + (K+1)s + K)/(s + K)", div(add(add(pow(s, 2), mul(add(K, num(1)), s)), K), add(s, K)), "s + 1", "1"],
    ["(2K + 1)s^2 + tau s + 4", add(add(mul(add(mul(num(2), K), num(1)), pow(s, 2)), mul(tau, s)), num(4)), "(2*K + 1)*s^2 + tau*s + 4", "1"],
    ["s^2 + 3/2 s - K s + 1", add(sub(add(pow(s, 2), mul(num(3, 2), s)), mul(K, s)), num(1)), "s^2 - (K - 3/2)*s + 1", "1"],
    ["(s + 1/3)/(3s + 1)", div(add(s, num(1, 3)), add(mul(num(3), s), num(1))), "1/3", "1"],
    ["s^0", pow(s, 0), "1", "1"],
  ];
  it.each(table)("%s", (_label, e, n, d) => {
    expect(text(e)).toEqual([n, d]);
  });

  it("prints whole transfer functions as text and LaTeX (common practice)", () => {
    const r = ratFromExpr(div(mul(K, add(s, num(2))), add(mul(tau, pow(s, 2)), mul(num(3, 2), s))));
    expect(ratToText(r)).toBe("(K*s + 2*K)/(tau*s^2 + 3/2*s)");
    expect(ratToLatex(r)).toBe("\\frac{K\\,s + 2\\,K}{\\tau\\,s^{2} + \\frac{3}{2}\\,s}");
    expect(ratToText(ratFromExpr(div(K, s)))).toBe("K/s");
    expect(ratToText(ratFromExpr(num(-3, 4)))).toBe("-3/4");
    expect(ratToLatex(ratFromExpr(num(-3, 4)))).toBe("-\\frac{3}{4}");
  });
});

describe("Abramowitz & Stegun §29.3 Laplace pairs: transforms of the time-domain sums simplify to the table entry", () => {
  const ea = (x: ExprNode) => div(num(1), add(s, x)); // L{e^{-xt}} = 1/(s + x)
  const sinT = div(a, add(pow(s, 2), pow(a, 2))); // L{sin at}
  const cosT = div(s, add(pow(s, 2), pow(a, 2))); // L{cos at}
  const table: [string, ExprNode, string, string][] = [
    ["(e^-at − e^-bt)/(b − a) ↔ 1/((s+a)(s+b))", mul(div(num(1), sub(b, a)), sub(ea(a), ea(b))), "1", "s^2 + (a + b)*s + a*b"],
    ["(a e^-at − b e^-bt)/(a − b) ↔ s/((s+a)(s+b))", mul(div(num(1), sub(a, b)), sub(mul(a, ea(a)), mul(b, ea(b)))), "s", "s^2 + (a + b)*s + a*b"],
    ["sinh(at)/a ↔ 1/(s^2 − a^2)", mul(div(num(1), mul(num(2), a)), sub(ea(neg(a)), ea(a))), "1", "s^2 - a^2"],
    ["cosh(at) ↔ s/(s^2 − a^2)", mul(num(1, 2), add(ea(neg(a)), ea(a))), "s", "s^2 - a^2"],
    ["(1 − cos at)/a^2 ↔ 1/(s(s^2 + a^2))", div(sub(div(num(1), s), cosT), pow(a, 2)), "1", "s^3 + a^2*s"],
    ["(at − sin at)/a^3 ↔ 1/(s^2(s^2 + a^2))", div(sub(div(a, pow(s, 2)), sinT), pow(a, 3)), "1", "s^4 + a^2*s^2"],
    [
      "(sin at − at cos at)/(2a^3) ↔ 1/(s^2 + a^2)^2, with L{t cos at} = (s^2 − a^2)/(s^2 + a^2)^2",
      div(sub(sinT, mul(a, div(sub(pow(s, 2), pow(a, 2)), pow(add(pow(s, 2), pow(a, 2)), 2)))), mul(num(2), pow(a, 3))),
      "1",
      "s^4 + 2*a^2*s^2 + a^4",
    ],
    ["e^-at sin bt ↔ b/((s + a)^2 + b^2)", div(b, add(pow(add(s, a), 2), pow(b, 2))), "b", "s^2 + 2*a*s + a^2 + b^2"],
    ["(e^-t − e^-2t) ↔ 1/((s+1)(s+2))", sub(ea(num(1)), ea(num(2))), "1", "s^2 + 3*s + 2"],
  ];
  it.each(table)("%s", (_label, e, n, d) => {
    expect(text(e)).toEqual([n, d]);
  });
});

describe("closed loops through ratField", () => {
  const f = ratField;
  const loop = (g: RatFn, h: RatFn) => f.div(g, f.add(f.one, f.mul(g, h)));

  it("unity feedback around K/(s(s+1)) is K/(s^2 + s + K) (from memory: Ogata, Modern Control Engineering, second-order servo)", () => {
    const t = loop(ratFromExpr(div(K, mul(s, add(s, num(1))))), f.one);
    expect(ratToText(t)).toBe("K/(s^2 + s + K)");
  });

  it("tachometer minor loop: K/(s^2 + (2 + k_t)s + K) (from memory: Dorf & Bishop, Modern Control Systems, velocity feedback)", () => {
    const inner = loop(ratFromExpr(div(num(1), mul(s, add(s, num(2))))), ratFromExpr(mul(par("k_t"), s)));
    const t = loop(f.mul(ratFromExpr(K), inner), f.one);
    expect(ratToText(t)).toBe("K/(s^2 + (k_t + 2)*s + K)");
  });

  it("spindle loop r→y is K(s+2)/(tau s^3 + s^2 + K s/2 + K) (worked by hand: G/(1 + G·H), common practice)", () => {
    const g = f.mul(ratFromExpr(div(mul(K, add(s, num(2))), s)), ratFromExpr(div(num(1), add(mul(tau, pow(s, 2)), s))));
    const t = loop(g, ratConst(q(1, 2)));
    expect(ratToText(t)).toBe("(K*s + 2*K)/(tau*s^3 + s^2 + 1/2*K*s + K)");
    expect(ratDegrees(t)).toEqual({ num: 1, den: 3 });
  });
});

describe("errors", () => {
  const codeOf = (run: () => unknown): string | undefined => {
    try {
      run();
    } catch (e) {
      return e instanceof AlgebraError ? e.code : "not an AlgebraError";
    }
    return undefined;
  };
  it("division by an identically zero divisor has code division-by-zero (common practice)", () => {
    expect(codeOf(() => ratFromExpr(div(num(1), sub(s, s))))).toBe("division-by-zero");
    expect(codeOf(() => ratFromExpr(div(s, mul(K, sub(tau, tau)))))).toBe("division-by-zero");
    expect(codeOf(() => ratDiv(ratOne, ratZero))).toBe("division-by-zero");
    expect(codeOf(() => ratField.div(ratOne, ratZero))).toBe("division-by-zero");
  });
  it("a result of degree > 1000 in s is refused with code degree-limit", () => {
    expect(codeOf(() => ratFromExpr(pow(add(s, num(1)), 1001)))).toBe("degree-limit");
    expect(codeOf(() => ratFromExpr(div(num(1), pow(s, 1001))))).toBe("degree-limit");
    const big = ratFromExpr(div(num(1), pow(add(s, num(1)), 600)));
    expect(codeOf(() => ratMul(big, big))).toBe("degree-limit");
    expect(codeOf(() => ratAdd(big, ratFromExpr(div(num(1), pow(add(s, num(2)), 600)))))).toBe("degree-limit");
    expect(codeOf(() => ratFromExpr(pow(s, 1000)))).toBeUndefined();
  });
});

describe("ratReduceTracked reports what cancels (factors checked by hand, common practice)", () => {
  const cases: [string, Poly, Poly, string, string[]][] = [
    ["(s^2 − 1)/(s^2 + s)", P(1, 0, -1), P(1, 1, 0), "(s - 1)/s", ["s + 1"]],
    ["(s+1)^2(s−1) / ((s+1)^2(s+2))", polyMul(P(1, 2, 1), P(1, -1)), polyMul(P(1, 2, 1), P(1, 2)), "(s - 1)/(s + 2)", ["s + 1", "s + 1"]],
    ["(2s+1)(s−3)(s^2+2s+5)s / ((2s+1)(s−3)(s^2+2s+5)(s+4))", polyMul(polyMul(P(2, -5, -3), P(1, 2, 5)), P(1, 0)), polyMul(polyMul(P(2, -5, -3), P(1, 2, 5)), P(1, 4)), "s/(s + 4)", ["s - 3", "s + 1/2", "s^2 + 2*s + 5"]],
    ["(s^2 − 2)(s+1)/((s^2 − 2)(s+3)): irrational roots stay one factor", polyMul(P(1, 0, -2), P(1, 1)), polyMul(P(1, 0, -2), P(1, 3)), "(s + 1)/(s + 3)", ["s^2 - 2"]],
    ["K(s+a)/(K(s+a)s)", polyMul(polyParam("K"), polyAdd(polyS(), polyParam("a"))), polyMul(polyMul(polyParam("K"), polyAdd(polyS(), polyParam("a"))), polyS()), "1/s", ["K", "s + a"]],
    ["6/(4s): only a number cancels", polyConst(q(6)), P(4, 0), "(3/2)/s", []],
    ["0/(s+1): a zero numerator cancels the denominator", polyConst(q(0)), P(1, 1), "0", ["s + 1"]],
  ];
  it.each(cases)("%s", (_label, n, d, value, cancelled) => {
    const r = ratReduceTracked(n, d);
    expect(ratToText(r.value)).toBe(value);
    expect(r.cancelled.map(polyToText).sort()).toEqual([...cancelled].sort());
  });
});

describe("algebraic laws (fast-check, common practice: field axioms; values checked against direct evaluation of the tree)", () => {
  const rat = (symbolic: boolean) =>
    ratExpr(symbolic)
      .map((e) => {
        try {
          return { e, r: ratFromExpr(e) };
        } catch (err) {
          if (err instanceof AlgebraError && err.code === "division-by-zero") return null;
          throw err;
        }
      })
      .filter((x): x is { e: ExprNode; r: RatFn } => x !== null);

  const valueAt = (r: RatFn, at: Point) => {
    const d = evalPoly(ratDenominator(r), at);
    return d.n === 0n ? null : qDiv(evalPoly(ratNumerator(r), at), d);
  };
  const exprAt = (e: ExprNode, at: Point) => {
    try {
      return evalExpr(e, at);
    } catch {
      return null; // a divisor vanishes at this point
    }
  };

  for (const symbolic of [false, true]) {
    const kind = symbolic ? "with parameters" : "numeric";
    it(`value equals direct exact evaluation of the tree (${kind})`, () => {
      fc.assert(
        fc.property(rat(symbolic), randomPoint(symbolic), ({ e, r }, at) => {
          const want = exprAt(e, at);
          const got = valueAt(r, at);
          fc.pre(want !== null && got !== null);
          expect(qEquals(got!, want!)).toBe(true);
        }),
        { numRuns: 300 },
      );
    });

    it(`lowest terms and canonical denominator (${kind})`, () => {
      fc.assert(
        fc.property(rat(symbolic), ({ r }) => {
          if (ratIsZero(r)) return;
          expect(polyEquals(polyGcd(ratNumerator(r), ratDenominator(r)), polyConst(q(1)))).toBe(true);
          const d = ratDenominator(r);
          expect(polyEquals(d, { q: q(1, leadNumeric(d.z)), z: d.z })).toBe(true);
        }),
        { numRuns: 300 },
      );
    });

    it(`equal values print identically, however they were built (${kind})`, () => {
      fc.assert(
        fc.property(rat(symbolic), rat(symbolic), ({ e, r }, { e: c, r: rc }) => {
          fc.pre(!ratIsZero(rc));
          const detour = ratFromExpr(div(mul(e, c), c));
          expect(ratToText(detour)).toBe(ratToText(r));
          expect(ratEquals(ratSub(ratAdd(r, rc), rc), r)).toBe(true);
        }),
        { numRuns: 200 },
      );
    });

    it(`field axioms (${kind})`, () => {
      fc.assert(
        fc.property(rat(symbolic), rat(symbolic), rat(symbolic), ({ r: x }, { r: y }, { r: z }) => {
          expect(ratEquals(ratAdd(x, y), ratAdd(y, x))).toBe(true);
          expect(ratEquals(ratMul(x, y), ratMul(y, x))).toBe(true);
          expect(ratEquals(ratAdd(ratAdd(x, y), z), ratAdd(x, ratAdd(y, z)))).toBe(true);
          expect(ratEquals(ratMul(ratMul(x, y), z), ratMul(x, ratMul(y, z)))).toBe(true);
          expect(ratEquals(ratMul(x, ratAdd(y, z)), ratAdd(ratMul(x, y), ratMul(x, z)))).toBe(true);
          expect(ratEquals(ratAdd(x, ratZero), x)).toBe(true);
          expect(ratEquals(ratMul(x, ratOne), x)).toBe(true);
          expect(ratIsZero(ratAdd(x, ratNeg(x)))).toBe(true);
          if (!ratIsZero(x) && !ratIsZero(y)) {
            expect(ratIsOne(ratMul(ratDiv(x, y), ratDiv(y, x)))).toBe(true);
            expect(ratEquals(ratMul(ratDiv(z, x), x), z)).toBe(true);
          }
        }),
        { numRuns: 200 },
      );
    });
  }
});

function leadNumeric(z: Poly["z"]): bigint {
  while (typeof z !== "bigint") z = z.c[z.c.length - 1];
  return z;
}
