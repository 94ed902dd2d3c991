import { useCallback, useMemo, useRef, useState } from "react";
import type { EdgeChange, NodeChange } from "@xyflow/react";
import type { EditorDoc, Point, Selection } from "@/features/editor/commands/types";
import { buildEdges, buildNodes, type FlowNode, type Marks, type SignalEdge } from "@/features/editor/lib/flowModel";

type Size = { width: number; height: number };

/** Keeps a node object when nothing it shows changed, so memoised node components skip re-rendering. */
function reuse(prev: Map<string, FlowNode>, next: FlowNode[]): FlowNode[] {
  return next.map((n) => {
    const old = prev.get(n.id);
    const same =
      old &&
      old.data.block === n.data.block &&
      old.data.highlighted === n.data.highlighted &&
      old.data.problem === n.data.problem &&
      old.selected === n.selected &&
      old.position.x === n.position.x &&
      old.position.y === n.position.y &&
      old.measured?.width === n.measured?.width &&
      old.measured?.height === n.measured?.height;
    return same ? old : n;
  });
}

/**
 * The canvas's view of the document: the document stays the truth; this hook adds the selection, the
 * positions of blocks mid-drag and the sizes the canvas measured. A finished move (drop or arrow key)
 * is handed to `onMoved` so it becomes a command.
 */
export function useFlowState(doc: EditorDoc, marks: Marks, onMoved: (moves: Record<string, Point>) => void) {
  const [selection, setSelection] = useState<Selection>({ blocks: [], wires: [] });
  const [dragging, setDragging] = useState<ReadonlyMap<string, Point>>(new Map());
  const [measured, setMeasured] = useState<ReadonlyMap<string, Size>>(new Map());
  const previous = useRef(new Map<string, FlowNode>());

  const nodes = useMemo(() => {
    const built = reuse(previous.current, buildNodes(doc, marks, { selection, dragging, measured }));
    previous.current = new Map(built.map((n) => [n.id, n]));
    return built;
  }, [doc, marks, selection, dragging, measured]);
  const edges = useMemo<SignalEdge[]>(() => buildEdges(doc, marks, selection), [doc, marks, selection]);

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
