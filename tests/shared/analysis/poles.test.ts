import { describe, expect, it } from "vitest";
import { q } from "@shared/algebra/rational";
import { AnalysisError } from "@shared/analysis/errors";
import { exactFactors } from "@shared/analysis/factors";
import { dominantPoles, flatRoots, rootsOf } from "@shared/analysis/poles";
import { upFrom, upInts, upMul, upText, type UPoly } from "@shared/analysis/upoly";

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
