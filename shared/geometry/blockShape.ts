import type { BlockType } from "@shared/diagram/schema";

/** The outline a block is drawn with when it is drawn as plain SVG (the editor's overview, the SVG export). */
export type BlockShape = "circle" | "dot" | "triangle" | "pill" | "box" | "slant";

/** Every kind's outline, one row each. Example: BLOCK_SHAPES.gain === "triangle" (pointing the way the signal goes). */
export const BLOCK_SHAPES: { readonly [T in BlockType]: BlockShape } = {
  input: "pill",
  output: "pill",
  sum: "circle",
  branch: "dot",
  gain: "triangle",
  transfer: "box",
  integrator: "box",
  // A parallelogram leaning the way time runs: a dead time shifts the signal, it does not shape it.
  delay: "slant",
};
