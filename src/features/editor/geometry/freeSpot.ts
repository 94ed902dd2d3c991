import type { Box } from "@shared/geometry/wireRoute";
import type { Point } from "@/features/editor/commands/types";

const overlaps = (a: Box, b: Box, gap: number) =>
  a.x < b.x + b.width + gap && b.x < a.x + a.width + gap && a.y < b.y + b.height + gap && b.y < a.y + a.height + gap;

/**
 * The first place at or below `at`, in steps of `step`, where a box of `size` keeps `gap` clear of every box in
 * `taken`: where a block added by key or click goes, so it never lands on another. Gives up after 200 steps
 * (a column that full is not a diagram anyone draws) and returns the last place tried.
 * Example: freeSpot({ x: 0, y: 0 }, { width: 80, height: 48 }, [{ x: 0, y: 0, width: 80, height: 48 }], 16, 64) → { x: 0, y: 64 }.
 */
export function freeSpot(at: Point, size: { width: number; height: number }, taken: readonly Box[], gap: number, step: number): Point {
  const spot = { ...at };
  for (let i = 0; i < 200 && taken.some((b) => overlaps({ ...spot, ...size }, b, gap)); i++) spot.y += step;
  return spot;
}
