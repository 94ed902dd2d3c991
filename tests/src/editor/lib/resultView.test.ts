import { describe, expect, it } from "vitest";
import { blockName, pairName } from "@/features/editor/lib/resultView";

describe("pair names in the results panel's selector (common practice: name a signal by its label, keep the id)", () => {
  const blocks = [{ id: "r", label: "Speed reference" }, { id: "d", label: "  " }, { id: "y" }];
  it("shows a block's label with its id, and the id alone when there is no label", () => {
    expect(blockName(blocks, "r")).toBe("Speed reference (r)");
    expect(blockName(blocks, "d")).toBe("d");
    expect(blockName(blocks, "y")).toBe("y");
    expect(blockName(undefined, "y")).toBe("y");
  });
  it("names a pair from input to output", () => {
    expect(pairName(blocks, { input: "r", output: "y" })).toBe("Speed reference (r) → y");
  });
});
