import type { Edge, Node } from "@xyflow/react";
import type { Block, BlockType } from "@shared/diagram/schema";
import type { Severity } from "@shared/diagram/problems";
import { BLOCK_VIEWS } from "@/features/editor/blockKinds";
import type { EditorDoc, EditorWire, Point, Selection } from "@/features/editor/commands/types";
import { fallbackPosition } from "@shared/geometry/blockBox";
import { sumPortPlaces, type Side } from "@shared/geometry/sumPorts";

/** What a block's node draws: the block itself and how the editor marks it. No callbacks live here. */
export interface BlockNodeData<B extends Block = Block> extends Record<string, unknown> {
  block: B;
  /** Consumed by the reduction step being shown. */
  highlighted: boolean;
  /** Worst problem the validator or reducer reports on this block. */
  problem: Severity | null;
}

export type NodeOf<T extends BlockType> = Node<BlockNodeData<Extract<Block, { type: T }>>, T>;
export type FlowNode = { [T in BlockType]: NodeOf<T> }[BlockType];

export interface SignalEdgeData extends Record<string, unknown> {
  highlighted: boolean;
  problem: Severity | null;
  /** The loop is broken here for margins and the Nyquist plot. */
  isBreak: boolean;
  /** Side of the target block the wire enters. */
  side: Side;
}
export type SignalEdge = Edge<SignalEdgeData, "signal">;

/** Decorations the canvas layers over the document. */
export interface Marks {
  highlightBlocks: ReadonlySet<string>;
  highlightWires: ReadonlySet<string>;
  blockProblems: ReadonlyMap<string, Severity>;
  wireProblems: ReadonlyMap<string, Severity>;
  /** Wire id where the analysis breaks the loop, if any. */
  breakWire: string | null;
}

export const inHandle = (port: number | undefined) => (port === undefined ? "in" : `in${port}`);
/** The junction port an input handle stands for ("in2" → 2); undefined for a single-input block's "in". */
export const portOfHandle = (handle: string | null | undefined) => (handle && handle.startsWith("in") && handle !== "in" ? Number(handle.slice(2)) : undefined);
export const OUT_HANDLE = "out";

const blockAriaLabel = (b: Block) => `${BLOCK_VIEWS[b.type].name} ${b.id}${b.label ? ` (${b.label})` : ""}`;

export function wireAriaLabel(w: EditorWire, target: Block | undefined, isBreak = false): string {
  const into = target?.type === "sum" && w.port !== undefined ? ` port ${w.port} (${target.signs[w.port] === "-" ? "minus" : "plus"})` : "";
  return `Wire ${w.id} from ${w.from} to ${w.to}${into}${isBreak ? ", loop broken here for analysis" : ""}`;
}

interface Transient {
  selection: Selection;
  /** Positions of blocks being dragged, before the drop commits them. */
  dragging: ReadonlyMap<string, Point>;
  measured: ReadonlyMap<string, { width: number; height: number }>;
}

const stepAttrs = (on: boolean) => (on ? { "aria-current": "step" as const } : undefined);

/** The canvas nodes for a document: positions from its layout, plus selection, drag state and marks. */
export function buildNodes(doc: EditorDoc, marks: Marks, t: Transient): FlowNode[] {
  const selected = new Set(t.selection.blocks);
  return doc.blocks.map((block, index) => {
    const highlighted = marks.highlightBlocks.has(block.id);
    return {
      id: block.id,
      type: block.type,
      position: t.dragging.get(block.id) ?? doc.layout?.[block.id] ?? fallbackPosition(index),
      data: { block, highlighted, problem: marks.blockProblems.get(block.id) ?? null },
      selected: selected.has(block.id),
      measured: t.measured.get(block.id),
      ariaLabel: blockAriaLabel(block),
      domAttributes: stepAttrs(highlighted),
    } as FlowNode;
  });
}

/** The canvas edges for a document's wires. */
export function buildEdges(doc: EditorDoc, marks: Marks, selection: Selection): SignalEdge[] {
  const selected = new Set(selection.wires);
  const blocks = new Map(doc.blocks.map((b) => [b.id, b]));
  return doc.wires.map((w) => {
    const target = blocks.get(w.to);
    const side: Side = target?.type === "sum" && w.port !== undefined ? (sumPortPlaces(target.signs.length)[w.port]?.side ?? "left") : "left";
    const highlighted = marks.highlightWires.has(w.id);
    const isBreak = marks.breakWire === w.id;
    return {
      id: w.id,
      type: "signal",
      source: w.from,
      target: w.to,
      sourceHandle: OUT_HANDLE,
      targetHandle: inHandle(target?.type === "sum" ? w.port : undefined),
      selected: selected.has(w.id),
      data: { highlighted, problem: marks.wireProblems.get(w.id) ?? null, isBreak, side },
      ariaLabel: wireAriaLabel(w, target, isBreak),
      domAttributes: stepAttrs(highlighted),
    };
  });
}
