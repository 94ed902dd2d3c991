import { describe, expect, it } from "vitest";
import { AlgebraError } from "@shared/algebra/errors";
import { polyAdd, polyConst, polyEvaluateAt, polyFromCoeffs, polyMul, polyParam, polyS } from "@shared/algebra/poly";
import { polyParamRoots, polyRoots } from "@shared/algebra/roots";
import { q } from "@shared/algebra/rational";
import { close, runPython } from "./support";

type Root = [number, number];
const sortRoots = (r: Root[]) => r.slice().sort((x, y) => x[0] - y[0] || x[1] - y[1]);

/** Greedy matching: every expected root has a distinct computed root within tolerance. */
function sameRoots(got: Root[], want: Root[], rtol: number, atol = 1e-12): boolean {
  if (got.length !== want.length) return false;
  const left = got.slice();
  return want.every(([re, im]) => {
    const i = left.findIndex(([a, b]) => close(Math.hypot(a - re, b - im), 0, 0, rtol * Math.max(1, Math.hypot(re, im)) + atol));
    if (i < 0) return false;
    left.splice(i, 1);
    return true;
  });
}

/**
 * Exact Π (s² − 2a s + a² + b²) over given conjugate pairs a ± bi (a, b in thousandths), converted to floats
 * only at the end, so the test measures the root finder rather than rounding in the expansion.
 */
function fromPairs(pairs: [number, number][]): number[] {
  let p = polyConst(q(1));
  for (const [a, b] of pairs) p = polyMul(p, polyFromCoeffs([q(1), q(-2 * a, 1000), q(a * a + b * b, 1_000_000)]));
  return polyEvaluateAt(p, {});
}

describe("polyRoots", () => {
  it("small cases in closed form (common practice)", () => {
    expect(polyRoots([1, 0, 1])).toEqual([[0, -1], [0, 1]]);
    expect(polyRoots([2, -1])).toEqual([[0.5, 0]]);
    expect(polyRoots([5])).toEqual([]);
    expect(polyRoots([0, 0, 1, 3, 0, 0])).toEqual([[-3, 0], [0, 0], [0, 0]]);
    expect(sameRoots(polyRoots([1, -6, 11, -6]), [[1, 0], [2, 0], [3, 0]], 1e-14)).toBe(true);
  });

  it("zeros of the Chebyshev polynomial T_n are cos((2m−1)π/(2n)) (Abramowitz & Stegun 22.16.1, recurrence 22.7.4)", () => {
    for (const n of [5, 12, 20]) {
      let [t0, t1] = [[1], [1, 0]];
      for (let k = 1; k < n; k++) [t0, t1] = [t1, [...t1.map((c) => 2 * c), 0].map((c, i) => c - (t0[i - 2] ?? 0))];
      const want: Root[] = Array.from({ length: n }, (_, m) => [Math.cos(((2 * m + 1) * Math.PI) / (2 * n)), 0]);
      expect(sameRoots(polyRoots(t1), want, 1e-9)).toBe(true);
    }
  });

  it("degree 100: the 100th roots of unity, and 100 roots spread over an annulus, given by construction (common practice)", () => {
    const unity: Root[] = Array.from({ length: 100 }, (_, k) => [Math.cos((2 * Math.PI * k) / 100), Math.sin((2 * Math.PI * k) / 100)]);
    expect(sameRoots(polyRoots([1, ...new Array(99).fill(0), -1]), unity, 1e-12)).toBe(true);
    for (const [lo, span] of [[0.6, 0.4], [0.5, 3]]) {
      const pairs: [number, number][] = Array.from({ length: 50 }, (_, k) => {
        const r = lo + (span * ((k * 37) % 50)) / 50;
        const t = (Math.PI * (k + 0.5)) / 50;
        return [Math.round(1000 * r * Math.cos(t)), Math.round(1000 * r * Math.sin(t))];
      });
      const want = pairs.flatMap(([a, b]): Root[] => [[a / 1000, b / 1000], [a / 1000, -b / 1000]]);
      expect(sameRoots(polyRoots(fromPairs(pairs)), want, 1e-12)).toBe(true);
    }
  });

  it("agrees with Debian sympy's nroots on random integer polynomials up to degree 60 (python3-sympy)", () => {
    const polys = Array.from({ length: 8 }, (_, k) =>
      Array.from({ length: 8 * k + 4 }, (_, i) => (((i + 3) * (k + 11) * 7919) % 41) - 20 || 1),
    );
    const program = [
      "import sys, json, sympy",
      "s = sympy.Symbol('s')",
      "out = []",
      "for c in json.load(sys.stdin):",
      "    p = sympy.Poly(c, s)",
      "    out.append([[float(sympy.re(r)), float(sympy.im(r))] for r in p.nroots(n=30, maxsteps=500)])",
      "print(json.dumps(out))",
    ].join("\n");
    const want = runPython<Root[][]>(program, polys);
    polys.forEach((c, i) => expect(sameRoots(sortRoots(polyRoots(c)), want[i], 1e-8)).toBe(true));
  });
});

describe("polyParamRoots", () => {
  it("real roots in one parameter (common practice)", () => {
    const K = polyParam("K");
    const p = polyAdd(polyMul(K, K), polyConst(q(-2))); // K^2 − 2
    const r = polyParamRoots(p);
    expect(r.name).toBe("K");
    expect(sameRoots(r.roots.map((x) => [x, 0]), [[-Math.SQRT2, 0], [Math.SQRT2, 0]], 1e-14)).toBe(true);
    expect(polyParamRoots(polyAdd(polyMul(K, K), polyConst(q(1)))).roots).toEqual([]); // K^2 + 1: none real
    expect(polyParamRoots(polyConst(q(3))).roots).toEqual([]);
  });
  it("refuses s or two parameters with code not-univariate", () => {
    for (const p of [polyS(), polyMul(polyParam("K"), polyParam("tau"))]) {
      try {
        polyParamRoots(p);
        expect.unreachable();
      } catch (e) {
        expect((e as AlgebraError).code).toBe("not-univariate");
      }
    }
  });
});
