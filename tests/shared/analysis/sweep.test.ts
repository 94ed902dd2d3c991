import { describe, expect, it } from "vitest";
import { prepared } from "../../support/reduced";
import { parameterRange, rootLocus, stepOverlay, sweepValues } from "@shared/analysis/sweep";
import { unityFeedback } from "../../support/docBuilder";

const doc = unityFeedback("K/(s*(s + 7)*(s + 11))", { K: { value: 100, min: 10, max: 3000 } });
const p = prepared(doc);

describe("parameter sweeps", () => {
  it("the slider range comes from the parameter table, else a decade either side", () => {
    expect(parameterRange(doc, "K")).toEqual([10, 3000]);
    expect(parameterRange({ ...doc, parameters: { K: 4 } }, "K")).toEqual([0.4, 40]);
    expect(sweepValues([1, 100], 3)).toEqual([1, 10, 100]);
  });

  it("root locus: a branch crosses into the right half-plane at K = 1386, at ±j√77 (from memory: Nise, Example 6.9 / root locus axis crossing)", () => {
    const loc = rootLocus(p, "K", [1300, 1470], 18);
    expect(loc.branches).toHaveLength(3);
    const maxRe = loc.values.map((_, i) => Math.max(...loc.branches.map((b) => b[i]![0])));
    loc.values.forEach((k, i) => expect(maxRe[i] > 0, `K = ${k}`).toBe(k > 1386));
    const crossing = loc.branches.find((b) => b.every((r) => r![1] > 0))!;
    expect(crossing[0]![1]).toBeCloseTo(Math.sqrt(77), 0);
  });

  it("branches are continuous: consecutive points of a branch are close", () => {
    const loc = rootLocus(p, "K", [10, 3000], 200);
    for (const b of loc.branches) for (let i = 1; i < b.length; i++) expect(Math.hypot(b[i]![0] - b[i - 1]![0], b[i]![1] - b[i - 1]![1])).toBeLessThan(1);
  });

  it("step overlays end at the final value T(0) = 1 for every stable K (type 1 loop, common practice)", () => {
    const series = stepOverlay(p, "K", [50, 100, 200], 30);
    expect(series).toHaveLength(3);
    for (const s of series) expect(s.points[s.points.length - 1][1]).toBeCloseTo(1, 3);
  });
});
