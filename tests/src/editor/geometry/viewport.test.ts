import { describe, expect, it } from "vitest";
import { inBox, revealRegion } from "@/features/editor/geometry/viewport";

// Screen = flow × zoom + offset (common practice for a pan-zoom canvas): the view shows flow −offset / zoom … (size − offset) / zoom.
describe("region of a large diagram where live blocks mount", () => {
  it("is the view snapped outward to 400 flow px", () => {
    // View 1000 × 500 at zoom 1 from offset (−100, −100): flow 100…1100 by 100…600, snapped to 0…1200 by 0…800.
    expect(revealRegion([-100, -100, 1], { width: 1000, height: 500 })).toEqual({ x: 0, y: 0, width: 1200, height: 800 });
  });

  it("follows the offset and zoom", () => {
    // Zoom 0.5, offset (−1000, −500): the view shows flow 2000…4000 by 1000…2000; x is on the 400 grid, y snaps to 800…2000.
    expect(revealRegion([-1000, -500, 0.5], { width: 1000, height: 500 })).toEqual({ x: 2000, y: 800, width: 2000, height: 1200 });
  });

  it("does not change while the view pans within one snap step", () => {
    const at = (tx: number) => revealRegion([tx, 0, 1], { width: 1000, height: 500 });
    expect(at(-10)).toEqual(at(-90));
    expect(at(-10)).not.toEqual(at(-450));
  });
});

describe("point in a box", () => {
  const box = { x: 0, y: 0, width: 10, height: 5 };
  it("counts the edges as inside", () => {
    expect(inBox({ x: 10, y: 5 }, box)).toBe(true);
    expect(inBox({ x: 0, y: 0 }, box)).toBe(true);
  });
  it("is false just outside", () => {
    expect(inBox({ x: 10.01, y: 2 }, box)).toBe(false);
    expect(inBox({ x: 5, y: -0.01 }, box)).toBe(false);
  });
});
