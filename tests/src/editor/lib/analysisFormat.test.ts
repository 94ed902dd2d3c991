import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { runPythonSync } from "../../../support/python";
import { ratDenominator } from "@shared/algebra/ratfn";
import { parseTransfer } from "../../../support/parseTransfer";
import { rootsOf } from "@shared/analysis/poles";
import { routhArray } from "@shared/analysis/routh";
import { upFromPoly } from "@shared/analysis/upoly";
import {
  firstColumnSign, formatComplex, formatExact, formatNumber, formatQuantity, rootRows, verdictWord, withMinus,
} from "@/features/editor/lib/analysisFormat";

/** Back to a JavaScript number: U+2212 to "-", "∞" to Infinity. */
const parse = (text: string) => Number(text.replace(/\u2212/g, "-").replace("∞", "Infinity"));

/** Python's general format "{:.4g}", the usual meaning of "4 significant digits", via Debian's python3. */
function pythonG(xs: number[], digits: number): string[] {
  const script = `import json,sys\nprint(json.dumps([format(x, '.${digits}g') for x in json.load(sys.stdin)]))`;
  return runPythonSync<string[]>({ code: script }, xs, 30_000);
}

describe("formatNumber", () => {
  it("rounds to significant digits like Python's '.4g' and '.6g' (Debian python3)", () => {
    const xs = [Math.sqrt(3), -Math.sqrt(3), 1 / 3, 2 / 3, 0.5, 100, 1234.5678, -0.0012345, 9.99951, 123456.7, 0.00056789];
    for (const digits of [4, 6]) {
      const ours = xs.map((x) => formatNumber(x, digits));
      expect(ours.map(parse)).toEqual(pythonG(xs, digits).map(Number));
    }
  });

  it("prints A&S values of √3 and 1/π to 4 and 6 digits", () => {
    // Abramowitz & Stegun, Table 1.1: √3 = 1.7320508075…, 1/π = 0.3183098861…
    expect(formatNumber(Math.sqrt(3))).toBe("1.732");
    expect(formatNumber(-Math.sqrt(3), 6)).toBe("\u22121.73205");
    expect(formatNumber(1 / Math.PI)).toBe("0.3183");
  });

  it("drops trailing zeros and never writes −0 (common practice)", () => {
    expect(formatNumber(2)).toBe("2");
    expect(formatNumber(0.5)).toBe("0.5");
    expect(formatNumber(-0)).toBe("0");
    expect(formatNumber(30.0000001)).toBe("30");
  });

  it("uses exponent form for very large and very small magnitudes (common practice)", () => {
    expect(formatNumber(2.5e-7)).toBe("2.5e\u22127");
    expect(formatNumber(-1.23456e9)).toBe("\u22121.235e9");
    expect(formatNumber(123456.7)).toBe("123500");
  });

  it("shows infinities as ∞ (common practice)", () => {
    expect(formatNumber(Infinity)).toBe("∞");
    expect(formatNumber(-Infinity)).toBe("\u2212∞");
  });

  it("reads back within half a unit of the last digit for any finite number (property)", () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e300, max: 1e300 }), (x) => {
        const back = parse(formatNumber(x, 4));
        expect(Math.abs(back - x)).toBeLessThanOrEqual(Math.abs(x) * 5e-4 + Number.MIN_VALUE);
      }),
    );
  });
});

describe("formatComplex", () => {
  it("prints the roots of s² + s + 1 as −0.5 ± 0.866j (from memory: Ogata, Modern Control Engineering, second-order poles)", () => {
    const w = Math.sqrt(3) / 2;
    expect(formatComplex([-0.5, w], { pair: true })).toBe("\u22120.5 ± 0.866j");
    expect(formatComplex([-0.5, -w])).toBe("\u22120.5 \u2212 0.866j");
    expect(formatComplex([-0.5, w])).toBe("\u22120.5 + 0.866j");
  });

  it("leaves out a zero part (common practice)", () => {
    expect(formatComplex([-2, 0])).toBe("\u22122");
    expect(formatComplex([0, 2])).toBe("2j");
    expect(formatComplex([0, -2])).toBe("\u22122j");
    expect(formatComplex([0, 2], { pair: true })).toBe("±2j");
    expect(formatComplex([-0, 0])).toBe("0");
  });

  it("honours the digit count", () => {
    expect(formatComplex([-1, Math.sqrt(3)], { pair: true, digits: 6 })).toBe("\u22121 ± 1.73205j");
  });
});

describe("formatExact and formatQuantity", () => {
  it("writes surds with √ and a true minus", () => {
    expect(formatExact("-1/2 + sqrt(3)/2*j")).toBe("\u22121/2 + √3/2 j");
    expect(formatExact("2*sqrt(5)")).toBe("2√5");
    expect(withMinus("-3")).toBe("\u22123");
  });

  it("names the three verdicts in words (common practice: stable, marginally stable, unstable)", () => {
    expect((["stable", "marginal", "unstable"] as const).map(verdictWord)).toEqual(["Stable", "Marginally stable", "Unstable"]);
  });

  it("shows an exact value with its decimal, infinite limits as ∞ and a missing one as a dash", () => {
    // 1/3 = 0.3333… (Abramowitz & Stegun, Table 1.1 reciprocals)
    expect(formatQuantity({ value: 1 / 3, exact: "1/3" })).toBe("1/3 ≈ 0.3333");
    expect(formatQuantity({ value: 2, exact: "2" })).toBe("2");
    expect(formatQuantity({ value: -0.25, exact: "-1/4" })).toBe("\u22121/4 ≈ \u22120.25");
    expect(formatQuantity({ value: 0.1, exact: null })).toBe("0.1");
    expect(formatQuantity({ value: "Infinity", exact: null })).toBe("∞");
    expect(formatQuantity({ value: "-Infinity", exact: null })).toBe("\u2212∞");
    expect(formatQuantity({ value: null, exact: null })).toBe("—");
  });
});

const denominator = (text: string) => ratDenominator(parseTransfer("1", text, []));

/** Roots with positive real part, counted by Debian's numpy. */
function rhpCount(coeffsDesc: number[]): number {
  const script = "import json,sys,numpy\nprint(int(sum(1 for r in numpy.roots(json.load(sys.stdin)) if r.real > 1e-9)))";
  return runPythonSync<number>({ code: script }, coeffsDesc, 30_000);
}

describe("rootRows", () => {
  it("gives one row per conjugate pair: s² + 2s + 5 has −1 ± 2j (quadratic formula, common practice)", () => {
    const rows = rootRows(rootsOf(upFromPoly(denominator("s^2 + 2*s + 5"))));
    expect(rows.map((r) => [r.value, r.exact, r.count])).toEqual([["\u22121 ± 2j", "\u22121 ± 2 j", 2]]);
  });

  it("keeps real roots and surd pairs: (s + 3)(s² + s + 1) → −3 and −1/2 ± √3/2 j (quadratic formula, common practice)", () => {
    const rows = rootRows(rootsOf(upFromPoly(denominator("(s + 3)*(s^2 + s + 1)"))));
    expect(rows.map((r) => r.exact)).toEqual(["\u22123", "\u22121/2 ± √3/2 j"]);
    expect(rows.map((r) => r.value)).toEqual(["\u22123", "\u22120.5 ± 0.866j"]);
  });

  it("writes a pure imaginary pair as ±2j: s² + 4 (common practice)", () => {
    const rows = rootRows(rootsOf(upFromPoly(denominator("s^2 + 4"))));
    expect(rows.map((r) => [r.value, r.exact])).toEqual([["±2j", "±2 j"]]);
  });
});

describe("firstColumnSign", () => {
  it("reads rationals and ε ratios as ε → 0+ (common practice: the lowest power of ε dominates)", () => {
    expect(firstColumnSign("338/3")).toBe(1);
    expect(firstColumnSign("-50")).toBe(-1);
    expect(firstColumnSign("ε")).toBe(1);
    expect(firstColumnSign("(4*ε - 12)/(ε)")).toBe(-1);
    expect(firstColumnSign("(-5/2*ε^2 + 6*ε - 18)/(ε - 3)")).toBe(1);
    expect(firstColumnSign("-1/3*K + 2")).toBeNull();
  });

  it("counts as many sign changes as numpy finds right-half-plane roots, ε case included", () => {
    const cases: [string, number[]][] = [
      ["s^5 + 2*s^4 + 2*s^3 + 4*s^2 + 11*s + 10", [1, 2, 2, 4, 11, 10]],
      ["s^3 + s^2 + 2*s + 24", [1, 1, 2, 24]],
      ["s^4 + s^3 + s^2 + 2*s + 3", [1, 1, 1, 2, 3]],
    ];
    for (const [text, coeffs] of cases) {
      const signs = routhArray(denominator(text)).firstColumn.map(firstColumnSign) as number[];
      const changes = signs.filter((s, i) => i > 0 && s !== signs[i - 1]).length;
      expect(changes).toBe(rhpCount(coeffs));
    }
  });
});
