import { describe, expect, it } from "vitest";
import { q } from "@shared/algebra/rational";
import { AnalysisError } from "@shared/analysis/errors";
import { exactFactors } from "@shared/analysis/factors";
import { dominantPoles, flatRoots, rootsOf } from "@shared/analysis/poles";
import { upFrom, upInts, upMul, upSub, upText, type UPoly } from "@shared/analysis/upoly";

const product = (...ps: number[][]): UPoly => ps.map((p) => upInts(p)).reduce(upMul);

describe("poles and zeros", () => {
  it("exact multiplicities from the square-free factorisation: (s + 1)^3 (s^2 + 2)^2 (s − 3) (common practice: multiplicity by construction)", () => {
    const p = product([1, 1], [1, 1], [1, 1], [2, 0, 1], [2, 0, 1], [-3, 1]);
    const f = exactFactors(p).map((x) => [upText(x.poly), x.multiplicity]);
    expect(f).toEqual(expect.arrayContaining([["s + 1", 3], ["s^2 + 2", 2], ["s - 3", 1]]));
    const roots = rootsOf(p);
    expect(roots.find((r) => r.re === -1)?.multiplicity).toBe(3);
    expect(roots.filter((r) => r.factor === "s^2 + 2").map((r) => r.exact)).toEqual(["-sqrt(2)*j", "sqrt(2)*j"]);
    expect(flatRoots(roots)).toHaveLength(8);
  });

  it("rational quadratics with real irrational roots are split off exactly: (s^2 − 2)(s^2 − 3)(s + 5)", () => {
    const f = exactFactors(product([-2, 0, 1], [-3, 0, 1], [5, 1])).map((x) => upText(x.poly));
    expect(f.sort()).toEqual(["s + 5", "s^2 - 2", "s^2 - 3"]);
  });

  it("damping ratio and natural frequency of s^2 + 2ζωn s + ωn^2 (common practice): ζ = 0.3, ωn = 5", () => {
    const [pair] = rootsOf(upFrom([q(25), q(3), q(1)])).filter((r) => r.im > 0);
    expect(pair.damping).toBeCloseTo(0.3, 14);
    expect(pair.naturalFrequency).toBeCloseTo(5, 14);
  });

  it("dominant poles: the pair −1 ± 2j before −10 (common practice: closest to the imaginary axis)", () => {
    const d = dominantPoles(rootsOf(product([5, 2, 1], [10, 1])));
    expect(d.map((r) => [r.re, Math.abs(r.im)])).toEqual([[-1, 2], [-1, 2]]);
  });

  it("degree 100: roots of s^100 − 1 accurate to 1e-9 (common practice: the roots of unity e^{2πik/100})", () => {
    const asc = new Array(101).fill(0);
    asc[0] = -1;
    asc[100] = 1;
    const roots = flatRoots(rootsOf(upInts(asc)));
    expect(roots).toHaveLength(100);
    for (const [re, im] of roots) {
      const k = Math.round((Math.atan2(im, re) / (2 * Math.PI)) * 100);
      const want = [Math.cos((2 * Math.PI * k) / 100), Math.sin((2 * Math.PI * k) / 100)];
      expect(Math.hypot(re - want[0], im - want[1])).toBeLessThan(1e-9);
    }
  });

  it("degree 100 through the factoring: (s + 1)^100 − 3/2^100 has the roots −1 + (3^(1/100)/2)·e^{2πik/100}, to 1e-13 relative (common practice: by construction; irreducible, Eisenstein at 3 in 2(s + 1))", () => {
    const binomial = Array.from({ length: 101 }, (_, k) => {
      let c = 1n;
      for (let i = 0; i < k; i++) c = (c * BigInt(100 - i)) / BigInt(i + 1);
      return c;
    });
    const asc = binomial.map((c, k) => (k === 0 ? q(c * 2n ** 100n - 3n, 2n ** 100n) : q(c)));
    const roots = rootsOf(upFrom(asc));
    expect(roots.map((r) => r.factor)).toEqual(new Array(100).fill(upText(upFrom(asc))));
    const radius = 3 ** (1 / 100) / 2;
    for (const r of roots) {
      const k = Math.round((Math.atan2(r.im, r.re + 1) / (2 * Math.PI)) * 100);
      const want = [-1 + radius * Math.cos((2 * Math.PI * k) / 100), radius * Math.sin((2 * Math.PI * k) / 100)];
      expect(Math.hypot(r.re - want[0], r.im - want[1]) / Math.hypot(want[0], want[1])).toBeLessThan(1e-13);
    }
    expect(new Set(roots.map((r) => `${r.re},${r.im}`)).size).toBe(100);
  });

  it("degree 64: the zeros of the Chebyshev polynomial T_64 are cos((2m−1)π/128), to 1e-13 (Abramowitz & Stegun 22.16.1; T_64 is irreducible)", () => {
    let [t0, t1] = [upInts([1]), upInts([0, 1])];
    for (let k = 1; k < 64; k++) [t0, t1] = [t1, upSub(upMul(upInts([0, 2]), t1), t0)];
    const roots = flatRoots(rootsOf(t1));
    const want = Array.from({ length: 64 }, (_, m) => Math.cos(((2 * m + 1) * Math.PI) / 128)).sort((a, b) => a - b);
    expect(roots.map(([, im]) => im)).toEqual(new Array(64).fill(0));
    roots.forEach(([re], i) => expect(Math.abs(re - want[i]) / Math.abs(want[i])).toBeLessThan(1e-13));
  });

  it("above degree 100 a clear refusal naming the limit", () => {
    const asc = new Array(102).fill(0);
    asc[0] = 1;
    asc[101] = 1;
    try {
      rootsOf(upInts(asc));
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(AnalysisError);
      expect((e as AnalysisError).code).toBe("degree-limit");
      expect((e as AnalysisError).message).toMatch(/degree 101; roots are computed up to degree 100/);
    }
  });
});
