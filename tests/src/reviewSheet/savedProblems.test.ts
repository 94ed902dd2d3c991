import { describe, expect, it } from "vitest";
import type { CheckedResult } from "@shared/api/versions";
import type { Problem } from "@shared/diagram/problems";
import type { ReductionResult } from "@shared/reduce/result";
import { savedProblems } from "@/features/reviewSheet/lib/savedProblems";

const problem = (severity: Problem["severity"], message: string): Problem => ({ severity, code: "test", message });

describe("savedProblems", () => {
  it("lists a stored check's problems, errors before warnings", () => {
    const stored: CheckedResult = { ok: false, engineMs: 1, problems: [problem("warning", "Block c is not used"), problem("error", "Block G: a ) is missing")] };
    expect(savedProblems(stored)).toEqual(["Block G: a ) is missing", "Block c is not used"]);
  });

  it("has none for a passed check, an unfinished check or a version never checked", () => {
    const passed: CheckedResult = { ok: true, engineMs: 1, result: {} as ReductionResult };
    const overBudget: CheckedResult = { ok: false, failure: "over-budget", engineMs: 900, problems: [problem("error", "The check ran out of time")] };
    expect(savedProblems(passed)).toBeNull();
    expect(savedProblems(overBudget)).toBeNull();
    expect(savedProblems(null)).toBeNull();
  });
});
