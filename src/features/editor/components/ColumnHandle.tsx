import { useRef, type KeyboardEvent, type PointerEvent } from "react";
import { COLUMN_WIDTH } from "@/features/editor/hooks/useColumnWidth";

interface Props {
  /** The results column's width now, in CSS pixels. */
  width: number;
  onWidth: (px: number) => void;
  /** The id of the column it resizes. */
  controls: string;
}

const STEP = 16;

/**
 * The drag handle on the results column's left edge (a window splitter): dragging it left widens the column;
 * with focus, the arrow keys move it 16 px (64 with Shift), Home and End give the narrowest and widest column.
 */
export function ColumnHandle({ width, onWidth, controls }: Props) {
  const drag = useRef<{ x: number; width: number } | null>(null);
  const onKey = (e: KeyboardEvent) => {
    const step = e.shiftKey ? STEP * 4 : STEP;
    const next = { ArrowLeft: width + step, ArrowRight: width - step, Home: COLUMN_WIDTH.min, End: COLUMN_WIDTH.max }[e.key];
    if (next === undefined) return;
    e.preventDefault();
    onWidth(next);
  };
  const onPointerDown = (e: PointerEvent<HTMLDivElement>) => {
    if (e.button !== 0) return;
    e.preventDefault();
    e.currentTarget.setPointerCapture(e.pointerId);
    e.currentTarget.focus();
    drag.current = { x: e.clientX, width };
  };
  const onPointerMove = (e: PointerEvent) => {
    if (drag.current) onWidth(drag.current.width + drag.current.x - e.clientX);
  };
  const onPointerEnd = () => {
    drag.current = null;
  };
  return (
    <div
      role="separator"
      aria-orientation="vertical"
      aria-label="Width of the results column"
      aria-controls={controls}
      aria-valuenow={width}
      aria-valuemin={COLUMN_WIDTH.min}
      aria-valuemax={COLUMN_WIDTH.max}
      tabIndex={0}
      title="Drag, or use the arrow keys, to resize the results column"
      onKeyDown={onKey}
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={onPointerEnd}
      onPointerCancel={onPointerEnd}
      className="group hidden w-3 shrink-0 cursor-col-resize touch-none items-stretch justify-center outline-none lg:flex"
    >
      <span aria-hidden className="w-px bg-rule group-hover:w-1 group-hover:bg-signal group-focus-visible:w-1 group-focus-visible:bg-trace" />
    </div>
  );
}
