import { boundsOf } from "@shared/geometry/blockBox";
import { GAP, type Box } from "@shared/geometry/wireRoute";

/**
 * Boxes bucketed on a coarse grid, so a wire asks for the few blocks near it instead of testing every block of
 * a large diagram. Example: indexBoxes([["a", {x: 0, y: 0, width: 10, height: 10}]]).near({x: 5, y: 5, width: 1, height: 1}) → ["a" entry].
 */
export interface BoxIndex {
  /** The entries whose boxes meet this region. */
  near(region: Box): { id: string; box: Box }[];
}

/** Cell edge in canvas pixels: a few blocks wide, so a wire's region spans a handful of cells. */
const CELL = 256;

const cellsOf = (b: Box) => ({
  x0: Math.floor(b.x / CELL),
  y0: Math.floor(b.y / CELL),
  x1: Math.floor((b.x + b.width) / CELL),
  y1: Math.floor((b.y + b.height) / CELL),
});

type Entry = { id: string; box: Box };

// A number per cell (cells far apart may share one: a shared bucket only costs a few extra box tests).
const cellKey = (i: number, j: number) => i * 92821 + j;

const meets = (a: Box, b: Box) => a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

/** Builds the index once per set of boxes (a document or canvas state), in time linear in their number. */
export function indexBoxes(entries: Iterable<readonly [string, Box]>): BoxIndex {
  const cells = new Map<number, Entry[]>();
  for (const [id, box] of entries) {
    const entry = { id, box };
    const c = cellsOf(box);
    for (let i = c.x0; i <= c.x1; i += 1)
      for (let j = c.y0; j <= c.y1; j += 1) {
        const bucket = cells.get(cellKey(i, j));
        if (bucket) bucket.push(entry);
        else cells.set(cellKey(i, j), [entry]);
      }
  }
  return {
    near(region) {
      const c = cellsOf(region);
      const found = new Set<Entry>();
      for (let i = c.x0; i <= c.x1; i += 1)
        for (let j = c.y0; j <= c.y1; j += 1) {
          const bucket = cells.get(cellKey(i, j));
          if (bucket) for (const entry of bucket) if (meets(entry.box, region)) found.add(entry);
        }
      return [...found];
    },
  };
}

/** How far beyond its two ends' boxes a wire's detours reach before further blocks stop mattering to it. */
const REACH = 3 * GAP;

/**
 * The boxes of the blocks near a wire from block `from` to block `to`, its own two ends left out: what
 * `wireRoute` steers around. Example: with only the two ends indexed → [].
 */
export function obstaclesFor(index: BoxIndex, from: string, to: string, sourceBox: Box, targetBox: Box): Box[] {
  const b = boundsOf([sourceBox, targetBox])!;
  const region = { x: b.x - REACH, y: b.y - REACH, width: b.width + 2 * REACH, height: b.height + 2 * REACH };
  return index.near(region).flatMap((e) => (e.id === from || e.id === to ? [] : [e.box]));
}
