import { describe, expect, it } from "vitest";
import { ratDenominator } from "@shared/algebra/ratfn";
import { parseTransfer } from "../../support/parseTransfer";
import { rootCounts, stabilityOf } from "@shared/analysis/stability";
import { upFromPoly, upInts, upMul, type UPoly } from "@shared/analysis/upoly";

const product = (...ps: number[][]): UPoly => ps.map((p) => upInts(p)).reduce(upMul);

describe("exact stability verdict (definitions of the analysis; roots known by construction)", () => {
  it.each([
    ["(s+1)(s+2)", product([1, 1], [2, 1]), "stable", { rhp: 0, axis: 0, lhp: 2 }],
    ["s(s+1): simple pole at 0", product([0, 1], [1, 1]), "marginal", { rhp: 0, axis: 1, lhp: 1 }],
    ["s^2(s+1): repeated pole at 0", product([0, 0, 1], [1, 1]), "unstable", { rhp: 0, axis: 2, lhp: 1 }],
    ["(s^2+4)^2(s+1): repeated axis pair", product([4, 0, 1], [4, 0, 1], [1, 1]), "unstable", { rhp: 0, axis: 4, lhp: 1 }],
    ["(s−1)^2(s+3)", product([-1, 1], [-1, 1], [3, 1]), "unstable", { rhp: 2, axis: 0, lhp: 1 }],
    ["(s^2−2)(s^2−3)(s+5): mirrored real pairs", product([-2, 0, 1], [-3, 0, 1], [5, 1]), "unstable", { rhp: 2, axis: 0, lhp: 3 }],
    ["(s^2+s+1)(s^2−s+1): mirrored complex pairs", product([1, 1, 1], [1, -1, 1]), "unstable", { rhp: 2, axis: 0, lhp: 2 }],
    ["constant: no poles", upInts([3]), "stable", { rhp: 0, axis: 0, lhp: 0 }],
  ] as const)("%s", (_, p, verdict, counts) => {
    const st = stabilityOf(p);
    expect(st.verdict).toBe(verdict);
    expect(rootCounts(p)).toMatchObject(counts);
  });

  it.each([
    ["one stable pole", product([2, 1]), "The one pole is in the open left half-plane."],
    ["three stable poles", product([1, 1], [2, 1], [3, 1]), "All 3 poles in the open left half-plane."],
    ["one pole on the right", product([-1, 1], [2, 1]), "1 pole in the right half-plane."],
    ["two poles on the right", product([-1, 1], [-2, 1]), "2 poles in the right half-plane."],
    ["one simple pole at 0", product([0, 1], [1, 1]), "A simple pole on the imaginary axis (s = 0) and none to the right."],
    ["a simple pair on the axis", product([4, 0, 1], [1, 1]), "Simple poles on the imaginary axis (s = ±2j) and none to the right."],
  ] as const)("the reason reads in the right number: %s (common practice: English number agreement)", (_, p, reason) => {
    expect(stabilityOf(p).reason).toBe(reason);
  });

  it("a verdict no float tolerance could give: s^2 + 10^-30·s + 1 is stable (roots at Re = −5·10^-31)", () => {
    const den = ratDenominator(parseTransfer("1", "s^2 + s/(10^30) + 1", []));
    expect(stabilityOf(upFromPoly(den)).verdict).toBe("stable");
    expect(stabilityOf(upInts([1, 0, 1])).verdict).toBe("marginal");
  });
});
