import { describe, expect, it } from "vitest";
import { isLogRange, rangeFraction, rangeValueAt } from "@shared/analysis/scale";

describe("spreading a parameter over its range", () => {
  it("is logarithmic from a decade on, with positive ends (common practice: gains are swept in decades)", () => {
    expect(isLogRange([0.4, 40])).toBe(true);
    expect(isLogRange([1, 9])).toBe(false);
    expect(isLogRange([-1, 100])).toBe(false);
    // Halfway along [0.4, 40] on a log scale is the geometric mean √(0.4·40) = 4.
    expect(rangeValueAt([0.4, 40], 0.5)).toBeCloseTo(4, 12);
    expect(rangeValueAt([0, 10], 0.25)).toBe(2.5);
  });

  it("rangeFraction inverts rangeValueAt on both scales", () => {
    for (const range of [[0.1, 1000], [-2, 3]] as [number, number][])
      for (const f of [0, 0.1, 0.37, 0.5, 1]) expect(rangeFraction(range, rangeValueAt(range, f))).toBeCloseTo(f, 12);
  });
});
