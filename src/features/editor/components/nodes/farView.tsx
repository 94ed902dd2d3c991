import { createContext, useCallback, useContext, type ReactNode } from "react";
import { useStore, type ReactFlowState } from "@xyflow/react";

/** Below this zoom a formula or caption is under ~7 px tall: blocks draw a cheap plain form instead. */
export const FAR_ZOOM = 0.45;

const FarView = createContext(false);

/** Whether the canvas's zoom is below `zoom`; a store subscription that changes only when the zoom crosses it. */
export const useZoomBelow = (zoom: number): boolean => useStore(useCallback((s: ReactFlowState) => s.transform[2] < zoom, [zoom]));

/** Hands the canvas's one far-view flag to its blocks through context, so a pan frame does not run a selector per block. */
export function FarViewProvider({ far, children }: { far: boolean; children: ReactNode }) {
  return <FarView.Provider value={far}>{children}</FarView.Provider>;
}

/** Whether the canvas is zoomed out past legibility, for the blocks inside FarViewProvider. */
export const useFarView = (): boolean => useContext(FarView);
