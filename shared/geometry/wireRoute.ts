import type { Side } from "@shared/geometry/sumPorts";

export interface Point {
  x: number;
  y: number;
}

export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Whether two boxes have the same place and size. */
export const sameBox = (a: Box, b: Box) => a.x === b.x && a.y === b.y && a.width === b.width && a.height === b.height;

/** Whether two lists hold the same boxes in the same order. */
export const sameBoxes = (a: readonly Box[], b: readonly Box[]) => a.length === b.length && a.every((box, i) => sameBox(box, b[i]));

export interface WireEnds {
  /** Where the wire leaves the source's output (on its right side). */
  source: Point;
  /** Where it enters the target's input port. */
  target: Point;
  /** The side of the target the port is on. */
  side: Side;
  sourceBox: Box;
  targetBox: Box;
  /** Other blocks near the wire (see `obstaclesFor`), which the route goes around when one of its shapes can. */
  obstacles?: readonly Box[];
}

/** Straight run out of an output and into an input before the first bend. */
const STUB = 16;
/** Clearance between a detour and the blocks it passes. */
export const GAP = 24;
/** Ports at most this far apart in height are joined by one straight run rather than a jog of a few pixels. */
export const LEVEL = 4;
/** How far into a box a wire must reach to pass under it: running along its edge, as wires into ports do, is not. */
const INSET = 2;

const bottom = (b: Box) => b.y + b.height;
const right = (b: Box) => b.x + b.width;

/**
 * The orthogonal polyline of a signal wire. Ports at about the same height with the target to the right are
 * joined straight (at the target's height); other forward wires take one vertical jog halfway, or in the
 * nearest free column beside the blocks in the way; wires that must run backwards (feedback) leave to the
 * right, pass underneath both blocks and come back, so return paths sit below the forward path; wires into
 * the bottom or top port of a junction arrive vertically. Of these shapes the first that passes under no
 * block (the two ends' included) is taken, else the first one.
 * Example: (80, 24) → (200, 26) on the left → [(80, 26), (200, 26)].
 */
export function wireRoute(ends: WireEnds): Point[] {
  const search: Search = { blockers: [ends.sourceBox, ends.targetBox, ...(ends.obstacles ?? [])], first: undefined };
  return firstClear(ends, search) ?? search.first!;
}

/** The blocks a route must keep off, and the first shape offered (taken when none is clear). */
interface Search {
  blockers: Box[];
  first: Point[] | undefined;
}

/** The route if it passes under none of the blocks. Plain functions, no closures: every wire of a large diagram comes here. */
function take(route: Point[], search: Search): Point[] | undefined {
  search.first ??= route;
  return isClear(route, search.blockers) ? route : undefined;
}

/** The wire's candidate shapes, best first, built one at a time (the first is usually clear); the first clear one. */
function firstClear(ends: WireEnds, search: Search): Point[] | undefined {
  const { source: s, target: t, side } = ends;
  const out = s.x + STUB;
  if (side === "left") {
    // To the nearest pixel: the canvas measures its ports in fractions of one (4.00005 apart is 4).
    const straight = t.x > s.x && Math.abs(t.y - s.y) < LEVEL + 0.5 ? take([{ x: s.x, y: t.y }, t], search) : undefined;
    const jogged = straight ?? (t.x - s.x >= 2 * STUB ? firstColumn("jog", out, t.x - STUB, (s.x + t.x) / 2, ends, search) : undefined);
    // Columns for the run down (or up) out of the output: right after its stub, else beside the blocks in the way.
    return jogged ?? firstColumn("under", out, Infinity, out, ends, search) ?? firstColumn("over", out, Infinity, out, ends, search);
  }
  const direct = t.x >= out && (side === "bottom" ? s.y >= t.y + STUB : s.y <= t.y - STUB);
  const bent = direct ? take(simplify([s, { x: t.x, y: s.y }, t]), search) : undefined;
  return bent ?? firstColumn(side === "bottom" ? "intoBottom" : "intoTop", out, Infinity, out, ends, search);
}

/** A shape with one free column x: a jog, a detour below or above both ends, a detour into a bottom or top port. */
type Family = "jog" | "under" | "over" | "intoBottom" | "intoTop";

function shapeAt(family: Family, x: number, { source: s, target: t, sourceBox, targetBox }: WireEnds, blockers: Box[]): Point[] {
  switch (family) {
    case "jog":
      return simplify([s, { x, y: s.y }, { x, y: t.y }, t]);
    case "under":
    case "over": {
      const back = t.x - STUB;
      const y =
        family === "under"
          ? clearLevel(Math.max(bottom(sourceBox), bottom(targetBox)) + GAP, back, x, blockers, 1)
          : clearLevel(Math.min(sourceBox.y, targetBox.y) - GAP, back, x, blockers, -1);
      return simplify([s, { x, y: s.y }, { x, y }, { x: back, y }, { x: back, y: t.y }, t]);
    }
    case "intoBottom":
    case "intoTop": {
      const y =
        family === "intoBottom"
          ? clearLevel(Math.max(bottom(sourceBox), bottom(targetBox), t.y) + GAP, t.x, x, blockers, 1)
          : clearLevel(Math.min(sourceBox.y, targetBox.y, t.y) - GAP, t.x, x, blockers, -1);
      return simplify([s, { x, y: s.y }, { x, y }, { x: t.x, y }, t]);
    }
  }
}

/**
 * The first clear shape of the family with its column between `lo` and `hi`: the preferred x first, then (only
 * if that is blocked) half a gap beside each block, nearest the preferred first.
 */
function firstColumn(family: Family, lo: number, hi: number, preferred: number, ends: WireEnds, search: Search): Point[] | undefined {
  const best = take(shapeAt(family, preferred, ends, search.blockers), search);
  if (best) return best;
  const xs = new Set<number>();
  for (const b of search.blockers) for (const x of [b.x - GAP / 2, right(b) + GAP / 2]) if (x >= lo && x <= hi && x !== preferred) xs.add(x);
  for (const x of [...xs].sort((a, b) => Math.abs(a - preferred) - Math.abs(b - preferred))) {
    const route = take(shapeAt(family, x, ends, search.blockers), search);
    if (route) return route;
  }
  return undefined;
}

/** The first height from `start` on, going down (+1) or up (−1), at which a run from x0 to x1 keeps a half gap off every block. */
function clearLevel(start: number, x0: number, x1: number, blockers: Box[], way: 1 | -1): number {
  const [a, b] = x0 < x1 ? [x0, x1] : [x1, x0];
  let y = start;
  for (let moved = true; moved; ) {
    moved = false;
    for (const box of blockers) {
      if (right(box) <= a || box.x >= b || y <= box.y - GAP / 2 || y >= bottom(box) + GAP / 2) continue;
      y = way === 1 ? bottom(box) + GAP : box.y - GAP;
      moved = true;
    }
  }
  return y;
}

/** Whether no segment of the route reaches more than INSET into any of the boxes. */
function isClear(route: Point[], blockers: Box[]): boolean {
  for (let i = 1; i < route.length; i += 1) {
    const [p, q] = [route[i - 1], route[i]];
    const [x0, x1, y0, y1] = [Math.min(p.x, q.x), Math.max(p.x, q.x), Math.min(p.y, q.y), Math.max(p.y, q.y)];
    for (const b of blockers)
      if (x1 > b.x + INSET && x0 < right(b) - INSET && y1 > b.y + INSET && y0 < bottom(b) - INSET) return false;
  }
  return true;
}

/**
 * Drops repeated points and the middle of three collinear points that run one way; a point where the wire
 * turns back on itself stays, or a detour above a top port would end arriving from below.
 */
function simplify(points: Point[]): Point[] {
  const kept: Point[] = [];
  for (const p of points) {
    const last = kept[kept.length - 1];
    if (last && last.x === p.x && last.y === p.y) continue;
    const prev = kept[kept.length - 2];
    const onward = prev && last && (last.x - prev.x) * (p.x - last.x) >= 0 && (last.y - prev.y) * (p.y - last.y) >= 0;
    if (onward && ((prev.x === last.x && last.x === p.x) || (prev.y === last.y && last.y === p.y))) kept.pop();
    kept.push(p);
  }
  return kept;
}

/** SVG path through the points with corners rounded by at most `radius` (less on short segments). */
export function roundedPath(points: Point[], radius = 6): string {
  if (points.length === 0) return "";
  let d = `M ${points[0].x} ${points[0].y}`;
  for (let i = 1; i < points.length - 1; i += 1) {
    const [a, b, c] = [points[i - 1], points[i], points[i + 1]];
    const r = Math.min(radius, Math.hypot(b.x - a.x, b.y - a.y) / 2, Math.hypot(c.x - b.x, c.y - b.y) / 2);
    const before = towards(b, a, r);
    const after = towards(b, c, r);
    d += ` L ${before.x} ${before.y} Q ${b.x} ${b.y} ${after.x} ${after.y}`;
  }
  const end = points[points.length - 1];
  return `${d} L ${end.x} ${end.y}`;
}

/**
 * A closed arrowhead at the end of a polyline, pointing along its last segment, in the shape of the canvas's
 * wire marker (9 px long). Example: ending at (100, 0) from the left → "M 92.5 -3.37 L 100 0 L 92.5 3.38 L 94.38 0 Z" (halves round up).
 */
export function arrowHead(points: Point[]): string {
  if (points.length < 2) return "";
  const tip = points[points.length - 1];
  const from = points[points.length - 2];
  const length = Math.hypot(tip.x - from.x, tip.y - from.y) || 1;
  const [ux, uy] = [(tip.x - from.x) / length, (tip.y - from.y) / length];
  // Corners in the head's own frame (along the wire, across it), from the marker's 12-unit drawing scaled to 9 px.
  const at = (along: number, across: number) => `${round2(tip.x + ux * along - uy * across)} ${round2(tip.y + uy * along + ux * across)}`;
  return `M ${at(-7.5, -3.375)} L ${at(0, 0)} L ${at(-7.5, 3.375)} L ${at(-5.625, 0)} Z`;
}

const round2 = (v: number) => Math.round(v * 100) / 100 + 0;

function towards(from: Point, to: Point, distance: number): Point {
  const length = Math.hypot(to.x - from.x, to.y - from.y) || 1;
  return { x: from.x + ((to.x - from.x) / length) * distance, y: from.y + ((to.y - from.y) / length) * distance };
}

/** A point on a wire and the direction of the segment it lies on. */
export interface WirePlace extends Point {
  horizontal: boolean;
}

/**
 * The point halfway along a polyline by length, on the segment that holds it (a zero-length polyline gives
 * its first point). Example: [(0,0), (10,0), (10,30)] → (10, 5), vertical.
 */
export function midpointAlong(points: Point[]): WirePlace {
  const lengths = points.slice(1).map((p, i) => Math.hypot(p.x - points[i].x, p.y - points[i].y));
  let left = lengths.reduce((a, b) => a + b, 0) / 2;
  for (let i = 0; i < lengths.length; i += 1) {
    const [a, b] = [points[i], points[i + 1]];
    if (lengths[i] > 0 && left <= lengths[i]) {
      const f = left / lengths[i];
      return { x: a.x + (b.x - a.x) * f, y: a.y + (b.y - a.y) * f, horizontal: a.y === b.y };
    }
    left -= lengths[i];
  }
  return { x: points[0]?.x ?? 0, y: points[0]?.y ?? 0, horizontal: true };
}
