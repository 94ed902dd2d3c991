import type { Block } from "@shared/diagram/schema";
import { sumDiameter, sumPortPlaces, type Side } from "@shared/geometry/sumPorts";
import type { Box, Point } from "@shared/geometry/wireRoute";

export interface Size {
  width: number;
  height: number;
}

/** Approximate advance of one character of a block's text (mono 14 px; typeset formulas run a little wider). */
const CHAR = 8.5;
const textWidth = (text: string, min: number, max: number) => Math.min(max, Math.max(min, text.length * CHAR));

/**
 * About the size a block is drawn at, from its type and text, for a block the canvas has not measured yet
 * (the overview of a large diagram never mounts its blocks; the SVG export has no canvas). Sizes follow the
 * editor's block views' own classes. Example: a sum with 2 signs → 48 × 48; an integrator → 64 × 48.
 */
export function estimatedSize(block: Block): Size {
  switch (block.type) {
    case "sum": {
      const d = sumDiameter(block.signs.length);
      return { width: d, height: d };
    }
    case "branch":
      return { width: 16, height: 16 };
    case "integrator":
      return { width: 64, height: 48 };
    case "input":
    case "output":
      return { width: Math.max(56, 52 + textWidth(block.label ?? block.id, 8, 240)), height: 36 };
    case "gain":
      return { width: Math.max(80, 36 + textWidth(block.expr, 16, 220)), height: 56 };
    case "delay":
      return { width: Math.max(88, 56 + textWidth(block.expr, 16, 200)), height: 48 };
    case "transfer": {
      const fraction = block.expr.includes("/");
      return { width: Math.max(80, 28 + textWidth(fraction ? block.expr.slice(0, Math.ceil(block.expr.length / 2)) : block.expr, 16, 260)), height: fraction ? 60 : 48 };
    }
  }
}

/** The caption the canvas prints above a block (mono 11 px: 6.6 px a character, a 16.5-px line and a 2-px gap). */
const CAPTION = { char: 6.6, height: 19 };

/**
 * The area of the caption above a block ("label · id", centred on it), or null for a terminal, whose name is
 * inside it. Example: a gain "1" labelled "tachometer" with id "tacho" at (0, 100), 80 wide → 118.8 × 19 at (−19.4, 81).
 */
export function captionBox(block: Block, b: Box): Box | null {
  if (block.type === "input" || block.type === "output") return null;
  const width = (block.label ? `${block.label} · ${block.id}` : block.id).length * CAPTION.char;
  return { x: b.x + b.width / 2 - width / 2, y: b.y - CAPTION.height, width, height: CAPTION.height };
}

/** Where a block without a stored position is placed: a loose grid in document order. Example: 0 → (48, 48). */
export const fallbackPosition = (index: number): Point => ({ x: 48 + (index % 6) * 176, y: 48 + Math.floor(index / 6) * 128 });

/** The block's box: its measured size when there is one, else the estimate. */
export const boxOf = (block: Block, at: Point, measured: Size | undefined): Box => ({ ...at, ...(measured ?? estimatedSize(block)) });

/** Where a wire leaves a block: the middle of its right side. */
export const outPoint = (b: Box): Point => ({ x: b.x + b.width, y: b.y + b.height / 2 });

/** Where a wire enters a block, and on which side: a junction's port by its place on the circle, else the middle of the left side. */
export function inPoint(block: Block, b: Box, port: number | undefined): { at: Point; side: Side } {
  const place = block.type === "sum" && port !== undefined ? sumPortPlaces(block.signs.length)[port] : undefined;
  if (!place || place.side === "left") return { at: { x: b.x, y: b.y + b.height * (place?.fraction ?? 0.5) }, side: "left" };
  const x = b.x + b.width * place.fraction;
  return { at: { x, y: place.side === "top" ? b.y : b.y + b.height }, side: place.side };
}

/** The smallest box around these boxes; null for none. */
export function boundsOf(boxes: Iterable<Box>): Box | null {
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  for (const b of boxes) {
    x0 = Math.min(x0, b.x);
    y0 = Math.min(y0, b.y);
    x1 = Math.max(x1, b.x + b.width);
    y1 = Math.max(y1, b.y + b.height);
  }
  return x0 === Infinity ? null : { x: x0, y: y0, width: x1 - x0, height: y1 - y0 };
}
