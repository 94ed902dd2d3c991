import { useRef, useState, type RefObject } from "react";
import { useReactFlow } from "@xyflow/react";
import { toast } from "sonner";
import type { BlockType } from "@shared/diagram/schema";
import { addBlock, GRID, moveBlocks } from "@/features/editor/commands/blocks";
import { copySelection, deleteSelection, duplicate, paste, pasteOffset, selectAll, type Fragment } from "@/features/editor/commands/selection";
import { connect, type ConnectArgs } from "@/features/editor/commands/wires";
import type { EditorDoc, Point, Selection } from "@/features/editor/commands/types";
import type { Act } from "@/features/editor/components/EditorContext";
import { boundsOf } from "@shared/geometry/blockBox";
import { nodeBox } from "@/features/editor/geometry/nodeBox";
import { useFitBox, WHOLE_DIAGRAM } from "@/features/editor/hooks/useFitBox";
import { useShortcuts } from "@/features/editor/hooks/useShortcuts";
import { autoLayout } from "@/features/editor/lib/autoLayout";
import { BLOCK_TYPES, BLOCK_VIEWS } from "@/features/editor/blockKinds";
import { estimatedSize, fallbackPosition } from "@shared/geometry/blockBox";
import { freeSpot } from "@/features/editor/geometry/freeSpot";
import type { FlowNode } from "@/features/editor/lib/flowModel";
import { errorMessage } from "@/lib/apiClient";

interface Args {
  doc: EditorDoc;
  act: Act;
  readOnly: boolean;
  selection: Selection;
  setSelection: (s: Selection) => void;
  measured: ReadonlyMap<string, { width: number; height: number }>;
  /** The canvas's blocks as drawn now, for fitting the view. */
  nodes: FlowNode[];
  canvasBox: RefObject<HTMLDivElement | null>;
  pointer: RefObject<Point | null>;
  undo: () => void;
  redo: () => void;
  onSave: () => void;
  onHelp: () => void;
  focusProperties: () => void;
  steps: { count: number; at: number | null; go: (i: number | null) => void };
}

/** The editor's verbs, shared by the toolbar, the rail, the canvas and the keyboard. */
export function useCanvasCommands(a: Args) {
  const flow = useReactFlow();
  const fitBox = useFitBox();
  const clipboard = useRef<{ fragment: Fragment; pastes: number } | null>(null);
  const [layingOut, setLayingOut] = useState(false);
  const { doc, act, selection } = a;

  const positionOf = (id: string) => doc.layout?.[id] ?? fallbackPosition(doc.blocks.findIndex((b) => b.id === id));

  /**
   * Right of the one selected block (so keyboard drawing flows left to right), else the middle of the view; then
   * down to the first place where the new block covers no other.
   */
  const placeFor = (type: BlockType): Point => {
    let at: Point;
    if (selection.blocks.length === 1) {
      const p = positionOf(selection.blocks[0]);
      const width = a.measured.get(selection.blocks[0])?.width ?? 64;
      at = { x: p.x + width + 5 * GRID, y: p.y };
    } else {
      const rect = a.canvasBox.current?.getBoundingClientRect();
      const centre = rect ? flow.screenToFlowPosition({ x: rect.left + rect.width / 2, y: rect.top + rect.height / 2 }) : { x: 0, y: 0 };
      at = { x: centre.x - 40, y: centre.y - 24 };
    }
    const size = estimatedSize(BLOCK_VIEWS[type].create("new"));
    return freeSpot(at, size, a.nodes.map(nodeBox), GRID, 2 * GRID);
  };

  /** Pans (never zooms) just far enough that a block placed off-screen comes into view. */
  const reveal = (at: Point) => {
    const rect = a.canvasBox.current?.getBoundingClientRect();
    if (!rect) return;
    const p = flow.flowToScreenPosition(at);
    const margin = { x: 160, y: 96 };
    const dx = p.x > rect.right - margin.x ? rect.right - margin.x - p.x : p.x < rect.left + 24 ? rect.left + 24 - p.x : 0;
    const dy = p.y > rect.bottom - margin.y ? rect.bottom - margin.y - p.y : p.y < rect.top + 24 ? rect.top + 24 - p.y : 0;
    if (dx === 0 && dy === 0) return;
    const v = flow.getViewport();
    void flow.setViewport({ x: v.x + dx, y: v.y + dy, zoom: v.zoom }, { duration: 200 });
  };
  const add = (type: BlockType, at: Point = placeFor(type)) => {
    const added = act(`Add ${BLOCK_VIEWS[type].name.toLowerCase()}`, (d) => addBlock(d, type, at));
    if (added) reveal(at);
    return added;
  };
  const nudge = (dx: number, dy: number) => (shift: boolean) => {
    if (selection.blocks.length === 0) return;
    const k = shift ? 4 * GRID : GRID;
    const moves = Object.fromEntries(selection.blocks.map((id) => [id, { x: positionOf(id).x + dx * k, y: positionOf(id).y + dy * k }]));
    act("Move", (d) => moveBlocks(d, moves), { coalesce: `move:${[...selection.blocks].sort().join(",")}` });
  };
  const copy = () => {
    if (selection.blocks.length === 0) return false;
    clipboard.current = { fragment: copySelection(doc, selection), pastes: 0 };
    return true;
  };
  const fit = () => fitBox(boundsOf(a.nodes.map(nodeBox)), { ...WHOLE_DIAGRAM, duration: 200 });

  const layout = async () => {
    if (doc.blocks.length === 0) return;
    setLayingOut(true);
    try {
      const positions = await autoLayout(doc, a.measured);
      // Fit to where the blocks go, not where the nodes of this render still stand.
      const placed = a.nodes.map((n) => nodeBox({ ...n, position: positions[n.id] ?? n.position }));
      if (act("Auto layout", (d) => moveBlocks(d, positions))) window.requestAnimationFrame(() => fitBox(boundsOf(placed), { ...WHOLE_DIAGRAM, duration: 200 }));
    } catch (e) {
      toast.error(`Auto layout failed: ${errorMessage(e)}`);
    } finally {
      setLayingOut(false);
    }
  };

  const step = (delta: number) => {
    const { count, at, go } = a.steps;
    if (count === 0) return;
    go(at === null ? (delta > 0 ? 0 : count - 1) : Math.min(count - 1, Math.max(0, at + delta)));
  };

  useShortcuts(
    {
      undo: a.undo,
      redo: a.redo,
      delete: () => act("Delete", (d) => deleteSelection(d, selection)),
      copy: () => void copy(),
      cut: () => copy() && act("Cut", (d) => deleteSelection(d, selection)),
      paste: () => {
        const clip = clipboard.current;
        if (!clip) return void act("Paste", (d) => paste(d, { blocks: [], wires: [], layout: {} }));
        clip.pastes += 1;
        act("Paste", (d) => paste(d, clip.fragment, pasteOffset(clip.fragment, clip.pastes)));
      },
      duplicate: () => act("Duplicate", (d) => duplicate(d, selection)),
      selectAll: () => a.setSelection(selectAll(doc)),
      clearSelection: () => a.setSelection({ blocks: [], wires: [] }),
      nudgeLeft: nudge(-1, 0),
      nudgeRight: nudge(1, 0),
      nudgeUp: nudge(0, -1),
      nudgeDown: nudge(0, 1),
      ...(Object.fromEntries(BLOCK_TYPES.map((type) => [`add:${type}`, () => add(type)])) as Record<`add:${BlockType}`, () => boolean>),
      editProperties: a.focusProperties,
      layout: () => void layout(),
      fitView: fit,
      previousStep: () => step(-1),
      nextStep: () => step(1),
      save: a.onSave,
      help: a.onHelp,
    },
    a.readOnly,
  );

  return {
    layout: () => void layout(),
    layingOut,
    fit,
    addFromRail: (type: BlockType) => void add(type),
    /** A rail block dropped at a canvas point: centred on the pointer. */
    dropBlock: (type: BlockType, at: Point) => void add(type, { x: at.x - 40, y: at.y - 24 }),
    connectWire: (args: ConnectArgs) => void act("Connect", (d) => connect(d, args), { at: a.pointer.current }),
  };
}
