import { describe, expect, it } from "vitest";
import { analyzeDocument } from "@shared/analysis/analyzeDiagram";
import { exactValue } from "@shared/analysis/nominal";
import { parseDiagram } from "@shared/diagram/parseDiagram";
import type { Problem } from "@shared/diagram/problems";
import { reduceDocumentExact } from "@shared/reduce/reduceDiagram";
import { unityFeedback } from "../../support/docBuilder";

const problemsOf = (raw: unknown): Problem[] => {
  const parsed = parseDiagram(raw);
  return parsed.ok ? [] : parsed.problems;
};

// Regression cases of the hostile-input fuzzer (tests/fuzz): parameter values that the schema took as finite numbers
// but that the exact algebra cannot read (decimal exponent beyond ±300) threw AlgebraError out of `implement` and
// reached the CLI as an internal error. The inputs are the extremes of IEEE 754 binary64 (from memory: the least
// positive subnormal is 4.9e-324 ≈ 5e-324, the largest finite 1.797…e308) and two values the fuzzer found.
describe("parameter values beyond the exact-number range", () => {
  it.each([1e-306, 6e-323, 5e-324, -2.5e-323, 1.7976931348623157e308])("K = %s is a validation error naming the parameter", (K) => {
    const problem = problemsOf(unityFeedback("K/(s + 1)", { K })).find((p) => p.code === "parameter-number-range");
    expect(problem).toMatchObject({ severity: "error", field: "parameters.K" });
    expect(problem?.message).toContain(`Parameter K has value ${K}`);
  });

  it("a slider range beyond it is refused too, naming min or max", () => {
    const problems = problemsOf(unityFeedback("K/(s + 1)", { K: { value: 1, min: 1e-320, max: 2 } }));
    expect(problems.find((p) => p.code === "parameter-number-range")?.message).toContain("has min 1e-320");
  });

  // common practice: the edges of an accepted range are accepted.
  it.each([0, -0, 1e-300, -1e300, 1e300, 2.5e-300])("K = %s is accepted", (K) => {
    expect(parseDiagram(unityFeedback("K/(s + 1)", { K })).ok).toBe(true);
  });

  it("the analysis and the reducer report it as a problem, not an exception", () => {
    const doc = unityFeedback("K/(s + 1)", { K: 1e-306 });
    const analysed = analyzeDocument(doc);
    expect(analysed.ok).toBe(false);
    expect(!analysed.ok && analysed.problems.map((p) => p.code)).toEqual(["parameter-number-range"]);
    expect(reduceDocumentExact(doc).ok).toBe(false);
  });

  it("a value given at analysis time (a slider) is an AnalysisError naming the parameter", () => {
    expect(() => exactValue(1e-306, "K")).toThrow(expect.objectContaining({ name: "AnalysisError", code: "bad-value", subject: "K" }));
    expect(exactValue(2.5e-3, "K")).toEqual({ n: 1n, d: 400n }); // from memory: 0.0025 = 1/400
  });
});
