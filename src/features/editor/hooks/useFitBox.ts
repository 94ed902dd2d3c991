import { useCallback } from "react";
import { getViewportForBounds, useReactFlow, useStoreApi } from "@xyflow/react";
import type { Box } from "@shared/geometry/wireRoute";

export interface FitOptions {
  /** Room around the box, as a fraction of the view. */
  padding: number;
  maxZoom: number;
  duration?: number;
}

/** The whole diagram in view: the first view of a diagram and the fit command. */
export const WHOLE_DIAGRAM: FitOptions = { padding: 0.25, maxZoom: 1.2 };

/**
 * Moves the view to show a box of the diagram. Works from the document's boxes rather than the canvas's
 * mounted blocks, so it also fits a large diagram whose blocks are drawn only as an overview.
 */
export function useFitBox(): (box: Box | null, options: FitOptions) => void {
  const store = useStoreApi();
  const flow = useReactFlow();
  // Stable, so the overview's memoised blocks that hold it (double-click to zoom in) do not redraw with the canvas.
  return useCallback(
    (box, { padding, maxZoom, duration }) => {
      const { width, height, minZoom } = store.getState();
      if (!box || !width || !height) return;
      void flow.setViewport(getViewportForBounds(box, width, height, minZoom, maxZoom, padding), duration ? { duration } : undefined);
    },
    [store, flow],
  );
}
