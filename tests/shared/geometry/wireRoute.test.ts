import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Point } from "@/features/editor/commands/types";
import { sumDiameter, sumPortPlaces, type Side } from "@shared/geometry/sumPorts";
import { arrowHead, GAP, LEVEL, midpointAlong, roundedPath, wireRoute, type Box } from "@shared/geometry/wireRoute";

const box = (x: number, y: number, width = 80, height = 48): Box => ({ x, y, width, height });
/** Output on the right edge, middle height. */
const outOf = (b: Box): Point => ({ x: b.x + b.width, y: b.y + b.height / 2 });
const inOf = (b: Box, side: Side): Point =>
  side === "left" ? { x: b.x, y: b.y + b.height / 2 } : side === "top" ? { x: b.x + b.width / 2, y: b.y } : { x: b.x + b.width / 2, y: b.y + b.height };

const coord = fc.integer({ min: -600, max: 600 });

/** Whether a segment gets more than 2 px inside the box, found by walking it pixel by pixel. */
function passesUnder(p: Point, q: Point, b: Box): boolean {
  const steps = Math.max(1, Math.ceil(Math.hypot(q.x - p.x, q.y - p.y)));
  for (let i = 0; i <= steps; i += 1) {
    const x = p.x + ((q.x - p.x) * i) / steps;
    const y = p.y + ((q.y - p.y) * i) / steps;
    if (x > b.x + 2 && x < b.x + b.width - 2 && y > b.y + 2 && y < b.y + b.height - 2) return true;
  }
  return false;
}
const routeUnder = (pts: Point[], b: Box) => pts.slice(1).some((q, i) => passesUnder(pts[i], q, b));

describe("wire routing (common practice for block diagrams: orthogonal wires, feedback drawn underneath)", () => {
  it("every route is orthogonal, starts at the output, ends at the input and arrives from the port's side (property)", () => {
    fc.assert(
      fc.property(coord, coord, coord, coord, fc.constantFrom<Side>("left", "top", "bottom"), fc.option(fc.tuple(coord, coord)), (sx, sy, tx, ty, side, other) => {
        const sourceBox = box(sx, sy);
        const targetBox = box(tx, ty);
        const s = outOf(sourceBox);
        const t = inOf(targetBox, side);
        const obstacles = other ? [box(other[0], other[1], 64, 56)] : [];
        const pts = wireRoute({ source: s, target: t, side, sourceBox, targetBox, obstacles });
        // It leaves from the output's edge: from the port itself, or level with the target when that is within LEVEL.
        expect(pts[0].x).toBe(s.x);
        if (pts.length !== 2 || side !== "left") expect(pts[0]).toEqual(s);
        expect(Math.abs(pts[0].y - s.y)).toBeLessThan(LEVEL + 0.5);
        expect(pts[pts.length - 1]).toEqual(t);
        for (let i = 1; i < pts.length; i += 1) expect(pts[i].x === pts[i - 1].x || pts[i].y === pts[i - 1].y).toBe(true);
        if (pts.length < 2) return;
        const [a, b] = [pts[pts.length - 2], pts[pts.length - 1]];
        if (side === "left") expect(a.y === b.y && a.x < b.x).toBe(true);
        if (side === "bottom") expect(a.x === b.x && a.y > b.y).toBe(true);
        if (side === "top") expect(a.x === b.x && a.y < b.y).toBe(true);
        // The first segment leaves the output to the right.
        expect(pts[1].y === pts[0].y && pts[1].x > pts[0].x).toBe(true);
      }),
      { numRuns: 500 },
    );
  });

  it("a forward wire is a single jog halfway between the blocks", () => {
    const a = box(0, 0);
    const b = box(200, 40);
    expect(wireRoute({ source: outOf(a), target: inOf(b, "left"), side: "left", sourceBox: a, targetBox: b })).toEqual([
      { x: 80, y: 24 },
      { x: 140, y: 24 },
      { x: 140, y: 64 },
      { x: 200, y: 64 },
    ]);
  });

  it("ports within LEVEL px of each other in height, target to the right, are joined by one straight run at the target's height", () => {
    const a = box(0, 0);
    const b = box(200, 3);
    expect(wireRoute({ source: outOf(a), target: inOf(b, "left"), side: "left", sourceBox: a, targetBox: b })).toEqual([
      { x: 80, y: 27 },
      { x: 200, y: 27 },
    ]);
    const level = box(200, 0);
    expect(wireRoute({ source: outOf(a), target: inOf(level, "left"), side: "left", sourceBox: a, targetBox: level })).toEqual([outOf(a), inOf(level, "left")]);
    // As measured on the canvas, in fractions of a pixel: 4.00005 apart is still 4 px.
    const measured = box(200, LEVEL + 0.00005);
    expect(wireRoute({ source: outOf(a), target: inOf(measured, "left"), side: "left", sourceBox: a, targetBox: measured })).toHaveLength(2);
    // One pixel more and it is a jog again, as before.
    const off = box(200, LEVEL + 1);
    expect(wireRoute({ source: outOf(a), target: inOf(off, "left"), side: "left", sourceBox: a, targetBox: off })).toHaveLength(4);
  });

  it("blocks 20 px apart at nearly the same height get a straight wire, not the hook under both that they used to get", () => {
    const a = box(0, 0);
    const b = box(100, 2);
    const pts = wireRoute({ source: outOf(a), target: inOf(b, "left"), side: "left", sourceBox: a, targetBox: b });
    expect(pts).toEqual([{ x: 80, y: 26 }, { x: 100, y: 26 }]);
    expect(Math.max(...pts.map((p) => p.y))).toBeLessThan(a.y + a.height);
  });

  it("a jog whose halfway column runs through another block moves its vertical run to the nearest free column", () => {
    const a = box(0, 0);
    const b = box(400, 160);
    // Straddles the halfway column x = 240, between the two ports' heights; its right side is the nearer.
    const block = box(200, 60, 60, 48);
    const pts = wireRoute({ source: outOf(a), target: inOf(b, "left"), side: "left", sourceBox: a, targetBox: b, obstacles: [block] });
    expect(routeUnder(pts, block)).toBe(false);
    expect(pts).toHaveLength(4);
    expect(pts[1].x).toBe(block.x + block.width + GAP / 2);
    // Without the block the column is the halfway one.
    expect(wireRoute({ source: outOf(a), target: inOf(b, "left"), side: "left", sourceBox: a, targetBox: b })[1].x).toBe(240);
  });

  it("a straight wire with a block sitting on it goes around that block below, clear of it", () => {
    const a = box(0, 0);
    const b = box(400, 0);
    const block = box(200, 4, 80, 40);
    const pts = wireRoute({ source: outOf(a), target: inOf(b, "left"), side: "left", sourceBox: a, targetBox: b, obstacles: [block] });
    expect(routeUnder(pts, block)).toBe(false);
    expect(Math.max(...pts.map((p) => p.y))).toBe(48 + GAP);
    expect(pts[pts.length - 1]).toEqual(inOf(b, "left"));
  });

  it("a feedback wire passes below a block between its ends that hangs lower than both", () => {
    const junction = box(0, 0, 48, 48);
    const plant = box(400, 0, 96, 48);
    const hanging = box(200, 40, 80, 60);
    const pts = wireRoute({ source: outOf(plant), target: inOf(junction, "bottom"), side: "bottom", sourceBox: plant, targetBox: junction, obstacles: [hanging] });
    expect(routeUnder(pts, hanging)).toBe(false);
    expect(Math.max(...pts.map((p) => p.y))).toBe(100 + GAP);
  });

  it("a wire into a bottom port whose drop after the stub would run through the junction itself drops beside it", () => {
    // The source sits above and left; its stub ends over the junction's left half.
    const sourceBox = box(0, -30);
    const junction = box(88, 0, 48, 48);
    const pts = wireRoute({ source: outOf(sourceBox), target: inOf(junction, "bottom"), side: "bottom", sourceBox, targetBox: junction });
    expect(routeUnder(pts, junction)).toBe(false);
    expect(routeUnder(pts, sourceBox)).toBe(false);
    expect(pts[pts.length - 1]).toEqual(inOf(junction, "bottom"));
    expect(pts[1]).toEqual({ x: junction.x + junction.width + GAP / 2, y: -6 });
  });

  it("unity feedback from the plant's output into the junction's bottom port runs below both blocks", () => {
    const junction = box(100, 0, 48, 48);
    const plant = box(240, 0, 96, 48);
    const pts = wireRoute({ source: outOf(plant), target: inOf(junction, "bottom"), side: "bottom", sourceBox: plant, targetBox: junction });
    const lowest = Math.max(...pts.map((p) => p.y));
    expect(lowest).toBe(48 + GAP);
    expect(pts.map((p) => p.x).every((x) => x >= junction.x)).toBe(true);
  });

  it("a backward wire into a left port also passes underneath", () => {
    const later = box(400, 0);
    const earlier = box(0, 0);
    const pts = wireRoute({ source: outOf(later), target: inOf(earlier, "left"), side: "left", sourceBox: later, targetBox: earlier });
    expect(Math.max(...pts.map((p) => p.y))).toBe(48 + GAP);
    expect(pts).toHaveLength(6);
  });

  it("a detour that climbs past a top port straight above the output comes back down into it, not up from below", () => {
    // Found by the property above: the output's stub ends exactly under the top port.
    const sourceBox = box(-383, 0);
    const targetBox = box(-327, 0);
    const pts = wireRoute({ source: outOf(sourceBox), target: inOf(targetBox, "top"), side: "top", sourceBox, targetBox });
    expect(pts).toEqual([
      { x: -303, y: 24 },
      { x: -287, y: 24 },
      { x: -287, y: -GAP },
      { x: -287, y: 0 },
    ]);
  });

  it("the SVG path follows the polyline with its corners rounded, less on short segments", () => {
    expect(roundedPath([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 100, y: 50 }])).toBe("M 0 0 L 94 0 Q 100 0 100 6 L 100 50");
    expect(roundedPath([{ x: 0, y: 0 }, { x: 4, y: 0 }, { x: 4, y: 50 }])).toBe("M 0 0 L 2 0 Q 4 0 4 2 L 4 50");
  });
});

describe("the middle of a wire (common practice: the point at half the arc length of the polyline)", () => {
  it("lies on the route, half its length from each end (property)", () => {
    const length = (pts: Point[]) => pts.slice(1).reduce((sum, p, i) => sum + Math.abs(p.x - pts[i].x) + Math.abs(p.y - pts[i].y), 0);
    fc.assert(
      fc.property(coord, coord, coord, coord, fc.constantFrom<Side>("left", "top", "bottom"), (sx, sy, tx, ty, side) => {
        const sourceBox = box(sx, sy);
        const targetBox = box(tx, ty);
        const pts = wireRoute({ source: outOf(sourceBox), target: inOf(targetBox, side), side, sourceBox, targetBox });
        const mid = midpointAlong(pts);
        // The segment holding the midpoint, found independently: the first one whose span contains it.
        const k = pts.slice(1).findIndex((p, i) => Math.min(p.x, pts[i].x) <= mid.x && mid.x <= Math.max(p.x, pts[i].x) && Math.min(p.y, pts[i].y) <= mid.y && mid.y <= Math.max(p.y, pts[i].y));
        expect(k).toBeGreaterThanOrEqual(0);
        const before = [...pts.slice(0, k + 1), { x: mid.x, y: mid.y }];
        expect(length(before)).toBeCloseTo(length(pts) / 2, 6);
        if (pts[k].x !== pts[k + 1].x || pts[k].y !== pts[k + 1].y) expect(mid.horizontal).toBe(pts[k].y === pts[k + 1].y);
      }),
      { numRuns: 300 },
    );
  });

  it("of an L: 10 along then 30 down is 40 long, so the middle is 10 down the vertical leg", () => {
    expect(midpointAlong([{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 30 }])).toEqual({ x: 10, y: 10, horizontal: false });
    expect(midpointAlong([{ x: 0, y: 0 }, { x: 40, y: 0 }])).toEqual({ x: 20, y: 0, horizontal: true });
    expect(midpointAlong([{ x: 5, y: 5 }])).toEqual({ x: 5, y: 5, horizontal: true });
  });
});

describe("summing junction ports", () => {
  it("keep ports 0, 1 and 2 on the left, bottom and top as ports are added (no wire moves when a port is added)", () => {
    for (let n = 3; n <= 16; n += 1) {
      const places = sumPortPlaces(n);
      expect(places.slice(0, 3).map((p) => p.side)).toEqual(["left", "bottom", "top"]);
      expect(places).toHaveLength(n);
      const left = places.filter((p) => p.side === "left").map((p) => p.fraction);
      expect(new Set(left).size).toBe(left.length);
      expect(left.every((f) => f > 0 && f < 1)).toBe(true);
    }
    expect(sumPortPlaces(2).map((p) => p.side)).toEqual(["left", "bottom"]);
    expect(sumDiameter(2)).toBe(48);
    expect(sumDiameter(16)).toBeGreaterThan(sumDiameter(8));
  });
});

describe("arrowhead at a wire's end (the canvas marker's shape: tip, two barbs 7.5 back and 3.375 out, notch 5.625 back)", () => {
  // Coordinates to 0.01, halves rounded up (Math.round): ±3.375 prints as −3.37 and 3.38.
  it("points along a horizontal last segment", () => {
    expect(arrowHead([{ x: 0, y: 0 }, { x: 100, y: 0 }])).toBe("M 92.5 -3.37 L 100 0 L 92.5 3.38 L 94.38 0 Z");
  });

  it("points up a vertical segment into the bottom port of a junction", () => {
    // Travelling up (−y): "back" is +y, and "across" turns with the direction.
    expect(arrowHead([{ x: 0, y: 50 }, { x: 0, y: 10 }])).toBe("M -3.37 17.5 L 0 10 L 3.38 17.5 L 0 15.63 Z");
  });

  it("is empty for fewer than two points", () => {
    expect(arrowHead([{ x: 1, y: 1 }])).toBe("");
  });
});
