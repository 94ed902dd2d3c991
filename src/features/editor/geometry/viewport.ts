import type { Point } from "@/features/editor/commands/types";

export interface Size {
  width: number;
  height: number;
}

/**
 * About the zoom at which blocks at these positions (each taken as a `block`-sized square) fill a view,
 * clamped to [min, max]; max when there are no blocks. Example: two blocks at (0,0) and (900,400), block 100,
 * view 500×250 → min(500/1000, 250/500) = 0.5.
 */
export function fitZoomEstimate(positions: Point[], view: Size, { min, max, block }: { min: number; max: number; block: number }): number {
  if (positions.length === 0) return max;
  const xs = positions.map((p) => p.x);
  const ys = positions.map((p) => p.y);
  const width = Math.max(...xs) - Math.min(...xs) + block;
  const height = Math.max(...ys) - Math.min(...ys) + block;
  return Math.min(max, Math.max(min, Math.min(view.width / width, view.height / height)));
}
