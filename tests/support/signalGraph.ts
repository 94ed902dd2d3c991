import type { DiagramDocument } from "@shared/diagram/schema";
import { cDiv, cx, cScale, type Complex } from "./complex";
import { evalExpr, type ParamValues } from "./evalExpr";

/**
 * The signal-flow graph of a document at one complex s: one node per block output signal, one branch
 * per wire with gain sign(port) × (gain of the receiving block). Read straight from the document
 * format (schema.ts) — no use of our parser, validator or reducer.
 */
export interface Branch {
  from: number;
  to: number;
  gain: Complex;
}

export interface NumericGraph {
  ids: string[];
  index: Map<string, number>;
  inputs: string[];
  outputs: string[];
  branches: Branch[];
}

/** Nominal parameter values of a document. */
export function documentParams(doc: DiagramDocument): ParamValues {
  const out: ParamValues = {};
  for (const [name, spec] of Object.entries(doc.parameters ?? {})) {
    out[name] = typeof spec === "number" ? spec : spec.value;
  }
  return out;
}

function blockGain(block: DiagramDocument["blocks"][number], s: Complex, params: ParamValues): Complex {
  switch (block.type) {
    case "gain":
    case "transfer":
      return evalExpr(block.expr, s, params);
    case "integrator":
      return cDiv(cx(1), s);
    default:
      return cx(1);
  }
}

export function numericGraph(doc: DiagramDocument, s: Complex, params: ParamValues): NumericGraph {
  const ids = doc.blocks.map((b) => b.id);
  const index = new Map(ids.map((id, i) => [id, i]));
  const gains = doc.blocks.map((b) => blockGain(b, s, params));
  const branches = doc.wires.map((w): Branch => {
    const to = index.get(w.to);
    const from = index.get(w.from);
    if (to === undefined || from === undefined) throw new Error(`wire ${w.from} → ${w.to}: unknown block`);
    const target = doc.blocks[to];
    const sign = target.type === "sum" && target.signs[w.port ?? 0] === "-" ? -1 : 1;
    return { from, to, gain: cScale(gains[to], sign) };
  });
  return {
    ids,
    index,
    inputs: doc.blocks.filter((b) => b.type === "input").map((b) => b.id),
    outputs: doc.blocks.filter((b) => b.type === "output").map((b) => b.id),
    branches,
  };
}
