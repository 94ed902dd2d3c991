import { useCallback, useState, type DragEvent, type PointerEvent as ReactPointerEvent, type ReactNode, type RefObject } from "react";
import {
  Background,
  BackgroundVariant,
  ControlButton,
  Controls,
  MiniMap,
  ReactFlow,
  useReactFlow,
  type Connection,
  type EdgeTypes,
  getViewportForBounds,
  type FinalConnectionState,
  type NodeTypes,
  type OnEdgesChange,
  type OnNodesChange,
} from "@xyflow/react";
import "@xyflow/react/dist/base.css";
import { Map as MapIcon } from "lucide-react";
import type { BlockType } from "@shared/diagram/schema";
import { GRID } from "@/features/editor/commands/blocks";
import type { ConnectArgs } from "@/features/editor/commands/wires";
import type { Point } from "@/features/editor/commands/types";
import { BLOCK_TYPES, BLOCK_VIEWS } from "@/features/editor/blockKinds";
import { FarViewProvider, useFarView } from "@/features/editor/components/nodes/farView";
import { OverviewLayer } from "@/features/editor/components/OverviewLayer";
import { SignalEdgeView, WireMarkers } from "@/features/editor/components/SignalEdgeView";
import { BLOCK_MIME } from "@/features/editor/components/BlockRail";
import { portOfHandle, type FlowNode, type SignalEdge } from "@/features/editor/lib/flowModel";
import { boundsOf } from "@shared/geometry/blockBox";
import { nodeBox } from "@/features/editor/geometry/nodeBox";
import type { Box } from "@shared/geometry/wireRoute";
import { useFitBox, WHOLE_DIAGRAM } from "@/features/editor/hooks/useFitBox";
import { useLiveCanvas } from "@/features/editor/hooks/useLiveCanvas";
import { useOverviewMap } from "@/features/editor/hooks/useOverviewMap";
import { useOverviewPick } from "@/features/editor/hooks/useOverviewPick";
import { useWideLayout } from "@/features/editor/hooks/useWideLayout";

// Module-level so the canvas never sees new type tables (which would remount every node).
const nodeTypes: NodeTypes = Object.fromEntries(BLOCK_TYPES.map((type) => [type, BLOCK_VIEWS[type].node]));
const edgeTypes = { signal: SignalEdgeView } satisfies EdgeTypes;

const MIN_ZOOM = 0.2;

/** The whole diagram fitted into a view of this size: where the canvas opens before it has measured anything. */
function openingViewport(nodes: FlowNode[], view: { width: number; height: number }) {
  const box = boundsOf(nodes.map(nodeBox));
  return box ? getViewportForBounds(box, view.width, view.height, MIN_ZOOM, WHOLE_DIAGRAM.maxZoom, WHOLE_DIAGRAM.padding) : { x: 0, y: 0, zoom: 1 };
}

/** Dots on the grid; zoomed far out every fourth, so the pane does not repaint a dense haze on each pan frame. */
function CanvasGrid() {
  const far = useFarView();
  return <Background variant={BackgroundVariant.Dots} gap={far ? GRID * 4 : GRID} size={far ? 4 : 1.2} color="#b9b2a3" />;
}

interface Props {
  nodes: FlowNode[];
  edges: SignalEdge[];
  onNodesChange: OnNodesChange<FlowNode>;
  onEdgesChange: OnEdgesChange<SignalEdge>;
  readOnly: boolean;
  /** Last pointer position over the canvas (client coordinates), for messages shown where the user looks. */
  pointer: RefObject<Point | null>;
  onConnectWire: (args: ConnectArgs) => void;
  onDropBlock: (type: BlockType, at: Point) => void;
  children?: ReactNode;
}

/** The drawing surface: blocks, wires, grid, zoom and pan, overview map; it draws, the document decides. */
export function DiagramCanvas({ nodes, edges, onNodesChange, onEdgesChange, readOnly, pointer, onConnectWire, onDropBlock, children }: Props) {
  const flow = useReactFlow();
  const fits = useWideLayout();
  const fitBox = useFitBox();
  // Opens at about the fitted view (the window bounds the canvas from above), so a large diagram is drawn once
  // in its far form rather than typeset first and redrawn.
  const [opening] = useState(() => openingViewport(nodes, { width: window.innerWidth, height: window.innerHeight }));
  // Fit the view to the diagram it opens with; an empty sheet keeps its view, or the first block dropped on it
  // would be fitted into the middle instead of staying where it was dropped.
  const [fitOnOpen] = useState(() => nodes.length > 0);

  const { live, far, large, overviewOnly } = useLiveCanvas(nodes, edges, opening);
  const onPick = useOverviewPick(nodes, edges, onNodesChange, onEdgesChange);
  const onOpen = useCallback((box: Box) => fitBox(box, { padding: 2, maxZoom: 1, duration: 250 }), [fitBox]);

  const overview = useOverviewMap(nodes.length);

  const onConnect = (c: Connection) => onConnectWire({ from: c.source, to: c.target, port: portOfHandle(c.targetHandle) });

  // A drop on a block without a fitting handle (an input block, an output's body) still gets its reason.
  const onConnectEnd = (event: MouseEvent | TouchEvent, state: FinalConnectionState) => {
    if (state.isValid || !state.fromNode || !state.fromHandle) return;
    const at = "changedTouches" in event ? event.changedTouches[0] : event;
    const over = document.elementFromPoint(at.clientX, at.clientY)?.closest(".react-flow__node")?.getAttribute("data-id");
    if (!over || over === state.fromNode.id) return;
    if (state.fromHandle.type === "source") onConnectWire({ from: state.fromNode.id, to: over });
    else onConnectWire({ from: over, to: state.fromNode.id, port: portOfHandle(state.fromHandle.id) });
  };

  const onDragOver = (e: DragEvent) => {
    if (!e.dataTransfer.types.includes(BLOCK_MIME)) return;
    e.preventDefault();
    e.dataTransfer.dropEffect = "copy";
  };
  const onDrop = (e: DragEvent) => {
    const type = e.dataTransfer.getData(BLOCK_MIME) as BlockType;
    if (!type) return;
    e.preventDefault();
    onDropBlock(type, flow.screenToFlowPosition({ x: e.clientX, y: e.clientY }));
  };
  const track = (e: ReactPointerEvent) => {
    pointer.current = { x: e.clientX, y: e.clientY };
  };

  return (
    // No text selection on the canvas: a drag pans or moves, and selection tracking costs every pan frame.
    <div className="relative size-full select-none" onPointerMove={track} onPointerDown={track} onDragOver={onDragOver} onDrop={onDrop}>
      <WireMarkers />
      <FarViewProvider far={far}>
        <ReactFlow<FlowNode, SignalEdge>
          nodes={live.nodes}
          edges={live.edges}
          nodeTypes={nodeTypes}
          edgeTypes={edgeTypes}
          onNodesChange={onNodesChange}
          onEdgesChange={onEdgesChange}
          onConnect={onConnect}
          onConnectEnd={onConnectEnd}
          nodesDraggable={!readOnly}
          nodesConnectable={!readOnly}
          elementsSelectable
          deleteKeyCode={null}
          snapToGrid
          snapGrid={[GRID, GRID]}
          minZoom={MIN_ZOOM}
          maxZoom={2.5}
          defaultViewport={opening}
          fitView={!large && fitOnOpen}
          fitViewOptions={WHOLE_DIAGRAM}
          onlyRenderVisibleElements={large}
          connectionRadius={24}
          // Where the page fits the window the wheel pans the canvas; where the page stacks and scrolls, the wheel
          // scrolls the page. Ctrl/⌘ + wheel (or a pinch) zooms the canvas in both.
          panOnScroll={fits}
          preventScrolling={fits}
          aria-label="Diagram canvas"
          className="bg-paper"
        >
          <CanvasGrid />
          <Controls showInteractive={false} showFitView={false} position="bottom-left">
            <ControlButton aria-label="Overview map" aria-pressed={overview.shown} title={overview.shown ? "Hide the overview map" : "Show the overview map"} onClick={overview.toggle}>
              <MapIcon aria-hidden />
            </ControlButton>
          </Controls>
          {overview.shown && (
            <MiniMap
              pannable
              zoomable
              position="bottom-right"
              ariaLabel="Overview of the whole diagram"
              nodeColor={(n) => ((n as FlowNode).data.highlighted ? "#d4891c" : n.selected ? "#1d5c63" : "#b9b2a3")}
              maskColor="rgba(235, 232, 224, 0.7)"
              className="!border !border-rule !bg-paper-raised"
            />
          )}
          {overviewOnly && <OverviewLayer nodes={nodes} edges={edges} onPick={onPick} onOpen={onOpen} />}
          {children}
        </ReactFlow>
      </FarViewProvider>
    </div>
  );
}
