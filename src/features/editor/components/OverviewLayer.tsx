import { memo, useMemo, type KeyboardEvent, type MouseEvent } from "react";
import { useStore, ViewportPortal, type ReactFlowState } from "@xyflow/react";
import type { Block } from "@shared/diagram/schema";
import { BLOCK_SHAPES } from "@shared/geometry/blockShape";
import type { Severity } from "@shared/diagram/problems";
import { boundsOf, inPoint, outPoint } from "@shared/geometry/blockBox";
import { indexBoxes, obstaclesFor } from "@shared/geometry/boxIndex";
import { nodeBox } from "@/features/editor/geometry/nodeBox";
import { arrowHead, midpointAlong, roundedPath, wireRoute, type Box } from "@shared/geometry/wireRoute";
import { strokeColor } from "@/features/editor/components/nodes/nodeStyle";
import { BreakMark, wireLook } from "@/features/editor/components/SignalEdgeView";
import { useEditorActions } from "@/features/editor/components/EditorContext";
import { counted } from "@shared/text/words";
import { portOfHandle, type FlowNode, type SignalEdge } from "@/features/editor/lib/flowModel";

export interface OverviewPick {
  id: string;
  /** Shift, Ctrl or Cmd held: add to the selection or take the block out of it. */
  additive: boolean;
}

interface Props {
  nodes: FlowNode[];
  edges: SignalEdge[];
  onPick: (pick: OverviewPick) => void;
  /** Zoom in on this box, where the full blocks take over. */
  onOpen: (box: Box) => void;
}

const MARGIN = 48;
/** Zoom from which a 13-px id is at least 4 px tall on screen. */
const IDS_FROM_ZOOM = 0.3;
const legibleIds = (s: ReactFlowState) => s.transform[2] >= IDS_FROM_ZOOM;

interface ShapeProps extends Box {
  block: Block;
  /** Print the id: off when zoomed out so far that it would be under 4 px tall. */
  named: boolean;
  label: string;
  selected: boolean;
  highlighted: boolean;
  problem: Severity | null;
  onPick: Props["onPick"];
  onOpen: Props["onOpen"];
}

/**
 * One block as an outline of its kind with its id; selectable by click or keyboard, double-click zooms in on
 * it. Like a live block it is "nopan": a press on it does not start a pan or the canvas's own double-click zoom.
 */
const OverviewBlock = memo(function OverviewBlock({ block, named, x, y, width: w, height: h, label, selected, highlighted, problem, onPick, onOpen }: ShapeProps) {
  const stroke = strokeColor(selected, highlighted, problem);
  const paint = {
    fill: highlighted ? "#f8ecd6" : "#fcfbf8",
    stroke,
    strokeWidth: selected || highlighted ? 4 : 2,
    strokeDasharray: problem === "error" && !selected && !highlighted ? "6 4" : undefined,
  };
  const look = BLOCK_SHAPES[block.type];
  const shape = {
    circle: () => <circle cx={x + w / 2} cy={y + h / 2} r={w / 2} {...paint} />,
    dot: () => <circle cx={x + w / 2} cy={y + h / 2} r={6} fill={stroke} />,
    triangle: () => <polygon points={`${x},${y} ${x + w},${y + h / 2} ${x},${y + h}`} {...paint} />,
    pill: () => <rect x={x} y={y} width={w} height={h} rx={h / 2} {...paint} />,
    box: () => <rect x={x} y={y} width={w} height={h} rx={2} {...paint} />,
    slant: () => <polygon points={`${x + 10},${y} ${x + w},${y} ${x + w - 10},${y + h} ${x},${y + h}`} {...paint} />,
  }[look]();
  const pick = (additive: boolean) => onPick({ id: block.id, additive });
  const onKeyDown = (e: KeyboardEvent) => {
    if (e.key !== "Enter" && e.key !== " ") return;
    e.preventDefault();
    pick(e.shiftKey);
  };
  return (
    <g
      role="button"
      tabIndex={0}
      aria-label={label}
      aria-pressed={selected}
      data-overview-block={block.id}
      className="nopan pointer-events-auto cursor-pointer outline-none"
      onClick={(e: MouseEvent) => pick(e.shiftKey || e.metaKey || e.ctrlKey)}
      onDoubleClick={() => onOpen({ x, y, width: w, height: h })}
      onKeyDown={onKeyDown}
    >
      {shape}
      {named && look !== "dot" && (
        <text x={x + w / 2} y={y + h / 2} dy="0.35em" textAnchor="middle" fontSize={13} fontFamily="'IBM Plex Mono', monospace" fill="#4d5663">
          {block.label ?? block.id}
        </text>
      )}
    </g>
  );
});

type Look = ReturnType<typeof wireLook>;

interface BundleProps {
  look: Look;
  /** Drawn wider: the wires of the step shown or of the selection. */
  wide: boolean;
  routes: string;
  heads: string;
  count: number;
}

/** All wires of one look as two paths (routes, arrowheads): a few elements to lay out and paint instead of two per wire. */
const WireBundle = memo(function WireBundle({ look, wide, routes, heads, count }: BundleProps) {
  return (
    <>
      <path data-overview-wires={count} d={routes} fill="none" stroke={look.stroke} strokeWidth={wide ? 3 : 1.6} />
      <path d={heads} fill={look.stroke} />
    </>
  );
});

/**
 * A large diagram zoomed far out, drawn as one light picture instead of hundreds of live blocks and wires:
 * outlines with ids, wires on the same routes, and the same selection, step and problem marks. Blocks are
 * selected here; moving and wiring happen once zoomed in.
 */
export const OverviewLayer = memo(function OverviewLayer({ nodes, edges, onPick, onOpen }: Props) {
  const { readOnly } = useEditorActions();
  const named = useStore(legibleIds);
  const boxes = useMemo(() => new Map(nodes.map((n) => [n.id, nodeBox(n)])), [nodes]);
  const blocks = useMemo(() => new Map(nodes.map((n) => [n.id, n.data.block])), [nodes]);
  const index = useMemo(() => indexBoxes(boxes), [boxes]);
  const wires = useMemo(
    () =>
      edges.flatMap((e) => {
        const sourceBox = boxes.get(e.source);
        const targetBox = boxes.get(e.target);
        const target = blocks.get(e.target);
        if (!sourceBox || !targetBox || !target) return [];
        const entry = inPoint(target, targetBox, portOfHandle(e.targetHandle));
        const obstacles = obstaclesFor(index, e.source, e.target, sourceBox, targetBox);
        const points = wireRoute({ source: outPoint(sourceBox), target: entry.at, side: entry.side, sourceBox, targetBox, obstacles });
        const [highlighted, selected] = [e.data?.highlighted ?? false, e.selected ?? false];
        const look = wireLook(highlighted, selected, e.data?.problem ?? null);
        return [{ id: e.id, points, look, wide: highlighted || selected, isBreak: e.data?.isBreak ?? false }];
      }),
    [edges, boxes, blocks, index],
  );
  const bundles = useMemo(() => {
    // One look, one width: the look already says whether the wire is highlighted or selected.
    const byLook = new Map<Look, { wide: boolean; routes: string[]; heads: string[] }>();
    for (const w of wires) {
      const bundle = byLook.get(w.look) ?? { wide: w.wide, routes: [], heads: [] };
      bundle.routes.push(roundedPath(w.points));
      bundle.heads.push(arrowHead(w.points));
      byLook.set(w.look, bundle);
    }
    return [...byLook].map(([look, b]) => ({ look, wide: b.wide, routes: b.routes.join(" "), heads: b.heads.join(" "), count: b.routes.length }));
  }, [wires]);
  const broken = wires.find((w) => w.isBreak);
  const bounds = boundsOf(boxes.values());
  if (!bounds) return null;
  const frame = { x: bounds.x - MARGIN, y: bounds.y - MARGIN, width: bounds.width + 2 * MARGIN, height: bounds.height + 2 * MARGIN };
  return (
    <ViewportPortal>
      <svg
        role="group"
        aria-label={`Overview of ${counted(nodes.length, "block")}: select a block here, double-click it or zoom in to ${readOnly ? "see it" : "edit"}`}
        className="pointer-events-none absolute overflow-visible"
        style={{ left: frame.x, top: frame.y }}
        width={frame.width}
        height={frame.height}
        viewBox={`${frame.x} ${frame.y} ${frame.width} ${frame.height}`}
      >
        <g aria-hidden>
          {bundles.map((b) => (
            <WireBundle key={b.look.marker} {...b} />
          ))}
          {broken && <BreakMark at={midpointAlong(broken.points)} stroke={broken.look.stroke} />}
        </g>
        {nodes.map((n) => (
          <OverviewBlock
            key={n.id}
            block={n.data.block}
            {...boxes.get(n.id)!}
            label={n.ariaLabel ?? n.id}
            selected={n.selected ?? false}
            highlighted={n.data.highlighted}
            named={named}
            problem={n.data.problem}
            onPick={onPick}
            onOpen={onOpen}
          />
        ))}
      </svg>
    </ViewportPortal>
  );
});
