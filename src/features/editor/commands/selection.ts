import type { Block } from "@shared/diagram/schema";
import { boundsOf, boxOf, fallbackPosition } from "@shared/geometry/blockBox";
import { BLOCK_VIEWS } from "@/features/editor/blockKinds";
import { GRID } from "@/features/editor/commands/blocks";
import { blockIds, idSource, wireIds } from "@/features/editor/commands/ids";
import { done, refuse, type EditorDoc, type EditorWire, type Outcome, type Point, type Selection } from "@/features/editor/commands/types";

/** A copied piece of a diagram: blocks, the wires between them, and where they stood. */
export interface Fragment {
  blocks: Block[];
  wires: EditorWire[];
  layout: Record<string, Point>;
}

/**
 * How far the n-th paste of a fragment lands from the original: one grid step right and the fragment's own
 * height plus two grid steps down for each paste, so no copy covers the blocks it was copied from.
 */
export function pasteOffset(fragment: Fragment, n: number): Point {
  const box = boundsOf(fragment.blocks.map((b) => boxOf(b, fragment.layout[b.id] ?? { x: 0, y: 0 }, undefined)));
  const height = box?.height ?? 0;
  return { x: n * GRID, y: n * (height + 2 * GRID) };
}

/** Every block and wire of the document. */
export const selectAll = (doc: EditorDoc): Selection => ({ blocks: doc.blocks.map((b) => b.id), wires: doc.wires.map((w) => w.id) });

/** The selected blocks and every wire with both ends among them (a dangling wire cannot be pasted). */
export function copySelection(doc: EditorDoc, sel: Selection): Fragment {
  const ids = new Set(sel.blocks);
  const blocks = doc.blocks.filter((b) => ids.has(b.id));
  const wires = doc.wires.filter((w) => ids.has(w.from) && ids.has(w.to));
  // Where each block is drawn: its layout entry, or the fallback place the canvas gives a block without one.
  const layout = Object.fromEntries(blocks.map((b) => [b.id, doc.layout?.[b.id] ?? fallbackPosition(doc.blocks.indexOf(b))]));
  return { blocks, wires, layout };
}

/** Deletes the selected blocks with all their wires, and the selected wires. */
export function deleteSelection(doc: EditorDoc, sel: Selection): Outcome {
  const gone = new Set(sel.blocks);
  const cut = new Set(sel.wires);
  if (gone.size === 0 && cut.size === 0) return refuse("Nothing is selected: click a block or wire first");
  const blocks = doc.blocks.filter((b) => !gone.has(b.id));
  const wires = doc.wires.filter((w) => !cut.has(w.id) && !gone.has(w.from) && !gone.has(w.to));
  const layout = Object.fromEntries(Object.entries(doc.layout ?? {}).filter(([id]) => !gone.has(id)));
  return done({ ...doc, blocks, wires, layout }, { blocks: [], wires: [] });
}

/**
 * Inserts a fragment with fresh block and wire ids, shifted by `offset`, and selects what was pasted.
 * Blocks keep their type's id prefix; wires are re-pointed to the new ids.
 */
export function paste(doc: EditorDoc, fragment: Fragment, offset: Point = pasteOffset(fragment, 1)): Outcome {
  if (fragment.blocks.length === 0) return refuse("The clipboard holds no blocks: copy a selection first");
  const freshBlock = idSource(blockIds(doc));
  const freshWire = idSource(wireIds(doc));
  const rename = new Map(fragment.blocks.map((b) => [b.id, freshBlock(BLOCK_VIEWS[b.type].idPrefix)]));
  const blocks = fragment.blocks.map((b) => ({ ...b, id: rename.get(b.id) as string }));
  const wires = fragment.wires.map((w) => ({
    ...w,
    id: freshWire("w"),
    from: rename.get(w.from) as string,
    to: rename.get(w.to) as string,
  }));
  const layout = { ...doc.layout };
  fragment.blocks.forEach((b, i) => {
    const at = fragment.layout[b.id] ?? { x: i * 96, y: 0 };
    layout[rename.get(b.id) as string] = { x: at.x + offset.x, y: at.y + offset.y };
  });
  return done(
    { ...doc, blocks: [...doc.blocks, ...blocks], wires: [...doc.wires, ...wires], layout },
    { blocks: blocks.map((b) => b.id), wires: wires.map((w) => w.id) },
  );
}

/** Copy and paste in one step. */
export const duplicate = (doc: EditorDoc, sel: Selection): Outcome =>
  sel.blocks.length === 0 ? refuse("Select blocks to duplicate") : paste(doc, copySelection(doc, sel));
