import { describe, expect, it } from "vitest";
import type { Block } from "@shared/diagram/schema";
import { emptyDocument } from "@/features/editor/commands/document";
import { boundsOf, boxOf, estimatedSize, inPoint, outPoint } from "@shared/geometry/blockBox";
import { nodeBox } from "@/features/editor/geometry/nodeBox";
import { sumDiameter } from "@shared/geometry/sumPorts";
import { buildNodes } from "@/features/editor/lib/flowModel";
import { problemMarks } from "@/features/editor/lib/marks";

const sum = (signs: ("+" | "-")[]): Block => ({ id: "e", type: "sum", signs });
const box = { x: 100, y: 200, width: 48, height: 48 };

describe("estimated block sizes (the block views' own Tailwind sizes: h-12 = 48 px, w-16 = 64 px, size-4 = 16 px)", () => {
  it("match the fixed-size views exactly", () => {
    expect(estimatedSize({ id: "i", type: "integrator" })).toEqual({ width: 64, height: 48 });
    expect(estimatedSize({ id: "p", type: "branch" })).toEqual({ width: 16, height: 16 });
    expect(estimatedSize(sum(["+", "-", "-", "+"]))).toEqual({ width: sumDiameter(4), height: sumDiameter(4) });
  });

  it("grow with the text, within the views' minimum widths", () => {
    expect(estimatedSize({ id: "k", type: "gain", expr: "2" }).width).toBe(80);
    const long = estimatedSize({ id: "k", type: "gain", expr: "K_p*K_amp*K_sensor" }).width;
    expect(long).toBeGreaterThan(80);
    expect(estimatedSize({ id: "G", type: "transfer", expr: "1/(s+1)" }).height).toBeGreaterThan(estimatedSize({ id: "G", type: "transfer", expr: "5" }).height);
  });
});

describe("wire ends on a block's box", () => {
  it("leave from the middle of the right side", () => {
    expect(outPoint(box)).toEqual({ x: 148, y: 224 });
  });

  it("enter a junction at its port's place: port 0 left, port 1 bottom, port 2 top", () => {
    const e = sum(["+", "-", "-"]);
    expect(inPoint(e, box, 0)).toEqual({ at: { x: 100, y: 224 }, side: "left" });
    expect(inPoint(e, box, 1)).toEqual({ at: { x: 124, y: 248 }, side: "bottom" });
    expect(inPoint(e, box, 2)).toEqual({ at: { x: 124, y: 200 }, side: "top" });
  });

  it("enter any other block in the middle of its left side", () => {
    expect(inPoint({ id: "G", type: "transfer", expr: "1" }, box, undefined)).toEqual({ at: { x: 100, y: 224 }, side: "left" });
  });
});

describe("boxes and their bounds", () => {
  it("prefer the measured size to the estimate", () => {
    expect(boxOf({ id: "i", type: "integrator" }, { x: 1, y: 2 }, { width: 70, height: 50 })).toEqual({ x: 1, y: 2, width: 70, height: 50 });
  });

  it("take the canvas nodes' places from the document, and their measured sizes once known", () => {
    const doc = {
      ...emptyDocument(),
      blocks: [{ id: "i", type: "integrator" } as Block, { id: "p", type: "branch" } as Block],
      layout: { i: { x: 0, y: 0 }, p: { x: 300, y: 100 } },
    };
    const nodes = (measured: Map<string, { width: number; height: number }>) =>
      buildNodes(doc, problemMarks([], null), { selection: { blocks: [], wires: [] }, dragging: new Map(), measured });
    expect(boundsOf(nodes(new Map()).map(nodeBox))).toEqual({ x: 0, y: 0, width: 316, height: 116 });
    const p = nodes(new Map([["p", { width: 20, height: 20 }]])).filter((n) => n.id === "p");
    expect(boundsOf(p.map(nodeBox))).toEqual({ x: 300, y: 100, width: 20, height: 20 });
  });

  it("are null for no boxes", () => {
    expect(boundsOf([])).toBeNull();
  });
});
