import { createContext, useContext, type ReactNode } from "react";
import { useStore, type ReactFlowState } from "@xyflow/react";

/** Below this zoom a formula or caption is under ~7 px tall: blocks draw a cheap plain form instead. */
export const FAR_ZOOM = 0.45;

const isFar = (s: ReactFlowState) => s.transform[2] < FAR_ZOOM;
const FarView = createContext(false);

/**
 * One store subscription for the whole canvas, re-rendering only when the zoom crosses FAR_ZOOM; blocks read
 * the flag from context, so a pan frame does not run a selector per block.
 */
export function FarViewProvider({ children }: { children: ReactNode }) {
  return <FarView.Provider value={useStore(isFar)}>{children}</FarView.Provider>;
}

/** Whether the canvas is zoomed out past legibility. */
export const useFarView = (): boolean => useContext(FarView);
