import { describe, expect, it } from "vitest";
import { checkDocument, versionSummary } from "@shared/analysis/versionSummary";
import { unityFeedback } from "../../support/docBuilder";

describe("versionSummary", () => {
  // common practice: K/(s(s+2)) in unity feedback closes to K/(s² + 2s + K); K = 4 gives ζ = 0.5 and 16.3 % overshoot,
  // the crossover at ω² = √20 − 2 a phase margin of 51.8°; K = 1 gives the double pole at −1, order 2.
  it("summarises the default pair: order, verdict, phase margin, overshoot", () => {
    const checked = checkDocument(unityFeedback("K/(s*(s + 2))", { K: 4 }));
    if (!checked.ok) throw new Error("expected a result");
    const s = versionSummary(checked.pair)!;
    expect(s).toMatchObject({ order: 2, stable: "stable" });
    expect(s.phaseMarginDeg).toBeCloseTo(51.83, 2);
    expect(s.overshootPercent).toBeCloseTo(16.3, 1);
  });
  it("counts a repeated pole with its multiplicity", () => {
    const checked = checkDocument(unityFeedback("K/(s*(s + 2))", { K: 1 }));
    if (!checked.ok) throw new Error("expected a result");
    expect(versionSummary(checked.pair)?.order).toBe(2);
  });
});
