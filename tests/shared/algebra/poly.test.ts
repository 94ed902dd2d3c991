import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { AlgebraError } from "@shared/algebra/errors";
import {
  polyAtInfinityRatio, polyConst, polyDegree, polyEquals, polyEvaluateAt, polyFromCoeffs, polyGcd, polyIsZero,
  polyLeading, polyMul, polyParam, polyParams, polyS, polySub, polyAdd, type Poly,
} from "@shared/algebra/poly";
import { polyToText } from "@shared/algebra/polytext";
import { ratDenominator, ratFromExpr, ratNumerator, ratReduceTracked } from "@shared/algebra/ratfn";
import { q, qDiv, qEquals, qMul, qSub, qZero, type Q } from "@shared/algebra/rational";
import { close, polyExpr } from "./support";

const P = (...desc: number[]) => polyFromCoeffs(desc.map((x) => q(x)));
const asPoly = (symbolic: boolean, maxS = 3) => polyExpr(symbolic, maxS).map((e) => ratNumerator(ratFromExpr(e)));

/** True when b divides a: a/b in lowest terms has denominator 1. */
const divides = (b: Poly, a: Poly) => polyDegree(ratDenominator(ratReduceTracked(a, b).value)) === 0;

/** Textbook Euclid over Q on dense numeric coefficient lists (descending), made monic: an independent gcd. */
function euclidGcd(a: Q[], b: Q[]): Q[] {
  const trim = (x: Q[]) => {
    while (x.length && x[0].n === 0n) x = x.slice(1);
    return x;
  };
  let [x, y] = [trim(a), trim(b)];
  while (y.length) {
    let r = x.slice();
    while (r.length >= y.length) {
      const f = qDiv(r[0], y[0]);
      r = trim(r.map((c, i) => (i < y.length ? qSub(c, qMul(f, y[i])) : c)).slice(1));
    }
    [x, y] = [y, r];
  }
  return x.map((c) => qDiv(c, x[0]));
}
/** Exact coefficients (descending) of a numeric polynomial, read from its documented q·z form. */
function coeffsDesc(p: Poly): Q[] {
  const z = p.z;
  const asc = typeof z === "bigint" ? [z] : (z.c as bigint[]);
  return asc.map((c) => qMul(p.q, q(c))).reverse();
}

describe("polynomial gcd", () => {
  it("hand-checked gcds (common practice)", () => {
    expect(polyToText(polyGcd(P(1, 0, -1), P(2, 2)))).toBe("s + 1");
    expect(polyToText(polyGcd(P(6, 12), P(4, 8)))).toBe("s + 2");
    expect(polyToText(polyGcd(P(1, 1), P(1, 2)))).toBe("1");
    expect(polyToText(polyGcd(polyConst(qZero), P(3, 1)))).toBe("s + 1/3");
    const K = polyParam("K");
    const sK = polyAdd(polyS(), K);
    expect(polyToText(polyGcd(polyMul(polyMul(K, sK), P(1, 1)), polyMul(polyMul(K, K), sK)))).toBe("K*s + K^2");
  });

  it("agrees with textbook Euclid over Q (monic gcd) on numeric polynomials (fast-check, common practice)", () => {
    fc.assert(
      fc.property(asPoly(false), asPoly(false), asPoly(false, 2), (a, b, c) => {
        const [x, y] = [polyMul(a, c), polyMul(b, c)];
        fc.pre(!polyIsZero(x) && !polyIsZero(y));
        const want = euclidGcd(coeffsDesc(x), coeffsDesc(y));
        const got = coeffsDesc(polyGcd(x, y));
        expect(got.length).toBe(want.length);
        got.forEach((g, i) => expect(qEquals(g, want[i])).toBe(true));
      }),
      { numRuns: 300 },
    );
  });

  it("divides both inputs and is divisible by every planted common factor (fast-check, with parameters)", () => {
    fc.assert(
      fc.property(asPoly(true), asPoly(true), asPoly(true, 2), (a, b, c) => {
        const [x, y] = [polyMul(a, c), polyMul(b, c)];
        fc.pre(!polyIsZero(x) && !polyIsZero(y));
        const g = polyGcd(x, y);
        expect(divides(g, x) && divides(g, y)).toBe(true);
        expect(divides(c, g)).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it("large integer polynomials: a planted degree-40 factor is found exactly (common practice)", () => {
    const rnd = (n: number, seed: number) =>
      P(...Array.from({ length: n + 1 }, (_, i) => ((i * 7919 + seed * 104729) % 2001) - 1000 || 1));
    const f = rnd(40, 1);
    const g = polyGcd(polyMul(f, rnd(60, 2)), polyMul(f, rnd(60, 3)));
    expect(divides(f, g) && divides(g, f)).toBe(true);
  });
});

describe("polynomial helpers", () => {
  const K = polyParam("K");
  it("degrees, leading coefficients, parameters (common practice)", () => {
    const p = polyAdd(polyMul(polyMul(K, polyConst(q(2))), polyMul(polyS(), polyS())), polyConst(q(1)));
    expect(polyDegree(p)).toBe(2);
    expect(polyDegree(polyConst(qZero))).toBe(-1);
    expect(polyToText(polyLeading(p))).toBe("2*K");
    expect(polyParams(polyMul(p, polyParam("tau")))).toEqual(["K", "tau"]);
    expect(polyEquals(polySub(p, p), polyConst(qZero))).toBe(true);
  });

  it("limit at infinity of num/den (common practice: compare degrees)", () => {
    expect(polyAtInfinityRatio(P(1, 0), P(1, 0, 1))).toBe("zero");
    expect(polyAtInfinityRatio(P(3, 1), P(1, 7))).toBe("finite-nonzero");
    expect(polyAtInfinityRatio(P(1, 0, 0), P(1, 7))).toBe("infinite");
    expect(polyAtInfinityRatio(polyMul(K, polyS()), P(1, 7))).toBe("finite-nonzero");
    expect(() => polyAtInfinityRatio(P(1), polyConst(qZero))).toThrow(AlgebraError);
  });

  it("numeric coefficients at nominal values, descending (common practice)", () => {
    const p = polyAdd(polyMul(K, polyS()), polyConst(q(1, 3)));
    const v = polyEvaluateAt(p, { K: 2.5 });
    expect(v.length).toBe(2);
    expect(close(v[0], 2.5) && close(v[1], 1 / 3)).toBe(true);
    expect(polyEvaluateAt(polyConst(qZero), {})).toEqual([0]);
    try {
      polyEvaluateAt(p, {});
      expect.unreachable();
    } catch (e) {
      expect((e as AlgebraError).code).toBe("missing-parameter");
      expect((e as AlgebraError).subject).toBe("K");
    }
    const huge = polyFromCoeffs([q(10n ** 400n, 3n * 10n ** 399n), q(1)]);
    expect(close(polyEvaluateAt(huge, {})[0], 10 / 3, 1e-15)).toBe(true);
  });

  it("evaluation commutes with multiplication: p(1)·r(1) = (p·r)(1) (fast-check, common practice)", () => {
    fc.assert(
      fc.property(asPoly(true), asPoly(true), (a, b) => {
        const at = { K: 2, a: -3, tau: 0.5 };
        const sumAt = (p: Poly) => polyEvaluateAt(p, at).reduce((t, x) => t + x, 0); // value at s = 1
        expect(close(sumAt(polyMul(a, b)), sumAt(a) * sumAt(b), 1e-9, 1e-9)).toBe(true);
      }),
      { numRuns: 200 },
    );
  });
});
