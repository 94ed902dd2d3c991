import { describe, expect, it } from "vitest";
import type { Problem } from "@shared/diagram/problems";
import { problemMarks } from "@/features/editor/lib/marks";

const problem = (over: Partial<Problem>): Problem => ({ severity: "warning", code: "c", message: "m", ...over });

describe("canvas marks (common practice: the worst severity wins on an element)", () => {
  it("carries the wire where the analysis breaks the loop, none by default", () => {
    expect(problemMarks([], null, "w4").breakWire).toBe("w4");
    expect(problemMarks([], null).breakWire).toBeNull();
  });

  it("marks each block and wire with its worst problem, related blocks included", () => {
    const marks = problemMarks(
      [problem({ blockId: "G", wireId: "w2" }), problem({ severity: "error", blockId: "e", related: ["G"] }), problem({ wireId: "w2" })],
      { blocks: new Set(["G"]), wires: new Set(["w3"]) },
      "w2",
    );
    expect(Object.fromEntries(marks.blockProblems)).toEqual({ G: "error", e: "error" });
    expect(Object.fromEntries(marks.wireProblems)).toEqual({ w2: "warning" });
    expect([...marks.highlightWires]).toEqual(["w3"]);
    expect(marks.breakWire).toBe("w2");
  });
});
