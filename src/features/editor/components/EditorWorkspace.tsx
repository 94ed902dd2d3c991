import { useId, type CSSProperties, type ReactNode } from "react";
import { ColumnHandle } from "@/features/editor/components/ColumnHandle";
import { useColumnWidth } from "@/features/editor/hooks/useColumnWidth";

interface Props {
  /** The block rail; none when read only. */
  rail?: ReactNode;
  canvas: ReactNode;
  /** Properties and comments, beside the canvas. */
  side: ReactNode;
  /** The results column's content. */
  results: ReactNode;
}

/**
 * The editor under its toolbar. From 1024 px wide it fills the rest of the window: the canvas with its side panel,
 * then a resizable results column that scrolls on its own, so the page itself does not scroll. Narrower, the
 * results stack under a canvas of fixed height and the page scrolls.
 */
export function EditorWorkspace({ rail, canvas, side, results }: Props) {
  const columnId = useId();
  const { width, setWidth } = useColumnWidth();
  // The canvas keeps at least 38rem with its rail and side panel; the column gives way first on a narrow window.
  const column = { "--results-width": `${width}px` } as CSSProperties;
  return (
    <div className="flex flex-col gap-4 lg:min-h-[26rem] lg:flex-1 lg:flex-row lg:gap-0" style={column}>
      <div
        className={`grid h-[64vh] min-h-[480px] overflow-hidden rounded-b-md border border-rule lg:h-auto lg:min-h-0 lg:min-w-0 lg:flex-1 ${rail ? "grid-cols-[auto_minmax(0,1fr)_18rem]" : "grid-cols-[minmax(0,1fr)_18rem]"}`}
      >
        {rail}
        {canvas}
        {side}
      </div>
      <ColumnHandle width={width} onWidth={setWidth} controls={columnId} />
      <section
        id={columnId}
        aria-label="Results and analysis"
        className="flex flex-col gap-3 lg:w-(--results-width) lg:max-w-[calc(100%-38rem)] lg:min-w-80 lg:shrink-0"
      >
        {results}
      </section>
    </div>
  );
}
