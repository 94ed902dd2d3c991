import { boxOf } from "@shared/geometry/blockBox";
import type { Box } from "@shared/geometry/wireRoute";
import type { FlowNode } from "@/features/editor/lib/flowModel";

/** A canvas node's box: where it is drawn now (mid-drag included) and its measured or estimated size. */
export const nodeBox = (n: FlowNode): Box => boxOf(n.data.block, n.position, n.measured?.width && n.measured.height ? { width: n.measured.width, height: n.measured.height } : undefined);
