import { useCallback, useState } from "react";

const KEY = "loopwright:results-column-width";

/** The width range of the results column, in CSS pixels. */
export const COLUMN_WIDTH = { min: 320, max: 900, initial: 480 } as const;

const clampWidth = (px: number) => Math.round(Math.min(COLUMN_WIDTH.max, Math.max(COLUMN_WIDTH.min, px)));

function storedWidth(): number {
  try {
    const v = Number(localStorage.getItem(KEY));
    return v > 0 ? clampWidth(v) : COLUMN_WIDTH.initial;
  } catch {
    return COLUMN_WIDTH.initial;
  }
}

/** The results column's width: the user's last choice in this browser, kept within COLUMN_WIDTH. */
export function useColumnWidth(): { width: number; setWidth: (px: number) => void } {
  const [width, setState] = useState(storedWidth);
  const setWidth = useCallback((px: number) => {
    const next = clampWidth(px);
    setState(next);
    try {
      localStorage.setItem(KEY, String(next));
    } catch {
      // Storage refused: the width holds for this session only.
    }
  }, []);
  return { width, setWidth };
}
