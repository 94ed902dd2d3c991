import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { indexBoxes, obstaclesFor } from "@shared/geometry/boxIndex";
import type { Box } from "@shared/geometry/wireRoute";

const boxArb = fc.record({
  x: fc.integer({ min: -2000, max: 2000 }),
  y: fc.integer({ min: -2000, max: 2000 }),
  width: fc.integer({ min: 1, max: 600 }),
  height: fc.integer({ min: 1, max: 600 }),
});

/** Whether two boxes share some area, written out plainly as the reference for the grid. */
const overlap = (a: Box, b: Box) => !(a.x + a.width <= b.x || b.x + b.width <= a.x || a.y + a.height <= b.y || b.y + b.height <= a.y);

describe("box index (common practice: a uniform grid answers region queries like a scan over every box)", () => {
  it("finds exactly the boxes a scan finds, each once (property)", () => {
    fc.assert(
      fc.property(fc.array(boxArb, { maxLength: 60 }), boxArb, (boxes, region) => {
        const index = indexBoxes(boxes.map((b, i) => [`b${i}`, b] as const));
        const found = index.near(region).map((e) => e.id).sort();
        const scanned = boxes.flatMap((b, i) => (overlap(b, region) ? [`b${i}`] : [])).sort();
        expect(found).toEqual(scanned);
      }),
      { numRuns: 300 },
    );
  });

  it("gives a wire the blocks near it, never its own two ends, and not a block far away", () => {
    const a = { x: 0, y: 0, width: 80, height: 48 };
    const b = { x: 300, y: 0, width: 80, height: 48 };
    const between = { x: 150, y: 10, width: 60, height: 40 };
    const far = { x: 5000, y: 5000, width: 60, height: 40 };
    const index = indexBoxes([["a", a], ["b", b], ["between", between], ["far", far]]);
    expect(obstaclesFor(index, "a", "b", a, b)).toEqual([between]);
  });
});
