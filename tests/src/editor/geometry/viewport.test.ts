import { describe, expect, it } from "vitest";
import { fitZoomEstimate } from "@/features/editor/geometry/viewport";

const limits = { min: 0.2, max: 1, block: 100 };

describe("zoom that fits a set of blocks (common practice: scale = min(view width / content width, view height / content height))", () => {
  it("is set by the tighter of the two directions", () => {
    // Content spans 1000 × 500 (900 + 100 by 400 + 100): 500/1000 = 0.5 beats 300/500 = 0.6.
    expect(fitZoomEstimate([{ x: 0, y: 0 }, { x: 900, y: 400 }], { width: 500, height: 300 }, limits)).toBe(0.5);
    // Content spans 200 × 1000 in a 400 × 400 view: 400/1000 = 0.4.
    expect(fitZoomEstimate([{ x: -50, y: -500 }, { x: 50, y: 400 }], { width: 400, height: 400 }, limits)).toBe(0.4);
  });

  it("stays within the canvas's zoom limits, and an empty diagram keeps the largest", () => {
    expect(fitZoomEstimate([{ x: 0, y: 0 }], { width: 1600, height: 1000 }, limits)).toBe(1);
    expect(fitZoomEstimate([{ x: 0, y: 0 }, { x: 20_000, y: 0 }], { width: 1600, height: 1000 }, limits)).toBe(0.2);
    expect(fitZoomEstimate([], { width: 1600, height: 1000 }, limits)).toBe(1);
  });
});
