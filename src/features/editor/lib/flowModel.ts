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
  /** A comparison's marks: how each block or wire differs from the other version (drawn highlighted, named in its label). */
  changes?: ReadonlyMap<string, Change>;
}

/** How a block or wire of one version differs from the other one's. */
export type Change = "added" | "removed" | "changed";

const changeAttrs = (change: Change) => ({ "data-change": change });
const changeSuffix = (change: Change | undefined) => (change ? `, ${change} in this comparison` : "");

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
    const change = marks.changes?.get(block.id);
    const highlighted = marks.highlightBlocks.has(block.id) || change !== undefined;
    return {
      id: block.id,
      type: block.type,
      position: t.dragging.get(block.id) ?? doc.layout?.[block.id] ?? fallbackPosition(index),
      data: { block, highlighted, problem: marks.blockProblems.get(block.id) ?? null },
      selected: selected.has(block.id),
      measured: t.measured.get(block.id),
      ariaLabel: blockAriaLabel(block) + changeSuffix(change),
      domAttributes: change ? changeAttrs(change) : stepAttrs(highlighted),
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
    const change = marks.changes?.get(w.id);
    const highlighted = marks.highlightWires.has(w.id) || change !== undefined;
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
      ariaLabel: wireAriaLabel(w, target, isBreak) + changeSuffix(change),
      // Data attributes are valid on any element; the library's SVG attribute type does not list them.
      domAttributes: (change ? changeAttrs(change) : stepAttrs(highlighted)) as SignalEdge["domAttributes"],
    };
  });
}
