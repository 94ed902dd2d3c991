import { ratField, type RatFn } from "@shared/algebra/ratfn";
import { carriesGain } from "@shared/diagram/blockKinds";
import type { Problem } from "@shared/diagram/problems";
import { wireLabel, type DiagramDocument } from "@shared/diagram/schema";
import type { Budget } from "@shared/reduce/budget";
import { buildSignalGraph } from "@shared/reduce/build";
import { SignalFlowGraph } from "@shared/reduce/graph";
import { checkLoops } from "@shared/reduce/loops";
import { loopComponents } from "@shared/reduce/scc";

/**
 * The loop problems (algebraic, improper, singular at values: see loopProblems) of the part of a document that
 * is well formed, for a document with other errors, so an ill-posed loop is reported whatever else is wrong.
 * Well formed: the blocks with a unique id whose gain could be formed (`gains`, for "scale" blocks) and the
 * wires no error in `problems` names. A loop component is judged only when all of it is well formed, found
 * with every wire whose ends exist: a doubtful wire or an unusable block inside a component could change its
 * determinant, so such a component is skipped, never guessed.
 * Example: an unconnected block beside r → e(+,+) ⇄ gain 1 → [{ code: "algebraic-loop", related: ["e", "g"] }].
 */
export function wellFormedLoopProblems(
  doc: DiagramDocument,
  gains: ReadonlyMap<string, RatFn>,
  problems: readonly Problem[],
  budget: Budget,
): Problem[] {
  const doubtfulWires = new Set(problems.flatMap((p) => (p.severity === "error" && p.wireId !== undefined ? [p.wireId] : [])));
  const counts = new Map<string, number>();
  for (const b of doc.blocks) counts.set(b.id, (counts.get(b.id) ?? 0) + 1);
  const usable = new Set(
    doc.blocks.filter((b) => counts.get(b.id) === 1 && (!carriesGain(b) || gains.has(b.id))).map((b) => b.id),
  );
  const wired = doc.wires.map((wire, i) => ({ wire, sound: !doubtfulWires.has(wireLabel(wire, i)) }));
  const judged = new Set<string>();
  for (const component of loopComponents(wireShape(doc))) {
    const members = new Set(component);
    const inside = wired.filter(({ wire }) => members.has(wire.from) && members.has(wire.to));
    if (component.every((id) => usable.has(id)) && inside.every((w) => w.sound)) component.forEach((id) => judged.add(id));
  }
  if (judged.size === 0) return [];
  // Only the judged components' own blocks and wires: every edge of the graph then has its gain.
  const part: DiagramDocument = {
    ...doc,
    blocks: doc.blocks.filter((b) => judged.has(b.id)),
    wires: wired.filter(({ wire, sound }) => sound && judged.has(wire.from) && judged.has(wire.to)).map(({ wire }) => wire),
  };
  return checkLoops(buildSignalGraph(part, gains, ratField), gains, undefined, budget).problems;
}

/** Which block's output feeds which block, along every wire whose ends exist (its gain does not matter here). */
function wireShape(doc: DiagramDocument): SignalFlowGraph<null> {
  const shape = new SignalFlowGraph<null>();
  doc.blocks.forEach((b, i) => {
    if (!shape.nodes.has(b.id)) shape.addNode(b.id, i, null);
  });
  for (const { from, to } of doc.wires) {
    if (shape.nodes.has(from) && shape.nodes.has(to)) shape.addEdge({ from, to, gain: null, label: null, sign: 1, before: [], after: [] });
  }
  return shape;
}
