import { useCallback, useEffect, useMemo } from "react";
import { useStore, type ReactFlowState, type Viewport } from "@xyflow/react";
import { FAR_ZOOM, useZoomBelow } from "@/features/editor/components/nodes/farView";
import { boundsOf } from "@shared/geometry/blockBox";
import { nodeBox } from "@/features/editor/geometry/nodeBox";
import { inBox, revealRegion } from "@/features/editor/geometry/viewport";
import { sameBox, type Box } from "@shared/geometry/wireRoute";
import { useFitBox, WHOLE_DIAGRAM } from "@/features/editor/hooks/useFitBox";
import type { FlowNode, SignalEdge } from "@/features/editor/lib/flowModel";

/**
 * Above this many blocks a diagram counts as large: the canvas mounts live blocks only near the view, and its
 * overview map starts hidden (redrawing it costs pan frames).
 */
export const LARGE_DIAGRAM_BLOCKS = 150;
/**
 * Below this zoom a large diagram is drawn as the overview. Above it the view holds at most ~150 blocks of a
 * dense diagram (1600 × 1000 px of screen), which is what mounting live blocks costs when the user zooms in.
 */
const OVERVIEW_ZOOM = 0.6;

const NO_EDGES: SignalEdge[] = [];
const NOWHERE: Box = { x: 0, y: 0, width: 0, height: 0 };
const hide = (n: FlowNode): FlowNode => ({ ...n, hidden: true });
const paneReady = (s: ReactFlowState) => s.width > 0 && s.height > 0;
const panZoomStarted = (s: ReactFlowState) => s.panZoom !== null;

/**
 * What the canvas hands the library. A large diagram keeps live blocks only where the user can see them:
 * zoomed out (below OVERVIEW_ZOOM) it mounts none and the overview layer draws it; nearer, blocks mount once
 * they come inside the region around the view and stay (the library then skips those out of view), with the
 * wires between mounted blocks. A small diagram passes through unchanged. `far` is the blocks' plain-text zoom.
 */
export function useLiveCanvas(nodes: FlowNode[], edges: SignalEdge[], opening: Viewport) {
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
      if (!n.measured?.width && !inBox(n.position, region)) return hide(n);
      shown.add(n.id);
      return n;
    });
    return { nodes: liveNodes, edges: edges.filter((e) => shown.has(e.source) && shown.has(e.target)) };
  }, [nodes, edges, large, overviewOnly, region]);

  // The library fits only blocks it has mounted and measured: a large diagram is fitted from its boxes, once,
  // when the pane first has a size (later fits are the user's).
  const fitBox = useFitBox();
  const ready = useStore(paneReady);
  useEffect(() => {
    if (large && ready) fitBox(boundsOf(nodes.map(nodeBox)), WHOLE_DIAGRAM);
  }, [ready]);

  return { live, far, large, overviewOnly };
}
