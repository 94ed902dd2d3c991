import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { demoDiagrams } from "@server/db/demoDiagrams";
import { boundsOf } from "@shared/geometry/blockBox";
import { indexBoxes } from "@shared/geometry/boxIndex";
import { routeOfWire } from "@shared/geometry/wirePath";
import type { Box } from "@shared/geometry/wireRoute";
import { reduceDocument } from "@shared/reduce/reduceDiagram";
import { withWireIds } from "@/features/editor/commands/document";
import { nodeBox } from "@/features/editor/geometry/nodeBox";
import { CALLOUT_GAP, placeCallout, segmentBoxes, stepCallout } from "@/features/editor/geometry/stepCallout";
import { buildNodes } from "@/features/editor/lib/flowModel";
import { problemMarks, stepFootprint } from "@/features/editor/lib/marks";

// common practice (technical figures): a callout stands beside what it annotates, never over it, where the drawing is free.

const meets = (a: Box, b: Box) => a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
const size = { width: 120, height: 40 };
const row: Box[] = [
  { x: 0, y: 0, width: 80, height: 48 },
  { x: 160, y: 0, width: 80, height: 48 },
];

describe("placing a step's callout", () => {
  it("goes below what it explains, aligned to its left, when the drawing is free there", () => {
    expect(placeCallout(row, size, [])).toEqual({ x: 0, y: 48 + CALLOUT_GAP, ...size });
  });

  it("takes the free side: right of the row when a block lies below it, above when the right is taken too", () => {
    const below: Box = { x: -20, y: 70, width: 300, height: 60 };
    expect(placeCallout(row, size, [below])).toEqual({ x: 240 + CALLOUT_GAP, y: 0, ...size });
    const right: Box = { x: 250, y: -60, width: 100, height: 200 };
    expect(placeCallout(row, size, [below, right])).toEqual({ x: 0, y: -CALLOUT_GAP - size.height, ...size });
  });

  it("covers the least of the drawing when no side is free, and never what it explains (random boxes, 300 cases)", () => {
    const boxArb = fc.record({ x: fc.integer({ min: -500, max: 500 }), y: fc.integer({ min: -500, max: 500 }), width: fc.integer({ min: 1, max: 200 }), height: fc.integer({ min: 1, max: 200 }) });
    fc.assert(
      fc.property(fc.array(boxArb, { minLength: 1, maxLength: 6 }), fc.array(boxArb, { maxLength: 8 }), boxArb, (explained, others, s) => {
        const spot = placeCallout(explained, { width: s.width, height: s.height }, others)!;
        for (const e of explained) expect(meets(spot, e)).toBe(false);
        const b = boundsOf(explained)!;
        const apart = Math.max(b.x - (spot.x + spot.width), spot.x - (b.x + b.width), b.y - (spot.y + spot.height), spot.y - (b.y + b.height));
        expect(apart).toBe(CALLOUT_GAP);
      }),
      { numRuns: 300 },
    );
  });

  it("a wire's segments become boxes as wide as its stroke", () => {
    expect(segmentBoxes([{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 30 }])).toEqual([
      { x: -5, y: -5, width: 20, height: 10 },
      { x: 5, y: -5, width: 10, height: 40 },
    ]);
  });

  it("the feedback step of the felt conveyor loop: the callout clears its blocks and the tachometer wire returning under the row", () => {
    const demo = demoDiagrams.find((d) => d.title === "Felt conveyor speed loop")!;
    const doc = withWireIds(demo.document);
    const outcome = reduceDocument(demo.document);
    if (!outcome.ok) throw new Error("the demo reduces");
    const steps = outcome.result.steps;
    const at = steps.findIndex((s) => s.rule === "feedback");
    const footprint = stepFootprint(steps, at);
    expect([...footprint.blocks].sort()).toEqual(["drive", "err", "pi", "tacho"]);
    const nodes = buildNodes(doc, problemMarks([], footprint), { selection: { blocks: [], wires: [] }, dragging: new Map(), measured: new Map() });
    const spot = stepCallout(nodes, doc, footprint, size)!;
    const boxes = new Map(nodes.map((n) => [n.id, nodeBox(n)]));
    for (const id of footprint.blocks) expect(meets(spot, boxes.get(id)!), id).toBe(false);
    const index = indexBoxes([...boxes]);
    for (const w of doc.wires.filter((x) => footprint.wires.has(x.id))) {
      const route = routeOfWire(w, doc.blocks.find((b) => b.id === w.to)!, boxes.get(w.from)!, boxes.get(w.to)!, index);
      for (const seg of segmentBoxes(route)) expect(meets(spot, seg), w.id).toBe(false);
    }
  });
});
