import { describe, expect, it } from "vitest";
import { ratDenominator } from "@shared/algebra/ratfn";
import { parseTransfer } from "../../support/parseTransfer";
import { stableSet } from "@shared/analysis/stableSet";

const den = (text: string, params: string[]) => ratDenominator(parseTransfer("1", text, params));

describe("stable set of one parameter", () => {
  it("0 < K < 1386 (from memory: Nise, Control Systems Engineering, Example 6.9: K/(s(s+7)(s+11)))", () => {
    const set = stableSet(den("s^3 + 18*s^2 + 77*s + K", ["K"]), "K", { K: 1 });
    expect(set.text).toBe("0 < K < 1386");
    expect(set.intervals[0].upper).toMatchObject({ value: 1386, exact: true, polynomial: null });
  });

  it("0 < K < 8 (from memory: Dorf & Bishop, Modern Control Systems, third-order Routh example s^3 + 2s^2 + 4s + K)", () => {
    expect(stableSet(den("s^3 + 2*s^2 + 4*s + K", ["K"]), "K", { K: 1 }).text).toBe("0 < K < 8");
  });

  it("−1 < K < 8 for (s + 1)^3 + K (common practice: cubic Hurwitz condition a1·a2 > a0·a3, here 9 > 1 + K)", () => {
    expect(stableSet(den("(s + 1)^3 + K", ["K"]), "K", { K: 1 }).text).toBe("-1 < K < 8");
  });

  it("quadratic-surd endpoints: s^3 + s^2 + (K^2 − 2)s + 1 needs K^2 > 3 (common practice: cubic Hurwitz condition)", () => {
    const set = stableSet(den("s^3 + s^2 + (K^2 - 2)*s + 1", ["K"]), "K", { K: 2 });
    expect(set.text).toBe("K < -sqrt(3) or K > sqrt(3)");
    expect(set.intervals[1].lower?.value).toBeCloseTo(Math.sqrt(3), 14);
    expect(set.intervals[1].lower?.latex).toBe("\\sqrt{3}");
  });

  it("an endpoint that is a cubic root: 6 significant digits and its polynomial (common practice: cubic Hurwitz condition K^3 + K > 1)", () => {
    const set = stableSet(den("s^3 + s^2 + (K^3 + K)*s + 1", ["K"]), "K", { K: 2 });
    const lower = set.intervals[0].lower!;
    expect(lower.exact).toBe(false);
    expect(lower.polynomial).toBe("K^3 + K - 1");
    expect(lower.text).toBe("0.682328");
    expect(lower.value ** 3 + lower.value - 1).toBeCloseTo(0, 14);
    expect(set.intervals[0].upper).toBeNull();
  });

  it("other parameters at their values: tau·s^3 + s^2 + s + K with tau = 1/2 gives 0 < K < 2 (common practice: a1·a2 > a0·a3)", () => {
    expect(stableSet(den("tau*s^3 + s^2 + s + K", ["K", "tau"]), "K", { K: 1, tau: 0.5 }).text).toBe("0 < K < 2");
  });

  it("a degree drop at a rational point is decided exactly: K·s^2 + s + 1 is stable for K ≥ 0 (K = 0 leaves s + 1)", () => {
    const set = stableSet(den("K*s^2 + s + 1", ["K"]), "K", { K: 1 });
    expect(set.text).toBe("K ≥ 0");
    expect(set.intervals[0].lowerIncluded).toBe(true);
  });

  it("no value: s^5 + 2s^4 + 3s^3 + 4s^2 + 5s + K (Routh by hand: the s^1 entry needs K > 6 and K^2 − 14K + 60 < 0, which has no real solution)", () => {
    expect(stableSet(den("s^5 + 2*s^4 + 3*s^3 + 4*s^2 + 5*s + K", ["K"]), "K", { K: 1 }).text).toBe("no value of K");
  });
});
