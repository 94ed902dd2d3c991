import { useCallback, useMemo, useRef, useState } from "react";
import type { EdgeChange, NodeChange } from "@xyflow/react";
import type { EditorDoc, Point, Selection } from "@/features/editor/commands/types";
import { buildEdges, buildNodes, type FlowNode, type Marks, type SignalEdge } from "@/features/editor/lib/flowModel";

type Size = { width: number; height: number };

/** Keeps the previous object for an id when `same` says nothing it shows changed, so memoised views skip re-rendering. */
function reuse<T extends { id: string }>(prev: ReadonlyMap<string, T>, next: T[], same: (old: T, now: T) => boolean): T[] {
  return next.map((n) => {
    const old = prev.get(n.id);
    return old && same(old, n) ? old : n;
  });
}

const sameNode = (old: FlowNode, n: FlowNode) =>
  old.data.block === n.data.block &&
  old.data.highlighted === n.data.highlighted &&
  old.data.problem === n.data.problem &&
  old.selected === n.selected &&
  old.position.x === n.position.x &&
  old.position.y === n.position.y &&
  old.measured?.width === n.measured?.width &&
  old.measured?.height === n.measured?.height;

// A wire's object is rebuilt whenever marks or the selection change; most wires look the same afterwards.
const sameEdge = (old: SignalEdge, e: SignalEdge) =>
  old.source === e.source &&
  old.target === e.target &&
  old.targetHandle === e.targetHandle &&
  old.selected === e.selected &&
  old.ariaLabel === e.ariaLabel &&
  old.data?.highlighted === e.data?.highlighted &&
  old.data?.problem === e.data?.problem &&
  old.data?.isBreak === e.data?.isBreak &&
  old.data?.side === e.data?.side;

/** The latest list, keyed by id, for the next round of `reuse`. */
const byId = <T extends { id: string }>(items: T[]) => new Map(items.map((x) => [x.id, x]));

/**
 * The canvas's view of the document: the document stays the truth; this hook adds the selection, the
 * positions of blocks mid-drag and the sizes the canvas measured. A finished move (drop or arrow key)
 * is handed to `onMoved` so it becomes a command.
 */
export function useFlowState(doc: EditorDoc, marks: Marks, onMoved: (moves: Record<string, Point>) => void) {
  const [selection, setSelection] = useState<Selection>({ blocks: [], wires: [] });
  const [dragging, setDragging] = useState<ReadonlyMap<string, Point>>(new Map());
  const [measured, setMeasured] = useState<ReadonlyMap<string, Size>>(new Map());
  const previousNodes = useRef(new Map<string, FlowNode>());
  const previousEdges = useRef(new Map<string, SignalEdge>());

  const nodes = useMemo(() => {
    const built = reuse(previousNodes.current, buildNodes(doc, marks, { selection, dragging, measured }), sameNode);
    previousNodes.current = byId(built);
    return built;
  }, [doc, marks, selection, dragging, measured]);
  const edges = useMemo(() => {
    const built = reuse(previousEdges.current, buildEdges(doc, marks, selection), sameEdge);
    previousEdges.current = byId(built);
    return built;
  }, [doc, marks, selection]);

  const onNodesChange = useCallback(
    (changes: NodeChange<FlowNode>[]) => {
      const picked = new Map<string, boolean>();
      const moving = new Map<string, Point>();
      const moved: Record<string, Point> = {};
      const sizes = new Map<string, Size>();
      for (const c of changes) {
        if (c.type === "select") picked.set(c.id, c.selected);
        else if (c.type === "position" && c.position) {
          if (c.dragging) moving.set(c.id, c.position);
          else moved[c.id] = c.position;
        } else if (c.type === "dimensions" && c.dimensions) sizes.set(c.id, c.dimensions);
      }
      if (picked.size) setSelection((s) => applyPicks(s, "blocks", picked));
      if (sizes.size) setMeasured((m) => new Map([...m, ...sizes]));
      if (moving.size) setDragging((d) => new Map([...d, ...moving]));
      if (Object.keys(moved).length) {
        onMoved(moved);
        setDragging((d) => new Map([...d].filter(([id]) => !(id in moved))));
      }
    },
    [onMoved],
  );

  const onEdgesChange = useCallback((changes: EdgeChange<SignalEdge>[]) => {
    const picked = new Map<string, boolean>();
    for (const c of changes) if (c.type === "select") picked.set(c.id, c.selected);
    if (picked.size) setSelection((s) => applyPicks(s, "wires", picked));
  }, []);

  // Undo or delete can remove selected things: only ids still in the document count as selected.
  const live = useMemo<Selection>(() => {
    const blocks = new Set(doc.blocks.map((b) => b.id));
    const wires = new Set(doc.wires.map((w) => w.id));
    return { blocks: selection.blocks.filter((id) => blocks.has(id)), wires: selection.wires.filter((id) => wires.has(id)) };
  }, [doc, selection]);

  return { nodes, edges, selection: live, setSelection, onNodesChange, onEdgesChange, measured };
}

function applyPicks(s: Selection, kind: keyof Selection, picked: Map<string, boolean>): Selection {
  const ids = new Set(s[kind]);
  for (const [id, on] of picked) {
    if (on) ids.add(id);
    else ids.delete(id);
  }
  return { ...s, [kind]: [...ids] };
}
