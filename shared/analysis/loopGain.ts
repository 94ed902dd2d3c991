// The loop gain at a break point, L = −w/u, from the reducer's own signal-flow graph: the wire's edge is cut,
// u is injected at its destination (through that edge's gain: the port's sign or the block's transfer), w is
// read at its source, all else closed. No document is copied and nothing printed is read back.
import { ratNeg, ratField, type RatFn } from "@shared/algebra/ratfn";
import { outgoingWires, blocksById, reachable } from "@shared/diagram/graph";
import type { Problem } from "@shared/diagram/problems";
import { wireLabel, type DiagramDocument, type Wire } from "@shared/diagram/schema";
import { createBudget } from "@shared/reduce/budget";
import { SignalFlowGraph, wirePart } from "@shared/reduce/graph";
import { weighRat } from "@shared/reduce/ratView";
import { reducePairs } from "@shared/reduce/reduce";
import { reductionProblem, type ExactReduction } from "@shared/reduce/reduceDiagram";
import { AnalysisError } from "@shared/analysis/errors";

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
 * The default break: a wire into a minus-signed port of the first summing junction, with such a wire on a loop, that
 * the input reaches (breadth-first along the wires): a loop wire, never a disturbance's own wire into a minus port,
 * which would give L = 0. Null when there is none.
 * Example: r → e(+, −) → G → y with y → e port 1 gives the wire y → e; d → e2(−, +) with d outside the loop skips d → e2.
 */
export function defaultBreak(doc: DiagramDocument, input: string): BreakPoint | null {
  const out = outgoingWires(doc);
  const blocks = blocksById(doc);
  const downstream = (from: string) => reachable([from], (id) => (out.get(id) ?? []).map((r) => r.wire.to));
  const order = [...downstream(input)];
  for (const id of order) {
    const block = blocks.get(id);
    if (block?.type !== "sum") continue;
    // The junction's loop: what it feeds that comes back to it. A wire from there closes the loop.
    const onLoop = downstream(id);
    const index = doc.wires.findIndex((w) => w.to === id && w.port !== undefined && block.signs[w.port] === "-" && onLoop.has(w.from));
    if (index >= 0) return { index, label: wireLabel(doc.wires[index], index), wire: doc.wires[index], chosen: "default" };
  }
  return null;
}

const freshId = (taken: ReadonlyMap<string, unknown>, base: string): string => {
  let id = base;
  for (let i = 2; taken.has(id); i++) id = `${base}-${i}`;
  return id;
};

/**
 * The graph with the break wire's edge cut: a new source node u feeds the wire's destination through the
 * cut edge's gain, and a new node w reads the wire's source. A wire with no edge (into an input block) cuts nothing.
 * Example: cutGraph(graph, bp) → { graph, input: "break-u", output: "break-w" }.
 */
export function cutGraph(graph: SignalFlowGraph<RatFn>, bp: BreakPoint): { graph: SignalFlowGraph<RatFn>; input: string; output: string } {
  const label = wireLabel(bp.wire, bp.index);
  const cut = new SignalFlowGraph<RatFn>();
  const input = freshId(graph.nodes, "break-u");
  const output = freshId(graph.nodes, "break-w");
  let last = -1;
  for (const n of graph.nodes.values()) {
    cut.addNode(n.id, n.order, n.own);
    last = Math.max(last, n.order);
  }
  cut.addNode(input, last + 1, null);
  cut.addNode(output, last + 2, null);
  for (const e of graph.edges()) {
    const { seq: _seq, ...draft } = e;
    // An edge of the untouched graph is one wire, its first part.
    if (e.before[0]?.id !== label) cut.addEdge(draft);
    else cut.addEdge({ ...draft, from: input, before: [wirePart(`${input}-wire`)] });
  }
  cut.addEdge({ from: bp.wire.from, to: output, gain: ratField.one, label: null, sign: 1, before: [wirePart(`${output}-wire`)], after: [] });
  cut.touched.clear();
  return { graph: cut, input, output };
}

/**
 * L = −w/u at the break, symbolic in the parameters. Example: unity negative feedback around G gives L = G.
 */
export function loopGain(reduction: ExactReduction, bp: BreakPoint): { ok: true; L: RatFn } | { ok: false; problems: Problem[] } {
  const cut = cutGraph(reduction.graph, bp);
  try {
    const { transfers } = reducePairs(cut.graph, ratField, [[cut.input, cut.output]], createBudget(), { trace: false, weigh: weighRat });
    return { ok: true, L: ratNeg(transfers[0].gain) };
  } catch (err) {
    const problem = reductionProblem(err);
    if (!problem) throw err;
    return { ok: false, problems: [problem] };
  }
}
