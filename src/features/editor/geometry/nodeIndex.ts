import { indexBoxes, obstaclesFor, type BoxIndex } from "@shared/geometry/boxIndex";
import type { Box } from "@shared/geometry/wireRoute";
import { nodeBox } from "@/features/editor/geometry/nodeBox";
import type { FlowNode } from "@/features/editor/lib/flowModel";

interface Nearby {
  sourceBox: Box;
  targetBox: Box;
  boxes: Box[];
}

// Every live wire asks for its nearby blocks on each store update, pan frames included. The grid is built once
// per nodes array the canvas is given (a move or a resize gives a new one), and each wire's answer is kept until
// the array or one of its ends' boxes changes, so a pan frame costs a wire a lookup, not a query.
const built = new WeakMap<readonly FlowNode[], { index: BoxIndex; answers: Map<string, Nearby> }>();

/**
 * The boxes of the canvas's blocks near a wire from `from` to `to`, its ends left out (see `obstaclesFor`);
 * the same array as last time while nothing it depends on changed.
 */
export function nearbyBlocks(nodes: readonly FlowNode[], from: string, to: string, sourceBox: Box, targetBox: Box): Box[] {
  let state = built.get(nodes);
  if (!state) built.set(nodes, (state = { index: indexBoxes(nodes.map((n) => [n.id, nodeBox(n)] as const)), answers: new Map() }));
  const key = `${from}\u0000${to}`;
  const kept = state.answers.get(key);
  if (kept && kept.sourceBox === sourceBox && kept.targetBox === targetBox) return kept.boxes;
  const boxes = obstaclesFor(state.index, from, to, sourceBox, targetBox);
  state.answers.set(key, { sourceBox, targetBox, boxes });
  return boxes;
}
