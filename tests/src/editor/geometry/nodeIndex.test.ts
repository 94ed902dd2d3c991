import { describe, expect, it } from "vitest";
import type { Block } from "@shared/diagram/schema";
import { emptyDocument } from "@/features/editor/commands/document";
import { nearbyBlocks } from "@/features/editor/geometry/nodeIndex";
import { nodeBox } from "@/features/editor/geometry/nodeBox";
import { buildNodes } from "@/features/editor/lib/flowModel";
import { problemMarks } from "@/features/editor/lib/marks";

const doc = (middleAt: { x: number; y: number }) => ({
  ...emptyDocument(),
  blocks: [{ id: "a", type: "integrator" }, { id: "m", type: "integrator" }, { id: "b", type: "integrator" }, { id: "far", type: "integrator" }] as Block[],
  layout: { a: { x: 0, y: 0 }, m: middleAt, b: { x: 400, y: 0 }, far: { x: 9000, y: 9000 } },
});
const nodesOf = (d: ReturnType<typeof doc>) => buildNodes(d, problemMarks([], null), { selection: { blocks: [], wires: [] }, dragging: new Map(), measured: new Map() });

describe("the blocks near a canvas wire (common practice: ask a spatial grid, and keep an answer until its inputs change)", () => {
  it("are the blocks between its ends, not its ends and not a block far away", () => {
    const nodes = nodesOf(doc({ x: 200, y: 0 }));
    const [a, m, b] = nodes.map(nodeBox);
    expect(nearbyBlocks(nodes, "a", "b", a, b)).toEqual([m]);
  });

  it("are the same array on a second ask (a pan frame), and a new answer once a block has moved", () => {
    const nodes = nodesOf(doc({ x: 200, y: 0 }));
    const [a, , b] = nodes.map(nodeBox);
    const first = nearbyBlocks(nodes, "a", "b", a, b);
    expect(nearbyBlocks(nodes, "a", "b", a, b)).toBe(first);
    const moved = nodesOf(doc({ x: 200, y: 2000 }));
    expect(nearbyBlocks(moved, "a", "b", a, b)).toEqual([]);
  });
});
