import { describe, expect, it } from "vitest";
import { q } from "@shared/algebra/rational";
import { countRealRoots, realRoots, squareFreePart } from "@shared/analysis/sturm";
import { upInts, upMul, upText } from "@shared/analysis/upoly";

describe("Sturm sequences (common practice: Sturm's theorem counts distinct real roots in (a, b])", () => {
  it("counts distinct real roots, repeated roots once", () => {
    const p = upMul(upMul(upInts([-1, 1]), upInts([-1, 1])), upInts([2, 0, 1])); // (s − 1)^2 (s^2 + 2)
    expect(countRealRoots(p)).toBe(1);
    expect(countRealRoots(upInts([-6, 11, -6, 1]))).toBe(3); // (s − 1)(s − 2)(s − 3)
    expect(countRealRoots(upInts([-6, 11, -6, 1]), q(3, 2), q(5, 2))).toBe(1);
    expect(upText(squareFreePart(p))).toBe("s^3 - s^2 + 2*s - 2");
  });

  it("locates roots in an open interval; exact roots at the ends are left out", () => {
    const [r2] = realRoots(upInts([-2, 0, 1]), q(0));
    expect(r2).toBeCloseTo(Math.SQRT2, 15);
    expect(realRoots(upInts([0, -2, 1]), q(0))).toEqual([2]); // x(x − 2): x = 0 is an end, not inside
    const near = realRoots(upMul(upInts([-1000000, 1000000 + 1]), upInts([-1, 1]))); // roots 1 and 1000000/1000001
    expect(near).toHaveLength(2);
    expect(Math.abs(near[0] - 1000000 / 1000001)).toBeLessThan(1e-9); // a gap of 1e-6 costs digits in doubles
  });
});
