import { memo, useMemo } from "react";
import { BaseEdge, useStore, type EdgeProps, type InternalNode, type ReactFlowState } from "@xyflow/react";
import { midpointAlong, roundedPath, sameBox, sameBoxes, wireRoute, type Box, type WirePlace } from "@shared/geometry/wireRoute";
import type { Severity } from "@shared/diagram/problems";
import { nearbyBlocks } from "@/features/editor/geometry/nodeIndex";
import type { FlowNode, SignalEdge } from "@/features/editor/lib/flowModel";

/** Stroke colours and the matching arrowhead markers (defined once in WireMarkers). */
const LOOK = {
  plain: { stroke: "#4d5663", marker: "lw-arrow-plain" },
  selected: { stroke: "#1d5c63", marker: "lw-arrow-selected" },
  step: { stroke: "#d4891c", marker: "lw-arrow-step" },
  fault: { stroke: "#a23a2c", marker: "lw-arrow-fault" },
} as const;

const PAPER = "#f5f3ee";

/** A wire's colour and arrowhead: reduction highlight wins over selection, which wins over a fault mark. */
export const wireLook = (highlighted: boolean, selected: boolean, problem: Severity | null) =>
  highlighted ? LOOK.step : selected ? LOOK.selected : problem === "error" ? LOOK.fault : LOOK.plain;

/** Where the library has placed and measured a block. */
const internalBox = (n: InternalNode | undefined): Box => ({
  x: n?.internals.positionAbsolute.x ?? 0,
  y: n?.internals.positionAbsolute.y ?? 0,
  width: n?.measured.width ?? 0,
  height: n?.measured.height ?? 0,
});

/** A block's box as plain numbers: the wire redraws when a box moves or resizes, not when the store renews the node object. */
const useBox = (id: string) => useStore((s: ReactFlowState) => internalBox(s.nodeLookup.get(id)), sameBox);

/**
 * Where the analysis breaks the loop: the wire cut by a gap between two bars across it, and a small tag,
 * so the mark reads without colour.
 */
export function BreakMark({ at, stroke }: { at: WirePlace; stroke: string }) {
  const tag = at.horizontal ? ({ x: at.x, y: at.y - 11, anchor: "middle" } as const) : ({ x: at.x + 10, y: at.y + 3, anchor: "start" } as const);
  return (
    <g aria-hidden className="pointer-events-none">
      <g transform={`translate(${at.x} ${at.y})${at.horizontal ? "" : " rotate(90)"}`}>
        <rect x={-3.5} y={-4} width={7} height={8} fill={PAPER} />
        <path d="M -3.5 -7 V 7 M 3.5 -7 V 7" stroke={stroke} strokeWidth={2} strokeLinecap="round" />
      </g>
      <text x={tag.x} y={tag.y} textAnchor={tag.anchor} fontSize={9} fontFamily="'IBM Plex Mono', monospace" fill={stroke} stroke={PAPER} strokeWidth={3} paintOrder="stroke">
        break
      </text>
    </g>
  );
}

/** A signal wire: orthogonal route from the utility module, an arrowhead at the input it feeds. */
export const SignalEdgeView = memo(function SignalEdgeView(props: EdgeProps<SignalEdge>) {
  const { id, source, target, sourceX, sourceY, targetX, targetY, data, selected } = props;
  const side = data?.side ?? "left";
  const sourceBox = useBox(source);
  const targetBox = useBox(target);
  // The other blocks near the wire, the same array while their boxes stay (a grid query per change, not a scan).
  const obstacles = useStore((s: ReactFlowState) => nearbyBlocks(s.nodes as FlowNode[], source, target, sourceBox, targetBox), sameBoxes);
  // Routing reruns only when an end or a nearby block moved or resized (useBox keeps a box's object while its numbers stay).
  const points = useMemo(
    () => wireRoute({ source: { x: sourceX, y: sourceY }, target: { x: targetX, y: targetY }, side, sourceBox, targetBox, obstacles }),
    [sourceX, sourceY, targetX, targetY, side, sourceBox, targetBox, obstacles],
  );
  const path = useMemo(() => roundedPath(points), [points]);
  const look = wireLook(data?.highlighted ?? false, selected ?? false, data?.problem ?? null);
  return (
    <>
      <BaseEdge
        id={id}
        path={path}
        markerEnd={`url(#${look.marker})`}
        interactionWidth={14}
        style={{ stroke: look.stroke, strokeWidth: data?.highlighted || selected ? 2.5 : 1.6 }}
      />
      {data?.isBreak && <BreakMark at={midpointAlong(points)} stroke={look.stroke} />}
    </>
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
