import { boundsOf, captionBox, type Size } from "@shared/geometry/blockBox";
import { indexBoxes } from "@shared/geometry/boxIndex";
import { routeOfWire } from "@shared/geometry/wirePath";
import type { Box, Point } from "@shared/geometry/wireRoute";
import type { EditorDoc } from "@/features/editor/commands/types";
import { nodeBox } from "@/features/editor/geometry/nodeBox";
import type { FlowNode } from "@/features/editor/lib/flowModel";

/** Space between a step's callout and what it explains. */
export const CALLOUT_GAP = 16;
/** How far a wire's stroke and arrowhead reach either side of its line. */
const STROKE = 5;

/** A polyline's segments as boxes as wide as its stroke. Example: [(0, 0), (10, 0)] → [{ x: −5, y: −5, width: 20, height: 10 }]. */
export function segmentBoxes(points: readonly Point[]): Box[] {
  return points.slice(1).map((p, i) => {
    const a = points[i];
    const x = Math.min(a.x, p.x) - STROKE;
    const y = Math.min(a.y, p.y) - STROKE;
    return { x, y, width: Math.abs(p.x - a.x) + 2 * STROKE, height: Math.abs(p.y - a.y) + 2 * STROKE };
  });
}

const overlap = (a: Box, b: Box) =>
  Math.max(0, Math.min(a.x + a.width, b.x + b.width) - Math.max(a.x, b.x)) * Math.max(0, Math.min(a.y + a.height, b.y + b.height) - Math.max(a.y, b.y));

/**
 * Where a callout of `size` goes: beside the bounding box of what it explains, `CALLOUT_GAP` away, so it never covers
 * any of it; of the spots below, right of, above and left of that box (each aligned to its start, middle or end),
 * the one covering the least of `others` (the rest of the drawing), the earlier in that order when they tie.
 * Example: blocks explained in a row with another block right of them → the spot below, aligned to the row's left.
 */
export function placeCallout(explained: readonly Box[], size: Size, others: readonly Box[]): Box | null {
  const b = boundsOf(explained);
  if (!b) return null;
  const alongX = [b.x, b.x + (b.width - size.width) / 2, b.x + b.width - size.width];
  const alongY = [b.y, b.y + (b.height - size.height) / 2, b.y + b.height - size.height];
  const spots: Point[] = [
    ...alongX.map((x) => ({ x, y: b.y + b.height + CALLOUT_GAP })),
    ...alongY.map((y) => ({ x: b.x + b.width + CALLOUT_GAP, y })),
    ...alongX.map((x) => ({ x, y: b.y - CALLOUT_GAP - size.height })),
    ...alongY.map((y) => ({ x: b.x - CALLOUT_GAP - size.width, y })),
  ];
  let best: Box | null = null;
  let least = Infinity;
  for (const at of spots) {
    const box = { ...at, ...size };
    const covered = others.reduce((sum, o) => sum + overlap(box, o), 0);
    if (covered < least) [best, least] = [box, covered];
  }
  return best;
}

/**
 * The canvas box of a step's callout: what the step explains is its blocks with their captions and its wires as
 * routed between them; the other blocks and captions are what it should cover least.
 * Example: stepCallout(nodes, doc, { blocks: new Set(["G1", "e1"]), wires: new Set(["w2", "w3"]) }, size).
 */
export function stepCallout(nodes: readonly FlowNode[], doc: EditorDoc, footprint: { blocks: ReadonlySet<string>; wires: ReadonlySet<string> }, size: Size): Box | null {
  const boxes = new Map(nodes.map((n) => [n.id, { block: n.data.block, box: nodeBox(n) }]));
  const explained: Box[] = [];
  const others: Box[] = [];
  for (const [id, { block, box }] of boxes) {
    const caption = captionBox(block, box);
    (footprint.blocks.has(id) ? explained : others).push(box, ...(caption ? [caption] : []));
  }
  const index = indexBoxes([...boxes].map(([id, p]) => [id, p.box] as const));
  for (const w of doc.wires) {
    const [s, t] = [boxes.get(w.from), boxes.get(w.to)];
    if (footprint.wires.has(w.id) && s && t) explained.push(...segmentBoxes(routeOfWire(w, t.block, s.box, t.box, index)));
  }
  return placeCallout(explained, size, others);
}
