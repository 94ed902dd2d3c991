import type { ElkExtendedEdge, ElkNode, ElkPort } from "elkjs/lib/elk-api";
import type { Block } from "@shared/diagram/schema";
import type { EditorDoc, Point } from "@/features/editor/commands/types";
import { sumPortPlaces } from "@shared/geometry/sumPorts";

type Size = { width: number; height: number };
const ELK_SIDE = { left: "WEST", top: "NORTH", bottom: "SOUTH" } as const;
/** Size assumed for a block the canvas has not measured yet. */
const DEFAULT_SIZE: Size = { width: 96, height: 56 };

function ports(block: Block): ElkPort[] {
  const out: ElkPort[] = block.type === "output" ? [] : [{ id: `${block.id}::out`, layoutOptions: { "elk.port.side": "EAST" } }];
  if (block.type === "input") return out;
  if (block.type !== "sum") return [{ id: `${block.id}::in0`, layoutOptions: { "elk.port.side": "WEST" } }, ...out];
  const places = sumPortPlaces(block.signs.length);
  return [...places.map((p, i) => ({ id: `${block.id}::in${i}`, layoutOptions: { "elk.port.side": ELK_SIDE[p.side] } })), ...out];
}

/**
 * The ELK graph of a diagram: layered, left to right, ports fixed to the sides the canvas draws them on.
 * Inputs come first in model order and cycles are broken depth-first from them, so the forward path runs
 * along the top and feedback edges are the ones reversed — laid out underneath.
 */
export function elkGraph(doc: EditorDoc, sizes: ReadonlyMap<string, Size>): ElkNode {
  const back = returnBlocks(doc);
  const rank = (b: Block) => (b.type === "input" ? 0 : b.type === "output" ? 2 : back.has(b.id) ? 3 : 1);
  const blocks = [...doc.blocks].sort((a, b) => rank(a) - rank(b));
  const known = new Set(blocks.map((b) => b.id));
  const children: ElkNode[] = blocks.map((b) => ({
    id: b.id,
    ...(sizes.get(b.id) ?? DEFAULT_SIZE),
    ports: ports(b),
    layoutOptions: { "elk.portConstraints": "FIXED_SIDE" },
  }));
  const edges: ElkExtendedEdge[] = doc.wires
    .filter((w) => known.has(w.from) && known.has(w.to))
    .map((w) => ({ id: w.id, sources: [`${w.from}::out`], targets: [`${w.to}::in${w.port ?? 0}`] }));
  return {
    id: "diagram",
    layoutOptions: {
      "elk.algorithm": "layered",
      "elk.direction": "RIGHT",
      "elk.edgeRouting": "ORTHOGONAL",
      "elk.layered.cycleBreaking.strategy": "DEPTH_FIRST",
      "elk.layered.feedbackEdges": "true",
      "elk.layered.considerModelOrder.strategy": "NODES_AND_EDGES",
      "elk.spacing.nodeNode": "48",
      "elk.layered.spacing.nodeNodeBetweenLayers": "72",
      "elk.padding": "[top=48,left=48,bottom=48,right=48]",
    },
    children,
    edges,
  };
}

/**
 * Blocks that only lead back into the loop: those from which no output can be reached without taking a
 * back edge of a depth-first walk from the inputs (a feedback sensor, a return-path filter).
 */
export function returnBlocks(doc: EditorDoc): Set<string> {
  const next = new Map<string, string[]>(doc.blocks.map((b) => [b.id, []]));
  for (const w of doc.wires) next.get(w.from)?.push(w.to);
  const state = new Map<string, "open" | "done">();
  const backEdges = new Set<string>();
  const visit = (id: string) => {
    state.set(id, "open");
    for (const to of next.get(id) ?? []) {
      if (state.get(to) === "open") backEdges.add(`${id}>${to}`);
      else if (!state.has(to)) visit(to);
    }
    state.set(id, "done");
  };
  for (const b of doc.blocks) if (b.type === "input" && !state.has(b.id)) visit(b.id);
  const prev = new Map<string, string[]>(doc.blocks.map((b) => [b.id, []]));
  for (const w of doc.wires) if (!backEdges.has(`${w.from}>${w.to}`)) prev.get(w.to)?.push(w.from);
  const leadsOut = new Set(doc.blocks.filter((b) => b.type === "output").map((b) => b.id));
  const queue = [...leadsOut];
  for (let k = 0; k < queue.length; k += 1) {
    for (const from of prev.get(queue[k]) ?? []) {
      if (leadsOut.has(from)) continue;
      leadsOut.add(from);
      queue.push(from);
    }
  }
  return new Set(doc.blocks.filter((b) => state.has(b.id) && !leadsOut.has(b.id)).map((b) => b.id));
}

/** Top-left positions of the blocks from a laid-out ELK graph. */
export const elkPositions = (laidOut: ElkNode): Record<string, Point> =>
  Object.fromEntries((laidOut.children ?? []).map((c) => [c.id, { x: c.x ?? 0, y: c.y ?? 0 }]));
