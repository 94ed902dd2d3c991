import type { CommentPin } from "@shared/api/comments";

/** The blocks and wires of a saved version, as much as the comment form needs to offer them as pins. */
export interface PinnableDoc {
  blocks: readonly { id: string; label?: string }[];
  wires: readonly { id?: string; from: string; to: string }[];
}

export interface PinChoice {
  /** The select's value: "block:G", "wire:w3", or "" for no pin. */
  value: string;
  label: string;
}

export const pinValue = (pin: CommentPin | null): string => (!pin ? "" : "blockId" in pin ? `block:${pin.blockId}` : `wire:${pin.wireId}`);

export function pinOfValue(value: string): CommentPin | null {
  const [kind, ...rest] = value.split(":");
  const id = rest.join(":");
  if (!id) return null;
  return kind === "block" ? { blockId: id } : { wireId: id };
}

/**
 * What a thread may be pinned to in a version: nothing, each block (id and label), each wire (id, ends).
 * Example: pinChoices({ blocks: [{ id: "G", label: "Plant" }], wires: [] })[1] is { value: "block:G", label: "Block G (Plant)" }.
 */
export function pinChoices(doc: PinnableDoc): PinChoice[] {
  const blocks = doc.blocks.map((b) => ({ value: `block:${b.id}`, label: `Block ${b.id}${b.label ? ` (${b.label})` : ""}` }));
  const wires = doc.wires.flatMap((w) => (w.id ? [{ value: `wire:${w.id}`, label: `Wire ${w.id} (${w.from} → ${w.to})` }] : []));
  return [{ value: "", label: "Nothing: the whole version" }, ...blocks, ...wires];
}
