import { memo, type FunctionComponent } from "react";

interface BlockViewProps {
  id: string;
  data: unknown;
  selected: boolean;
}

/**
 * A block view draws only its block, marks and selection; the canvas places it. Skipping re-renders when
 * only its measured size or position changed keeps the measuring pass and drags from redrawing every formula.
 */
export const sameBlockView = (a: BlockViewProps, b: BlockViewProps) => a.id === b.id && a.data === b.data && a.selected === b.selected;

/** `memo` with sameBlockView, for every node type of the canvas. */
export const blockMemo = <P extends BlockViewProps>(view: FunctionComponent<P>) => memo(view, sameBlockView);
