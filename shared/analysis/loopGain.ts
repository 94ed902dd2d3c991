// The loop gain at a break point, L = −w/u, through the reduction engine itself: the wire is cut, u is
// injected at its destination port (through that port's sign), w is read at its source, all else closed.
import { ratNeg, type RatFn } from "@shared/algebra/ratfn";
import { outgoingWires, blocksById, reachable } from "@shared/diagram/graph";
import type { Problem } from "@shared/diagram/problems";
import { wireLabel, type DiagramDocument, type Wire } from "@shared/diagram/schema";
import { reduceDocument } from "@shared/engine/reduceDocument";
import { AnalysisError } from "@shared/analysis/errors";
import { parseTransfer } from "@shared/analysis/nominal";

export interface BreakPoint {
  /** 0-based index in `wires`. */
  index: number;
  /** The wire's id, or its label `wire #i (from → to)`. */
  label: string;
  wire: Wire;
  /** "given" by the caller, or found by the default rule. */
  chosen: "given" | "default";
}

/**
 * The wire named by id or by its 0-based index in `wires` (an id wins over an index). Throws AnalysisError
 * "unknown-break-wire" naming the text. Example: findBreak(doc, "w6") → { index: 5, label: "w6", … }.
 */
export function findBreak(doc: DiagramDocument, text: string): BreakPoint {
  let index = doc.wires.findIndex((w) => w.id === text);
  if (index < 0 && /^\d+$/.test(text) && Number(text) < doc.wires.length) index = Number(text);
  if (index < 0) {
    const ids = doc.wires.map((w, i) => w.id ?? String(i)).join(", ");
    throw new AnalysisError("unknown-break-wire", `There is no wire "${text}" to break: give a wire id or a 0-based index into wires (${ids}).`, text);
  }
  return { index, label: wireLabel(doc.wires[index], index), wire: doc.wires[index], chosen: "given" };
}

/**
 * The default break: the wire into the first minus-signed port of the first summing junction with a minus
 * sign that the input reaches (breadth-first along the wires); null when there is none.
 * Example: r → e(+, −) → G → y with y → e port 1 gives the wire y → e.
 */
export function defaultBreak(doc: DiagramDocument, input: string): BreakPoint | null {
  const out = outgoingWires(doc);
  const blocks = blocksById(doc);
  const order = [...reachable([input], (id) => (out.get(id) ?? []).map((r) => r.wire.to))];
  for (const id of order) {
    const block = blocks.get(id);
    if (block?.type !== "sum") continue;
    const port = block.signs.indexOf("-");
    if (port < 0) continue;
    const index = doc.wires.findIndex((w) => w.to === id && w.port === port);
    if (index >= 0) return { index, label: wireLabel(doc.wires[index], index), wire: doc.wires[index], chosen: "default" };
  }
  return null;
}

const freshId = (taken: Set<string>, base: string): string => {
  let id = base;
  for (let i = 2; taken.has(id); i++) id = `${base}-${i}`;
  return id;
};

/**
 * The document with the wire cut: a new input block feeds the wire's destination port and a new output block
 * reads its source. Example: cutAt(doc, bp) → { doc, input: "break-u", output: "break-w" }.
 */
export function cutAt(doc: DiagramDocument, bp: BreakPoint): { doc: DiagramDocument; input: string; output: string } {
  const taken = new Set(doc.blocks.map((b) => b.id));
  const input = freshId(taken, "break-u");
  const output = freshId(taken, "break-w");
  const wires = doc.wires.filter((_, i) => i !== bp.index);
  const into: Wire = { id: `${input}-wire`, from: input, to: bp.wire.to, ...(bp.wire.port !== undefined ? { port: bp.wire.port } : {}) };
  const outOf: Wire = { id: `${output}-wire`, from: bp.wire.from, to: output };
  return {
    doc: { ...doc, blocks: [...doc.blocks, { id: input, type: "input" }, { id: output, type: "output" }], wires: [...wires, into, outOf] },
    input,
    output,
  };
}

/**
 * L = −w/u at the break, symbolic in the parameters. Example: unity negative feedback around G gives L = G.
 */
export function loopGain(doc: DiagramDocument, bp: BreakPoint): { ok: true; L: RatFn } | { ok: false; problems: Problem[] } {
  const cut = cutAt(doc, bp);
  const reduced = reduceDocument(cut.doc, { input: cut.input, output: cut.output });
  if (!reduced.ok) return { ok: false, problems: reduced.problems };
  const t = reduced.result.transfers[0];
  return { ok: true, L: ratNeg(parseTransfer(t.numerator, t.denominator, Object.keys(doc.parameters ?? {}))) };
}
