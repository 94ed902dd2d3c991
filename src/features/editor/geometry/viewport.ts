import type { Point } from "@/features/editor/commands/types";
import type { Size } from "@shared/geometry/blockBox";
import type { Box } from "@shared/geometry/wireRoute";

/** Snap of the reveal region, so it changes only every few hundred flow pixels of panning. */
const REGION_STEP = 400;

/**
 * The part of the diagram (flow coordinates) worth mounting live blocks for: the view snapped outward to
 * REGION_STEP, which leaves a margin of up to one step for a block's corner and for the first frames of a pan.
 * Example: view 1000×500 at zoom 1 and offset (−100, −100) → x 0…1200, y 0…800.
 */
export function revealRegion([tx, ty, zoom]: readonly [number, number, number], view: Size): Box {
  const snapDown = (v: number) => Math.floor(v / REGION_STEP) * REGION_STEP;
  const snapUp = (v: number) => Math.ceil(v / REGION_STEP) * REGION_STEP;
  const x0 = snapDown(-tx / zoom);
  const y0 = snapDown(-ty / zoom);
  const x1 = snapUp((view.width - tx) / zoom);
  const y1 = snapUp((view.height - ty) / zoom);
  return { x: x0, y: y0, width: x1 - x0, height: y1 - y0 };
}

/** Whether a point lies in a box (edges included). */
export const inBox = (p: Point, b: Box) => p.x >= b.x && p.x <= b.x + b.width && p.y >= b.y && p.y <= b.y + b.height;
