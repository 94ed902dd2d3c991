import { describe, expect, it } from "vitest";
import { demoDiagrams } from "@server/db/demoDiagrams";
import type { Block } from "@shared/diagram/schema";
import { boxOf, captionBox, fallbackPosition, inPoint, outPoint } from "@shared/geometry/blockBox";
import { indexBoxes } from "@shared/geometry/boxIndex";
import { routeOfWire } from "@shared/geometry/wirePath";
import { wireRoute, type Box, type Point } from "@shared/geometry/wireRoute";

// common practice: a readable block diagram has no overlapping blocks and no wire hidden under a block.

/** How far inside a box a wire must reach to count as under it: a wire into a port touches its block's edge. */
const INSET = 2;

const areaOverlap = (a: Box, b: Box) =>
  Math.min(a.x + a.width, b.x + b.width) - Math.max(a.x, b.x) > 0 && Math.min(a.y + a.height, b.y + b.height) - Math.max(a.y, b.y) > 0;

/** Whether the segment p→q enters the box shrunk by INSET on each side (Liang–Barsky clipping). */
function segmentEnters(p: Point, q: Point, box: Box): boolean {
  const [x0, y0, x1, y1] = [box.x + INSET, box.y + INSET, box.x + box.width - INSET, box.y + box.height - INSET];
  const [dx, dy] = [q.x - p.x, q.y - p.y];
  let [t0, t1] = [0, 1];
  for (const [pk, qk] of [[-dx, p.x - x0], [dx, x1 - p.x], [-dy, p.y - y0], [dy, y1 - p.y]]) {
    if (pk === 0) {
      if (qk <= 0) return false;
      continue;
    }
    const r = qk / pk;
    if (pk < 0) t0 = Math.max(t0, r);
    else t1 = Math.min(t1, r);
    if (t0 >= t1) return false;
  }
  return true;
}

interface Drawn { block: Block; box: Box; caption: Box | null }

function drawn(document: (typeof demoDiagrams)[number]["document"]): Map<string, Drawn> {
  return new Map(
    document.blocks.map((block, i) => {
      const box = boxOf(block, document.layout?.[block.id] ?? fallbackPosition(i), undefined);
      return [block.id, { block, box, caption: captionBox(block, box) }];
    }),
  );
}

describe.each(demoDiagrams.map((d) => [d.title, d.document] as const))("the demo diagram %s", (_title, document) => {
  const blocks = drawn(document);

  it("places every block itself, none left to the fallback grid", () => {
    expect(document.blocks.filter((b) => !document.layout?.[b.id]).map((b) => b.id)).toEqual([]);
  });

  it("has no two blocks (with the caption printed above each) overlapping", () => {
    const overlaps: string[] = [];
    const all = [...blocks.values()];
    all.forEach((a, i) =>
      all.slice(i + 1).forEach((b) => {
        const areasA = [a.box, a.caption].filter((x): x is Box => x !== null);
        const areasB = [b.box, b.caption].filter((x): x is Box => x !== null);
        if (areasA.some((p) => areasB.some((q) => areaOverlap(p, q)))) overlaps.push(`${a.block.id}/${b.block.id}`);
      }),
    );
    expect(overlaps).toEqual([]);
  });

  it("has no wire passing under a block or a caption other than its own two ends'", () => {
    const index = indexBoxes([...blocks.values()].map((d) => [d.block.id, d.box] as const));
    const hidden: string[] = [];
    for (const w of document.wires) {
      const [s, t] = [blocks.get(w.from)!, blocks.get(w.to)!];
      const pts = routeOfWire(w, t.block, s.box, t.box, index);
      for (const other of blocks.values()) {
        if (other.block.id === w.from || other.block.id === w.to) continue;
        const areas = [other.box, other.caption].filter((x): x is Box => x !== null);
        if (pts.slice(1).some((q, i) => areas.some((a) => segmentEnters(pts[i], q, a)))) hidden.push(`${w.id} under ${other.block.id}`);
      }
    }
    expect(hidden).toEqual([]);
  });

  it("joins the blocks of its forward path with straight wires where their ports are level", () => {
    // The reference's wire into the first junction is drawn in one run on every demo: the layout lines it up.
    const first = document.wires[0];
    const [s, t] = [blocks.get(first.from)!, blocks.get(first.to)!];
    const entry = inPoint(t.block, t.box, first.port);
    expect(wireRoute({ source: outPoint(s.box), target: entry.at, side: entry.side, sourceBox: s.box, targetBox: t.box })).toHaveLength(2);
  });
});

describe("the layout check itself", () => {
  it("sees a wire crossing a box, and not one running along its edge", () => {
    const box = { x: 0, y: 0, width: 40, height: 40 };
    expect(segmentEnters({ x: -10, y: 20 }, { x: 50, y: 20 }, box)).toBe(true);
    expect(segmentEnters({ x: -10, y: 0 }, { x: 50, y: 0 }, box)).toBe(false);
    expect(segmentEnters({ x: -10, y: 20 }, { x: 0, y: 20 }, box)).toBe(false);
  });
});
