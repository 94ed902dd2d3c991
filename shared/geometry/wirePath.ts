import type { Block, Wire } from "@shared/diagram/schema";
import { inPoint, outPoint } from "@shared/geometry/blockBox";
import { obstaclesFor, type BoxIndex } from "@shared/geometry/boxIndex";
import { wireRoute, type Box, type Point } from "@shared/geometry/wireRoute";

/**
 * The route of a document wire between two placed blocks, around the blocks of `index` near it: from the source's
 * output to the target's port, as the figure draws it (the canvas takes its ends from the handles it measured).
 * Example: routeOfWire(w, targetBlock, sourceBox, targetBox, indexBoxes(boxes)) → [(x0, y0), …, (x1, y1)].
 */
export function routeOfWire(wire: Pick<Wire, "from" | "to" | "port">, target: Block, sourceBox: Box, targetBox: Box, index: BoxIndex): Point[] {
  const entry = inPoint(target, targetBox, wire.port);
  const obstacles = obstaclesFor(index, wire.from, wire.to, sourceBox, targetBox);
  return wireRoute({ source: outPoint(sourceBox), target: entry.at, side: entry.side, sourceBox, targetBox, obstacles });
}
