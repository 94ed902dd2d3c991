import { BLOCK_KINDS } from "@shared/diagram/blockKinds";
import { withArticle } from "@shared/text/words";
import { updateBlock } from "@/features/editor/commands/blocks";
import { done, refuse, type EditorDoc, type Outcome } from "@/features/editor/commands/types";

type Sign = "+" | "-";
const MAX_PORTS = 16;

/** Sets the sign of one input port of a summing junction. */
export function setSign(doc: EditorDoc, blockId: string, port: number, sign: Sign): Outcome {
  return updateBlock(doc, blockId, (b) => {
    if (b.type !== "sum") return `Block "${blockId}" is ${withArticle(BLOCK_KINDS[b.type].name)}, not a summing junction`;
    if (port < 0 || port >= b.signs.length) return `Summing junction "${blockId}" has no port ${port}`;
    const signs = b.signs.slice();
    signs[port] = sign;
    return { ...b, signs };
  });
}

/** Adds an input port with `sign` after the last one (at most 16). */
export function addSumPort(doc: EditorDoc, blockId: string, sign: Sign): Outcome {
  return updateBlock(doc, blockId, (b) => {
    if (b.type !== "sum") return `Block "${blockId}" is ${withArticle(BLOCK_KINDS[b.type].name)}, not a summing junction`;
    if (b.signs.length >= MAX_PORTS) return `A summing junction has at most ${MAX_PORTS} ports`;
    return { ...b, signs: [...b.signs, sign] };
  });
}

/**
 * Removes input port `port`: its wire goes too, and wires into higher ports move down by one so every
 * wire keeps its sign. The last port cannot be removed.
 */
export function removeSumPort(doc: EditorDoc, blockId: string, port: number): Outcome {
  const updated = updateBlock(doc, blockId, (b) => {
    if (b.type !== "sum") return `Block "${blockId}" is ${withArticle(BLOCK_KINDS[b.type].name)}, not a summing junction`;
    if (port < 0 || port >= b.signs.length) return `Summing junction "${blockId}" has no port ${port}`;
    if (b.signs.length === 1) return `Summing junction "${blockId}" keeps at least one port; delete the block instead`;
    return { ...b, signs: b.signs.filter((_, i) => i !== port) };
  });
  if (!updated.ok) return updated;
  const wires = updated.doc.wires
    .filter((w) => !(w.to === blockId && w.port === port))
    .map((w) => (w.to === blockId && w.port !== undefined && w.port > port ? { ...w, port: w.port - 1 } : w));
  return done({ ...updated.doc, wires });
}

/** Flips + and − on one port: the sign buttons drawn on the junction call this. */
export function toggleSign(doc: EditorDoc, blockId: string, port: number): Outcome {
  const block = doc.blocks.find((b) => b.id === blockId);
  if (block?.type !== "sum") return refuse(`Block "${blockId}" is not a summing junction`);
  return setSign(doc, blockId, port, block.signs[port] === "+" ? "-" : "+");
}
