import { describe, expect, it } from "vitest";
import { summaryText } from "@/features/versions/lib/summaryText";

const summary = { input: "r", output: "y", order: 2, stable: "stable" as const, phaseMarginDeg: 51.827, overshootPercent: 16.303 };

describe("summaryText", () => {
  it("reads the default pair's figures to one decimal", () => {
    expect(summaryText({ ok: true, problemCount: 0, summary })).toEqual({ text: "r → y: order 2, stable, PM 51.8°, overshoot 16.3 %", problem: false });
  });
  it("says how many problems a version was saved with, as a fault", () => {
    expect(summaryText({ ok: false, problemCount: 1, summary: null })).toEqual({ text: "Saved with 1 problem", problem: true });
    expect(summaryText({ ok: false, problemCount: 3, summary: null }).text).toBe("Saved with 3 problems");
  });
  it("leaves out figures the analysis could not give and writes negatives with a minus sign", () => {
    const open = { ...summary, stable: "unstable" as const, phaseMarginDeg: -12.34, overshootPercent: null };
    expect(summaryText({ ok: true, problemCount: 0, summary: open }).text).toBe("r → y: order 2, unstable, PM \u221212.3°");
    const high = { ...summary, order: 45, stable: null, phaseMarginDeg: null, overshootPercent: null };
    expect(summaryText({ ok: true, problemCount: 0, summary: high }).text).toBe("r → y: order 45, not analysed (order too high)");
  });
  it("tells an unchecked version from a checked one without a pair", () => {
    expect(summaryText({ ok: null, problemCount: 0, summary: null }).text).toBe("Not checked");
    expect(summaryText({ ok: true, problemCount: 0, summary: null }).text).toMatch(/no input–output pair/);
  });
});
