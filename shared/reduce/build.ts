import type { Field } from "@shared/algebra/field";
import { kindOf, type SignalRole } from "@shared/diagram/blockKinds";
import { wireLabel, type DiagramDocument } from "@shared/diagram/schema";
import { SignalFlowGraph, wirePart } from "@shared/reduce/graph";

/** Roles whose node is a junction block (true: it joins signals, false: it splits one); the others live on as edge labels or ends. */
const JUNCTION: Record<SignalRole, boolean | null> = { source: null, sink: null, sum: true, branch: false, scale: null, delay: null };

/**
 * The signal-flow graph of a validated document: one node per block (its output signal); each wire becomes an
 * edge by the role of the block it enters (see SignalRole): into a "scale" or "delay" block, an edge labelled
 * with that block and carrying its gain (a dead time's is its symbol e^(−sT)); into a sum port, a bare edge of gain ±1 (the port's sign); into a branch or a
 * sink, a bare edge of gain 1; into a source, nothing. `gains` holds the gain of every "scale" block.
 * Example: wire c → p (p a transfer block) becomes the edge c → p labelled "p" with gain G_p.
 */
export function buildSignalGraph<T>(
  doc: DiagramDocument,
  gains: ReadonlyMap<string, T>,
  field: Field<T>,
): SignalFlowGraph<T> {
  const graph = new SignalFlowGraph<T>();
  const blocks = new Map(doc.blocks.map((b) => [b.id, b]));
  doc.blocks.forEach((b, i) => {
    const joins = JUNCTION[kindOf(b).role];
    graph.addNode(b.id, i, joins === null ? null : { id: b.id, joins });
  });
  doc.wires.forEach((w, i) => {
    const target = blocks.get(w.to);
    if (!target || !blocks.has(w.from)) return;
    const before = [wirePart(wireLabel(w, i))];
    const bare = (sign: 1 | -1) =>
      graph.addEdge({ from: w.from, to: w.to, gain: sign > 0 ? field.one : field.neg(field.one), label: null, sign, before, after: [] });
    const role = kindOf(target).role;
    switch (role) {
      case "source":
        return;
      case "scale":
      case "delay": {
        const gain = gains.get(target.id);
        if (gain === undefined) throw new Error(`No gain given for block "${target.id}"`);
        graph.addEdge({ from: w.from, to: w.to, gain, label: target.id, sign: 1, before, after: [] });
        return;
      }
      case "sum":
        bare(target.type === "sum" && target.signs[w.port ?? 0] === "-" ? -1 : 1);
        return;
      case "branch":
      case "sink":
        bare(1);
        return;
      default: {
        const unhandled: never = role;
        throw new Error(`No reduction rule for blocks of role "${unhandled}"`);
      }
    }
  });
  graph.touched.clear();
  return graph;
}
