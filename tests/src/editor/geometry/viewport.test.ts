import { describe, expect, it } from "vitest";
import { inBox, revealRegion } from "@/features/editor/geometry/viewport";

// Screen = flow × zoom + offset (common practice for a pan-zoom canvas), so the view's flow rectangle starts at −offset / zoom.
describe("region of a large diagram where live blocks mount", () => {
  it("is the view widened by half its size each side, snapped outward to 400 flow px", () => {
    // View 1000 × 500 at zoom 1 from (0,0): −500…1500 by −250…750, snapped to −800…1600 by −400…800.
    expect(revealRegion([0, 0, 1], { width: 1000, height: 500 })).toEqual({ x: -800, y: -400, width: 2400, height: 1200 });
  });

  it("follows the offset and zoom", () => {
    // Zoom 0.5, offset (−1000, −500): the view shows flow 2000…4000 by 1000…2000; widened 1000…5000 by 500…2500.
    expect(revealRegion([-1000, -500, 0.5], { width: 1000, height: 500 })).toEqual({ x: 800, y: 400, width: 4400, height: 2400 });
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
