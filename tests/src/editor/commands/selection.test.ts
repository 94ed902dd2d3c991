import { describe, expect, it } from "vitest";
import { reduceDocument } from "@shared/reduce/reduceDiagram";
import { validateDiagram } from "@shared/diagram/validate";
import { copySelection, deleteSelection, duplicate, paste, pasteOffset, selectAll } from "@/features/editor/commands/selection";
import { estimatedSize, fallbackPosition } from "@shared/geometry/blockBox";
import { withWireIds } from "@/features/editor/commands/document";
import type { EditorDoc, Outcome } from "@/features/editor/commands/types";
import { unityLoop } from "../support";

const ok = (o: Outcome): EditorDoc => {
  if (!o.ok) throw new Error(o.reason);
  return o.doc;
};

describe("selection commands", () => {
  it("duplicating a whole loop gives a second, independent loop with fresh ids and the same closed loop (checked with the reducer)", () => {
    const doc = unityLoop();
    const out = duplicate(doc, selectAll(doc));
    const twice = ok(out);
    expect(validateDiagram(twice).problems.filter((p) => p.severity === "error")).toEqual([]);
    const ids = twice.blocks.map((b) => b.id);
    expect(new Set(ids).size).toBe(8);
    expect(new Set(twice.wires.map((w) => w.id)).size).toBe(8);
    const r = reduceDocument(twice);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // Each loop K/(s^2+2s+K) — from memory: Ogata, Modern Control Engineering, G/(1+G); no path between the copies.
    const byPair = Object.fromEntries(r.result.transfers.map((t) => [`${t.input}>${t.output}`, `${t.numerator} / ${t.denominator}`]));
    expect(byPair).toEqual({ "r>y": "K / s^2 + 2*s + K", "r1>y1": "K / s^2 + 2*s + K", "r>y1": "0 / 1", "r1>y": "0 / 1" });
    expect(out.ok && out.select?.blocks).toEqual(ids.slice(4));
  });

  it("copies only wires with both ends selected, and offsets pasted blocks", () => {
    const doc = { ...unityLoop(), layout: { e: { x: 100, y: 50 }, G: { x: 200, y: 50 } } };
    const fragment = copySelection(doc, { blocks: ["e", "G"], wires: [] });
    expect(fragment.wires.map((w) => `${w.from}>${w.to}`)).toEqual(["e>G", "G>e"]);
    const pasted = ok(paste(doc, fragment, { x: 32, y: 32 }));
    const newIds = pasted.blocks.slice(4).map((b) => b.id);
    expect(newIds).toEqual(["e1", "G1"]);
    expect(pasted.layout?.e1).toEqual({ x: 132, y: 82 });
    expect(pasted.wires.slice(4).map((w) => `${w.from}>${w.to}:${w.port ?? ""}`)).toEqual(["e1>G1:", "G1>e1:1"]);
  });

  it("pastes a copy clear of its original by default, and each further paste clear of the one before", () => {
    const doc = { ...unityLoop(), layout: { G: { x: 200, y: 48 } } };
    const fragment = copySelection(doc, { blocks: ["G"], wires: [] });
    const once = pasteOffset(fragment, 1);
    const twice = pasteOffset(fragment, 2);
    // One block's estimated box is under 80 px tall: the copy moves down by its height plus two grid steps.
    expect(once.y).toBeGreaterThan(estimatedSize(doc.blocks[2]).height);
    expect(twice.y).toBe(2 * once.y);
    expect(ok(paste(doc, fragment)).layout?.G1).toEqual({ x: 200 + once.x, y: 48 + once.y });
  });

  it("copies a block without a layout entry from where the canvas draws it", () => {
    const doc = { ...unityLoop(), layout: {} };
    expect(copySelection(doc, { blocks: ["G"], wires: [] }).layout.G).toEqual(fallbackPosition(2));
  });

  it("deleting a block deletes its wires and layout; an empty selection is refused with a reason", () => {
    const doc = { ...unityLoop(), layout: { G: { x: 1, y: 2 } } };
    const after = ok(deleteSelection(doc, { blocks: ["G"], wires: [] }));
    expect(after.blocks.map((b) => b.id)).toEqual(["r", "e", "y"]);
    expect(after.wires.map((w) => w.id)).toEqual(["w1"]);
    expect(after.layout).toEqual({});
    expect(deleteSelection(doc, { blocks: [], wires: [] })).toMatchObject({ ok: false });
    expect(paste(doc, { blocks: [], wires: [], layout: {} })).toMatchObject({ ok: false });
  });

  it("a loaded document's id-less wires get ids that do not clash with existing ones", () => {
    const doc = withWireIds({ ...unityLoop(), wires: [{ from: "r", to: "e", port: 0 }, { id: "w1", from: "e", to: "G" }, { from: "G", to: "y" }] });
    expect(doc.wires.map((w) => w.id)).toEqual(["w2", "w1", "w3"]);
  });
});
