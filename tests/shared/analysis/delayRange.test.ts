import { describe, expect, it } from "vitest";
import { analyzeDocument } from "@shared/analysis/analyzeDiagram";
import { delayedLoop } from "../../support/docBuilder";

// Regression cases of the hostile-input fuzzer (tests/fuzz): dead times far outside any plant's range threw from
// the numeric analysis (T = (2e296)^5: "complex division by zero" in the residues; T = 1e-299·1e-299: an infinite
// BigInt in the root finder) or took 1.7 s (T = 6e-228). Now each is a problem naming the dead-time block.
describe("dead times outside the analysable range", () => {
  it.each(["(2e296)^5", "1e-299*1e-299", "6e-228", "1e-7", "2e6"])("T = %s is a delay-range problem on block d", (T) => {
    const out = analyzeDocument(delayedLoop("1", T, "1/(s + 1)"));
    expect(out.ok).toBe(false);
    const problem = out.ok ? undefined : out.problems.find((p) => p.code === "delay-range");
    expect(problem).toMatchObject({ severity: "error", blockId: "d", field: "expr" });
    expect(problem?.message).toContain('block "d"');
  });

  // common practice: the edges of an accepted range are accepted; from memory: a unity loop around 1/(s + 1) with
  // gain 1 and any dead time keeps DC gain 1/(1 + 1) = 0.5.
  it.each(["1e-6", "0.5", "1e6"])("T = %s is analysed", (T) => {
    const out = analyzeDocument(delayedLoop("1", T, "1/(s + 1)"));
    expect(out.ok && out.result.dcGain).toBeCloseTo(0.5, 12);
  });

  // Found by the fuzzer: T = Kp with Kp = 0 read the empty numerator (TypeError). From memory: e^(−s·0) = 1, so the
  // unity loop around 2/(s + 1) has DC gain 2/(1 + 2) = 2/3.
  it("a dead time that is 0 at the values is analysed as none", () => {
    const out = analyzeDocument(delayedLoop("2", "Kp", "1/(s + 1)", { Kp: 0 }));
    expect(out.ok && out.result.dcGain).toBeCloseTo(2 / 3, 12);
    expect(out.ok && out.analysis.deadTime?.delays[0].seconds).toBe(0);
  });
});
