import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState, type DragEvent, type PointerEvent as ReactPointerEvent, type ReactNode, type RefObject } from "react";
import {
  Background,
  BackgroundVariant,
  ControlButton,
  Controls,
  MiniMap,
  ReactFlow,
  useReactFlow,
  useStore,
  type Connection,
  type EdgeTypes,
  getViewportForBounds,
  type FinalConnectionState,
  type NodeTypes,
  type OnEdgesChange,
  type OnNodesChange,
  type ReactFlowState,
} from "@xyflow/react";
import "@xyflow/react/dist/base.css";
import { Map as MapIcon } from "lucide-react";
import type { BlockType } from "@shared/diagram/schema";
import { GRID } from "@/features/editor/commands/blocks";
import type { ConnectArgs } from "@/features/editor/commands/wires";
import type { Point } from "@/features/editor/commands/types";
import { BranchNode, InputNode, OutputNode } from "@/features/editor/components/nodes/TerminalNodes";
import { GainNode, IntegratorNode, TransferNode } from "@/features/editor/components/nodes/ExpressionNodes";
import { SumNode } from "@/features/editor/components/nodes/SumNode";
import { FAR_ZOOM, FarViewProvider, useFarView, useZoomBelow } from "@/features/editor/components/nodes/farView";
import { OverviewLayer, OVERVIEW_ZOOM, type OverviewPick } from "@/features/editor/components/OverviewLayer";
import { SignalEdgeView, WireMarkers } from "@/features/editor/components/SignalEdgeView";
import { BLOCK_MIME } from "@/features/editor/components/BlockRail";
import { portOfHandle, type FlowNode, type SignalEdge } from "@/features/editor/lib/flowModel";
import { boundsOf, nodeBox } from "@/features/editor/geometry/blockBox";
import { inBox, revealRegion } from "@/features/editor/geometry/viewport";
import { sameBox, type Box } from "@/features/editor/geometry/wireRoute";
import { useFitBox, WHOLE_DIAGRAM } from "@/features/editor/hooks/useFitBox";
import { LARGE_DIAGRAM_BLOCKS, useOverviewMap } from "@/features/editor/hooks/useOverviewMap";

// Module-level so the canvas never sees new type tables (which would remount every node).
const nodeTypes = {
  input: InputNode,
  output: OutputNode,
  sum: SumNode,
  gain: GainNode,
  transfer: TransferNode,
  integrator: IntegratorNode,
  branch: BranchNode,
} satisfies NodeTypes;
const edgeTypes = { signal: SignalEdgeView } satisfies EdgeTypes;

const MIN_ZOOM = 0.2;
const NO_EDGES: SignalEdge[] = [];
const hide = (n: FlowNode): FlowNode => ({ ...n, hidden: true });
const NOWHERE: Box = { x: 0, y: 0, width: 0, height: 0 };
const paneReady = (s: ReactFlowState) => s.width > 0 && s.height > 0;
const panZoomStarted = (s: ReactFlowState) => s.panZoom !== null;

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
  const fitBox = useFitBox();
  // Opens at about the fitted view (the window bounds the canvas from above), so a large diagram is drawn once
  // in its far form rather than typeset first and redrawn.
  const [opening] = useState(() => openingViewport(nodes, { width: window.innerWidth, height: window.innerHeight }));

  // A large diagram keeps live blocks only where the user can see them: zoomed out it is drawn as one
  // overview picture; nearer, blocks not measured yet mount only inside the region around the view.
  const large = nodes.length > LARGE_DIAGRAM_BLOCKS;
  // Until the pan-zoom starts, the store still holds zoom 1: the first render goes by the opening view instead.
  const started = useStore(panZoomStarted);
  const zoomedFar = useZoomBelow(FAR_ZOOM);
  const zoomedOut = useZoomBelow(OVERVIEW_ZOOM);
  const far = started ? zoomedFar : opening.zoom < FAR_ZOOM;
  const overviewOnly = large && (started ? zoomedOut : opening.zoom < OVERVIEW_ZOOM);
  const region = useStore(
    useCallback(
      (s: ReactFlowState) => {
        if (!large || overviewOnly) return NOWHERE;
        const view = s.width ? s : { width: window.innerWidth, height: window.innerHeight };
        return revealRegion(started ? s.transform : [opening.x, opening.y, opening.zoom], view);
      },
      [large, overviewOnly, started, opening],
    ),
    sameBox,
  );
  const live = useMemo(() => {
    if (!large) return { nodes, edges };
    if (overviewOnly) return { nodes: nodes.map(hide), edges: NO_EDGES };
    const shown = new Set<string>();
    const liveNodes = nodes.map((n) => {
      if (n.measured?.width || inBox(n.position, region)) return shown.add(n.id), n;
      return hide(n);
    });
    return { nodes: liveNodes, edges: edges.filter((e) => shown.has(e.source) && shown.has(e.target)) };
  }, [nodes, edges, large, overviewOnly, region]);

  // The library fits only blocks it has mounted and measured; a large diagram is fitted from its boxes once the pane has a size.
  const ready = useStore(paneReady);
  useEffect(() => {
    if (large && ready) fitBox(boundsOf(nodes.map(nodeBox)), WHOLE_DIAGRAM);
    // Once, when the pane first has a size; later fits are the user's.
  }, [ready]);

  // Picks read the latest selection through a ref, so the overview's blocks keep one handler and stay memoised.
  const current = useRef({ nodes, edges });
  useLayoutEffect(() => {
    current.current = { nodes, edges };
  });
  const onPick = useCallback(
    ({ id, additive }: OverviewPick) => {
      const { nodes: all, edges: wires } = current.current;
      const was = all.find((n) => n.id === id)?.selected ?? false;
      const others = additive ? [] : all.filter((n) => n.selected && n.id !== id).map((n) => ({ type: "select" as const, id: n.id, selected: false }));
      onNodesChange([...others, { type: "select", id, selected: additive ? !was : true }]);
      if (!additive) onEdgesChange(wires.filter((e) => e.selected).map((e) => ({ type: "select" as const, id: e.id, selected: false })));
    },
    [onNodesChange, onEdgesChange],
  );
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
          fitView={!large}
          fitViewOptions={WHOLE_DIAGRAM}
          onlyRenderVisibleElements={large}
          connectionRadius={24}
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
