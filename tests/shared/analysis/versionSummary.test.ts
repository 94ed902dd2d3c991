import { describe, expect, it } from "vitest";
import { checkDocument, versionSummary } from "@shared/analysis/versionSummary";
import { unityFeedback } from "../../support/docBuilder";
import { diagram } from "../reduce/diagramSpec";

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

describe("checkDocument's problems (the save check)", () => {
  // common practice: positive unity feedback around a gain of 1 is singular (e = r + e); h is left unconnected.
  it("lists an algebraic loop beside an unconnected block", () => {
    const checked = checkDocument(diagram(
      [["r", "input"], ["e", "sum", ["+", "+"]], ["g", "gain", "1"], ["y", "output"], ["h", "transfer", "1/(s+1)"]],
      ["r>e:0", "e>g", "g>e:1", "g>y"],
    ));
    expect(checked.ok ? [] : checked.problems.filter((p) => p.severity === "error").map((p) => [p.code, p.blockId])).toEqual([
      ["unwired-port", "h"],
      ["algebraic-loop", "e"],
    ]);
  });
});
