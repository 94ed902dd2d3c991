import { describe, expect, it } from "vitest";
import { diffDiagrams } from "@shared/diagram/diff";
import { compareMarks } from "@/features/editor/lib/compareMarks";
import { buildNodes } from "@/features/editor/lib/flowModel";
import { unityFeedback } from "../../../support/docBuilder";
import { withWireIds } from "@/features/editor/commands/document";

describe("compareMarks", () => {
  const before = withWireIds(unityFeedback("K/(s*(s + 2))", { K: 4 }));
  const plant = before.blocks.find((b) => b.type === "transfer")!;
  const after = { ...before, blocks: before.blocks.map((b) => (b.id === plant.id ? { ...b, expr: "K/(s*(s + 3))" } : b)) };
  const diff = diffDiagrams(before, after);

  it("marks a changed block on both sides, and nothing else", () => {
    expect([...compareMarks(diff, "before").changes!]).toEqual([[plant.id, "changed"]]);
    expect([...compareMarks(diff, "after").changes!]).toEqual([[plant.id, "changed"]]);
  });

  it("draws the changed block highlighted, with the change in its name and a data attribute", () => {
    const nodes = buildNodes(after, compareMarks(diff, "after"), { selection: { blocks: [], wires: [] }, dragging: new Map(), measured: new Map() });
    const node = nodes.find((n) => n.id === plant.id)!;
    expect(node.data.highlighted).toBe(true);
    expect(node.ariaLabel).toMatch(/changed in this comparison$/);
    expect(node.domAttributes).toEqual({ "data-change": "changed" });
    expect(nodes.filter((n) => n.data.highlighted)).toHaveLength(1);
  });

  it("marks removed blocks on the older side and added ones on the newer", () => {
    const gain = { id: "k9", type: "gain" as const, expr: "2" };
    const grown = { ...before, blocks: [...before.blocks, gain] };
    const d = diffDiagrams(before, grown);
    expect(compareMarks(d, "after").changes!.get("k9")).toBe("added");
    expect(compareMarks(diffDiagrams(grown, before), "before").changes!.get("k9")).toBe("removed");
  });
});
