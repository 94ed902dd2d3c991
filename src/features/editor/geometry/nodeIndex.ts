import { indexBoxes, type BoxIndex } from "@shared/geometry/boxIndex";
import { nodeBox } from "@/features/editor/geometry/nodeBox";
import type { FlowNode } from "@/features/editor/lib/flowModel";

// Every live wire asks for its nearby blocks on each store update, pan frames included: the grid is built once
// per nodes array the canvas is given (a move or a resize gives a new one), not once per wire or frame.
const built = new WeakMap<readonly FlowNode[], BoxIndex>();

/** The grid of the canvas's blocks' boxes, for `obstaclesFor`. */
export function nodeIndex(nodes: readonly FlowNode[]): BoxIndex {
  let index = built.get(nodes);
  if (!index) built.set(nodes, (index = indexBoxes(nodes.map((n) => [n.id, nodeBox(n)] as const))));
  return index;
}
