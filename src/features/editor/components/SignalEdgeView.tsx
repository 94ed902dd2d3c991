import { memo } from "react";
import { BaseEdge, useInternalNode, type EdgeProps, type InternalNode } from "@xyflow/react";
import { roundedPath, wireRoute, type Box } from "@/features/editor/geometry/wireRoute";
import type { SignalEdge } from "@/features/editor/lib/flowModel";

/** Stroke colours and the matching arrowhead markers (defined once in WireMarkers). */
const LOOK = {
  plain: { stroke: "#4d5663", marker: "lw-arrow-plain" },
  selected: { stroke: "#1d5c63", marker: "lw-arrow-selected" },
  step: { stroke: "#d4891c", marker: "lw-arrow-step" },
  fault: { stroke: "#a23a2c", marker: "lw-arrow-fault" },
} as const;

const boxOf = (n: InternalNode | undefined): Box => ({
  x: n?.internals.positionAbsolute.x ?? 0,
  y: n?.internals.positionAbsolute.y ?? 0,
  width: n?.measured.width ?? 0,
  height: n?.measured.height ?? 0,
});

/** A signal wire: orthogonal route from the utility module, an arrowhead at the input it feeds. */
export const SignalEdgeView = memo(function SignalEdgeView(props: EdgeProps<SignalEdge>) {
  const { id, source, target, sourceX, sourceY, targetX, targetY, data, selected } = props;
  const sourceNode = useInternalNode(source);
  const targetNode = useInternalNode(target);
  const points = wireRoute({
    source: { x: sourceX, y: sourceY },
    target: { x: targetX, y: targetY },
    side: data?.side ?? "left",
    sourceBox: boxOf(sourceNode),
    targetBox: boxOf(targetNode),
  });
  const look = data?.highlighted ? LOOK.step : selected ? LOOK.selected : data?.problem === "error" ? LOOK.fault : LOOK.plain;
  return (
    <BaseEdge
      id={id}
      path={roundedPath(points)}
      markerEnd={`url(#${look.marker})`}
      interactionWidth={14}
      style={{ stroke: look.stroke, strokeWidth: data?.highlighted || selected ? 2.5 : 1.6 }}
    />
  );
});

/** The arrowheads every wire refers to; rendered once inside the canvas. */
export function WireMarkers() {
  return (
    <svg aria-hidden className="absolute size-0">
      <defs>
        {Object.values(LOOK).map(({ stroke, marker }) => (
          <marker key={marker} id={marker} viewBox="0 0 12 12" refX="11" refY="6" markerWidth="9" markerHeight="9" markerUnits="userSpaceOnUse" orient="auto">
            <path d="M1,1.5 L11,6 L1,10.5 L3.5,6 z" fill={stroke} />
          </marker>
        ))}
      </defs>
    </svg>
  );
}
