import { wireLabel, type Block, type DiagramDocument, type Wire } from "@shared/diagram/schema";

/**
 * Adjacency of a diagram document, shared by the validator and the reducer. Blocks are keyed by id (the
 * first block with an id wins; duplicates are a validation error). Only wires whose two ends exist are
 * indexed, so these helpers are safe on unvalidated documents.
 */
export interface WireRef {
  wire: Wire;
  /** 0-based position in `doc.wires`. */
  index: number;
  /** How messages name the wire: its id, else `wire #i (from → to)`. */
  label: string;
}

type Wiring = Pick<DiagramDocument, "blocks" | "wires">;

/** Number of input ports: one per sign on a sum, none on an input, one otherwise. Example: sum ["+","-"] → 2. */
export function inputPortCount(block: Block): number {
  if (block.type === "sum") return block.signs.length;
  return block.type === "input" ? 0 : 1;
}

/** The port a wire enters on `target`: its `port` on a sum (undefined if missing), 0 on any other block. */
export function wireTargetPort(wire: Wire, target: Block): number | undefined {
  return target.type === "sum" ? wire.port : 0;
}

/** Blocks by id, first occurrence wins. Example: blocksById(doc).get("c")?.type === "transfer". */
export function blocksById(doc: Pick<DiagramDocument, "blocks">): Map<string, Block> {
  const map = new Map<string, Block>();
  for (const block of doc.blocks) if (!map.has(block.id)) map.set(block.id, block);
  return map;
}

function connectedWires(doc: Wiring, blocks: Map<string, Block>): WireRef[] {
  return doc.wires
    .map((wire, index) => ({ wire, index, label: wireLabel(wire, index) }))
    .filter(({ wire }) => blocks.has(wire.from) && blocks.has(wire.to));
}

/**
 * Wires leaving each block, in document order; every block id has an entry (possibly empty).
 * Example: outgoingWires(doc).get("p")?.map((r) => r.wire.to) → ["y", "h"] (a fan-out).
 */
export function outgoingWires(doc: Wiring): Map<string, WireRef[]> {
  const blocks = blocksById(doc);
  const out = new Map<string, WireRef[]>([...blocks.keys()].map((id) => [id, []]));
  for (const ref of connectedWires(doc, blocks)) out.get(ref.wire.from)?.push(ref);
  return out;
}

/**
 * Wires entering each block, grouped by input port (index = port); every block id has an entry with
 * `inputPortCount` lists. In a valid diagram each list holds exactly one wire. Wires with a missing or
 * out-of-range port, and wires into an input block, are left out (the validator reports them).
 * Example: incomingWiresByPort(doc).get("e")?.[1][0].wire.from === "h".
 */
export function incomingWiresByPort(doc: Wiring): Map<string, WireRef[][]> {
  const blocks = blocksById(doc);
  const into = new Map<string, WireRef[][]>(
    [...blocks].map(([id, block]) => [id, Array.from({ length: inputPortCount(block) }, () => [])]),
  );
  for (const ref of connectedWires(doc, blocks)) {
    const target = blocks.get(ref.wire.to) as Block;
    const port = wireTargetPort(ref.wire, target);
    if (port !== undefined) into.get(target.id)?.[port]?.push(ref);
  }
  return into;
}

/** Every block reachable from `starts` (included) following `next`. Example: reachable(["r"], successors). */
export function reachable(starts: Iterable<string>, next: (id: string) => Iterable<string>): Set<string> {
  const seen = new Set(starts);
  const queue = [...seen];
  for (let k = 0; k < queue.length; k += 1) {
    for (const id of next(queue[k])) {
      if (!seen.has(id)) {
        seen.add(id);
        queue.push(id);
      }
    }
  }
  return seen;
}
