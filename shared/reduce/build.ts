import type { Field } from "@shared/algebra/field";
import { wireLabel, type DiagramDocument } from "@shared/diagram/schema";
import { SignalFlowGraph } from "@shared/reduce/graph";

/** Block types whose output is their input scaled by the block's own gain. */
export const SCALING_TYPES: ReadonlySet<string> = new Set(["gain", "transfer", "integrator"]);

/**
 * The signal-flow graph of a validated document: one node per block (its output signal); a wire into a
 * gain, transfer or integrator block is an edge labelled with that block and carrying its gain; a wire
 * into a sum port is a bare edge of gain ±1 (the port's sign); a wire into a branch or output block is a
 * bare edge of gain 1. `gains` holds the gain of every gain, transfer and integrator block.
 * Example: wire c → p (p a transfer block) becomes the edge c → p labelled "p" with gain G_p.
 */
export function buildSignalGraph<T>(
  doc: DiagramDocument,
  gains: ReadonlyMap<string, T>,
  field: Field<T>,
): SignalFlowGraph<T> {
  const graph = new SignalFlowGraph<T>();
  const blocks = new Map(doc.blocks.map((b) => [b.id, b]));
  doc.blocks.forEach((b, i) => graph.addNode(b.id, i, b.type === "sum" || b.type === "branch" ? b.id : null));
  doc.wires.forEach((w, i) => {
    const target = blocks.get(w.to);
    if (!target || !blocks.has(w.from) || target.type === "input") return;
    const wires = [wireLabel(w, i)];
    if (SCALING_TYPES.has(target.type)) {
      const gain = gains.get(target.id);
      if (gain === undefined) throw new Error(`No gain given for block "${target.id}"`);
      graph.addEdge({ from: w.from, to: w.to, gain, label: target.id, sign: 1, blocks: [], wires });
      return;
    }
    const sign = target.type === "sum" && target.signs[w.port ?? 0] === "-" ? -1 : 1;
    const gain = sign > 0 ? field.one : field.neg(field.one);
    graph.addEdge({ from: w.from, to: w.to, gain, label: null, sign, blocks: [], wires });
  });
  graph.touched.clear();
  return graph;
}
