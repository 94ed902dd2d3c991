import { describe, expect, it } from "vitest";
import { decimalToRational, gcdBig, rationalOf } from "@shared/expr/decimal";

describe("decimalToRational", () => {
  // source: common practice — a decimal a.b×10^e is the integer ab over 10^(len b − e), reduced.
  it.each([
    ["0.1", 1n, 10n],
    ["1e-3", 1n, 1000n],
    ["2.50", 5n, 2n],
    ["12.5e2", 1250n, 1n],
    [".5", 1n, 2n],
    ["3.", 3n, 1n],
    ["0", 0n, 1n],
    ["1E+300", 10n ** 300n, 1n],
  ])("%s → %i/%i", (text, num, den) => {
    expect(decimalToRational(text)).toEqual({ num, den });
  });

  it("refuses exponents beyond ±300 instead of building huge integers", () => {
    expect(decimalToRational("1e301")).toBeUndefined();
    expect(decimalToRational("1e-301")).toBeUndefined();
  });
});

describe("rationalOf and gcdBig", () => {
  // source: common practice — lowest terms with a positive denominator.
  it("normalises sign and common factors", () => {
    expect(rationalOf(4n, -6n)).toEqual({ num: -2n, den: 3n });
    expect(rationalOf(0n, -5n)).toEqual({ num: 0n, den: 1n });
    expect(gcdBig(12n, -18n)).toBe(6n);
    expect(() => rationalOf(1n, 0n)).toThrow(RangeError);
  });
});
