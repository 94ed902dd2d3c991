import { describe, expect, it } from "vitest";
import { freeSpot } from "@/features/editor/geometry/freeSpot";

// common practice: a block added to a diagram never lands on another one.
describe("freeSpot", () => {
  const size = { width: 80, height: 48 };
  it("keeps the place when it is free", () => {
    expect(freeSpot({ x: 0, y: 0 }, size, [{ x: 200, y: 0, width: 80, height: 48 }], 16, 32)).toEqual({ x: 0, y: 0 });
  });
  it("steps down past every box in the way, keeping the gap", () => {
    const taken = [
      { x: 0, y: 0, width: 80, height: 48 },
      { x: 40, y: 64, width: 80, height: 48 },
    ];
    const spot = freeSpot({ x: 10, y: 10 }, size, taken, 16, 32);
    expect(spot.x).toBe(10);
    expect(spot.y).toBeGreaterThanOrEqual(64 + 48 + 16);
    for (const b of taken) expect(spot.y >= b.y + b.height + 16 || spot.y + 48 + 16 <= b.y).toBe(true);
  });
});
