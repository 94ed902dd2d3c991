import { Handle, Position } from "@xyflow/react";
import type { CSSProperties } from "react";
import { handleClass } from "@/features/editor/components/nodes/nodeStyle";
import { OUT_HANDLE } from "@/features/editor/lib/flowModel";

/** The block's output: always on the right, signals flow left to right. */
export function OutPort({ style }: { style?: CSSProperties }) {
  return <Handle type="source" id={OUT_HANDLE} position={Position.Right} className={handleClass} style={style} />;
}

/** A single-input block's input, on the left. */
export function InPort({ style }: { style?: CSSProperties }) {
  return <Handle type="target" id="in" position={Position.Left} className={handleClass} style={style} />;
}
