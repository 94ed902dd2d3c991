import type { BlockType } from "@shared/diagram/schema";

/** Id prefixes a control engineer reads at a glance: r reference, e error junction, G plant/controller, y output. */
export const BLOCK_ID_PREFIX: Record<BlockType, string> = {
  input: "r",
  output: "y",
  sum: "e",
  gain: "k",
  transfer: "G",
  integrator: "int",
  branch: "p",
};

/** The smallest `prefix<n>` (n ≥ 1) not in `taken`; the new id is added to `taken`. */
export function freshId(prefix: string, taken: Set<string>): string {
  let n = 1;
  while (taken.has(`${prefix}${n}`)) n += 1;
  const id = `${prefix}${n}`;
  taken.add(id);
  return id;
}

export const blockIds = (doc: { blocks: { id: string }[] }) => new Set(doc.blocks.map((b) => b.id));
export const wireIds = (doc: { wires: { id?: string }[] }) =>
  new Set(doc.wires.flatMap((w) => (w.id === undefined ? [] : [w.id])));
