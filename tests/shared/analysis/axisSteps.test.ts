import { describe, expect, it } from "vitest";
import { niceStep, roundAxisEnd } from "@shared/analysis/axisSteps";

describe("niceStep", () => {
  it("picks 1, 2 or 5 × 10^k steps (common practice: axis tick steps)", () => {
    expect(niceStep(7, 5)).toBe(2);
    expect(niceStep(100, 4)).toBe(50);
    expect(niceStep(0.03, 6)).toBeCloseTo(0.005, 15);
    expect(niceStep(9, 10)).toBe(1);
  });
});

describe("roundAxisEnd", () => {
  // common practice: a time axis ends on a tick, a whole number of 1, 2 or 5 × 10^k steps.
  it.each([
    [7.3, 8],
    [10, 10],
    [5.46, 6],
    [0.0123, 0.015],
    [123, 150],
    [1, 1],
  ])("%f → %f", (x, end) => {
    expect(roundAxisEnd(x)).toBe(end);
  });

  it("never ends before the value and adds at most one step", () => {
    for (let x = 0.013; x < 5000; x *= 1.37) {
      const end = roundAxisEnd(x);
      expect(end).toBeGreaterThanOrEqual(x);
      expect(end - x).toBeLessThanOrEqual(niceStep(x, 5) + 1e-12 * x);
    }
  });
});
