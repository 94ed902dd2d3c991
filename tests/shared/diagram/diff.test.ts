import { describe, expect, it } from "vitest";
import { diffDiagrams } from "@shared/diagram/diff";
import { diagramDocumentSchema, type DiagramDocument } from "@shared/diagram/schema";

// The unity servo loop r → e → g → y with g fed back into e's minus port (common practice: the textbook loop).
const base: DiagramDocument = diagramDocumentSchema.parse({
  format: "loopwright-diagram",
  version: 1,
  parameters: { K: 4, tau: { value: 0.5, unit: "s" } },
  blocks: [
    { id: "r", type: "input" },
    { id: "e", type: "sum", signs: ["+", "-"] },
    { id: "g", type: "transfer", expr: "K/(s*(tau*s+1))", label: "Plant" },
    { id: "y", type: "output" },
  ],
  wires: [
    { id: "w1", from: "r", to: "e", port: 0 },
    { id: "w2", from: "e", to: "g" },
    { id: "w3", from: "g", to: "y" },
    { id: "w4", from: "g", to: "e", port: 1 },
  ],
  layout: { g: { x: 200, y: 0 } },
});

const edit = (f: (d: DiagramDocument) => void): DiagramDocument => {
  const copy = structuredClone(base);
  f(copy);
  return copy;
};

describe("diffDiagrams", () => {
  it("finds no change between a document and itself, nor when only positions moved", () => {
    expect(diffDiagrams(base, base).same).toBe(true);
    const moved = edit((d) => (d.layout = { g: { x: 500, y: 80 } }));
    expect(diffDiagrams(base, moved)).toMatchObject({ same: true, blocks: { added: [], removed: [], changed: [] } });
  });

  it("lists a changed expression and label side by side", () => {
    const after = edit((d) => {
      const g = d.blocks[2] as { expr: string; label?: string };
      g.expr = "K/(s*(tau*s+2))";
      g.label = "Plant, retuned";
    });
    const diff = diffDiagrams(base, after);
    expect(diff.same).toBe(false);
    expect(diff.blocks.changed).toEqual([
      {
        id: "g",
        type: "transfer",
        fields: [
          { field: "label", before: "Plant", after: "Plant, retuned" },
          { field: "expr", before: "K/(s*(tau*s+1))", after: "K/(s*(tau*s+2))" },
        ],
      },
    ]);
  });

  it("names a flipped junction sign and a changed kind", () => {
    const after = edit((d) => {
      (d.blocks[1] as { signs: string[] }).signs = ["+", "+"];
      d.blocks[2] = { id: "g", type: "gain", expr: "K" } as DiagramDocument["blocks"][number];
    });
    const changed = diffDiagrams(base, after).blocks.changed;
    expect(changed.find((c) => c.id === "e")?.fields).toEqual([{ field: "signs", before: "+ -", after: "+ +" }]);
    expect(changed.find((c) => c.id === "g")?.fields.map((f) => f.field)).toEqual(["type", "label", "expr"]);
  });

  it("finds added and removed blocks and wires, naming wires by what they connect", () => {
    const after = edit((d) => {
      d.blocks.push({ id: "c", type: "gain", expr: "2" } as DiagramDocument["blocks"][number]);
      d.wires = d.wires.filter((w) => w.id !== "w2");
      d.wires.push({ id: "w5", from: "e", to: "c" }, { id: "w6", from: "c", to: "g" });
      d.wires[0] = { id: "w1-redrawn", from: "r", to: "e", port: 0 }; // same connection, new id: no change
    });
    const diff = diffDiagrams(base, after);
    expect(diff.blocks.added.map((b) => b.id)).toEqual(["c"]);
    expect(diff.blocks.removed).toEqual([]);
    expect(diff.wires.removed).toEqual([{ from: "e", to: "g", port: null, id: "w2" }]);
    expect(diff.wires.added.map((w) => `${w.from}→${w.to}`)).toEqual(["e→c", "c→g"]);
    const back = diffDiagrams(after, base);
    expect(back.blocks.removed.map((b) => b.id)).toEqual(["c"]);
  });

  it("lists parameters added, removed and changed, with units and ranges", () => {
    const after = edit((d) => {
      d.parameters = { K: 6, tau: { value: 0.5, unit: "s", min: 0.1, max: 2 }, Ti: 3 };
    });
    expect(diffDiagrams(base, after).parameters).toEqual([
      { name: "K", before: "4", after: "6" },
      { name: "Ti", before: null, after: "3" },
      { name: "tau", before: "0.5 s", after: "0.5 s in [0.1, 2]" },
    ]);
  });
});
