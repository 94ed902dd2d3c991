import { useState } from "react";
import { LARGE_DIAGRAM_BLOCKS } from "@/features/editor/hooks/useLiveCanvas";

const KEY = "loopwright:overview-map";

function storedChoice(): boolean | null {
  try {
    const v = localStorage.getItem(KEY);
    return v === "on" ? true : v === "off" ? false : null;
  } catch {
    return null;
  }
}

/** Whether the canvas shows its overview map: the user's last choice in this browser, else by diagram size. */
export function useOverviewMap(blockCount: number): { shown: boolean; toggle: () => void } {
  const [shown, setShown] = useState(() => storedChoice() ?? blockCount <= LARGE_DIAGRAM_BLOCKS);
  const toggle = () =>
    setShown((was) => {
      try {
        localStorage.setItem(KEY, was ? "off" : "on");
      } catch {
        // Storage refused: the choice holds for this session only.
      }
      return !was;
    });
  return { shown, toggle };
}
