import type { Point } from "@/features/editor/commands/types";
import type { Box } from "@/features/editor/geometry/wireRoute";

export interface Size {
  width: number;
  height: number;
}

/** Snap of the reveal region, so it changes only every few hundred flow pixels of panning. */
const REGION_STEP = 400;

/**
 * The part of the diagram (flow coordinates) worth mounting live blocks for: the view widened by half its
 * size on each side, snapped outward to REGION_STEP. Example: view 1000×500 at zoom 1 and offset 0 →
 * x −800…1600, y −400…800.
 */
export function revealRegion([tx, ty, zoom]: readonly [number, number, number], view: Size): Box {
  const w = view.width / zoom;
  const h = view.height / zoom;
  const x0 = Math.floor((-tx / zoom - w / 2) / REGION_STEP) * REGION_STEP;
  const y0 = Math.floor((-ty / zoom - h / 2) / REGION_STEP) * REGION_STEP;
  const x1 = Math.ceil((-tx / zoom + w * 1.5) / REGION_STEP) * REGION_STEP;
  const y1 = Math.ceil((-ty / zoom + h * 1.5) / REGION_STEP) * REGION_STEP;
  return { x: x0, y: y0, width: x1 - x0, height: y1 - y0 };
}

/** Whether a point lies in a box (edges included). */
export const inBox = (p: Point, b: Box) => p.x >= b.x && p.x <= b.x + b.width && p.y >= b.y && p.y <= b.y + b.height;
