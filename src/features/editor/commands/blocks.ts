import { BLOCK_KINDS, hasExpression } from "@shared/diagram/blockKinds";
import { withArticle } from "@shared/text/words";
import type { Block, BlockType } from "@shared/diagram/schema";
import { BLOCK_VIEWS } from "@/features/editor/blockKinds";
import { blockIds, freshId } from "@/features/editor/commands/ids";
import { done, refuse, type EditorDoc, type Outcome, type Point } from "@/features/editor/commands/types";

export const GRID = 16;
const snap = (v: number) => Math.round(v / GRID) * GRID;

/** Adds a block of `type` with a fresh id at `at` (snapped to the grid) and selects it. */
export function addBlock(doc: EditorDoc, type: BlockType, at: Point): Outcome {
  const kind = BLOCK_VIEWS[type];
  const id = freshId(kind.idPrefix, blockIds(doc));
  const layout = { ...doc.layout, [id]: { x: snap(at.x), y: snap(at.y) } };
  return done({ ...doc, blocks: [...doc.blocks, kind.create(id)], layout }, { blocks: [id], wires: [] });
}

/** Replaces one block by `change(block)`; a string from `change` is the refusal reason. */
export function updateBlock(doc: EditorDoc, blockId: string, change: (b: Block) => Block | string): Outcome {
  const index = doc.blocks.findIndex((b) => b.id === blockId);
  if (index < 0) return refuse(`Block "${blockId}" no longer exists`);
  const next = change(doc.blocks[index]);
  if (typeof next === "string") return refuse(next);
  const blocks = doc.blocks.slice();
  blocks[index] = next;
  return done({ ...doc, blocks });
}

/** Sets the expression of a block that has one, as typed (checked live by the parser, not here). */
export function setExpression(doc: EditorDoc, blockId: string, expr: string): Outcome {
  return updateBlock(doc, blockId, (b) => (hasExpression(b) ? { ...b, expr } : `Block "${blockId}" is ${withArticle(BLOCK_KINDS[b.type].name)} and has no expression`));
}

/** Sets the label shown on a block; an empty label removes it (the id is shown instead). */
export function setLabel(doc: EditorDoc, blockId: string, label: string): Outcome {
  if (label.length > 200) return refuse("A label has at most 200 characters");
  return updateBlock(doc, blockId, (b) => {
    const { label: _old, ...rest } = b;
    return (label.trim() === "" ? rest : { ...rest, label }) as Block;
  });
}

/** Moves blocks to new top-left positions (snapped); used for drags, arrow keys and auto layout. */
export function moveBlocks(doc: EditorDoc, moves: Record<string, Point>): Outcome {
  const known = blockIds(doc);
  const layout = { ...doc.layout };
  let changed = false;
  for (const [id, p] of Object.entries(moves)) {
    if (!known.has(id)) continue;
    const next = { x: snap(p.x), y: snap(p.y) };
    const old = layout[id];
    if (old && old.x === next.x && old.y === next.y) continue;
    layout[id] = next;
    changed = true;
  }
  // An unchanged document is not recorded in the history.
  return done(changed ? { ...doc, layout } : doc);
}
