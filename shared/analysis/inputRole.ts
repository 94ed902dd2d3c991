import { blocksById, outgoingWires, reachable } from "@shared/diagram/graph";
import type { DiagramDocument } from "@shared/diagram/schema";
import { defaultBreak } from "@shared/analysis/loopGain";

/**
 * How a pair's input enters the loop: at the comparison junction (the summing junction where the fed-back signal is
 * subtracted) as a reference, anywhere else in the loop as a disturbance, or with no loop in its way.
 */
export type InputRole = { kind: "reference" } | { kind: "disturbance"; entersAt: string[]; junction: string } | { kind: "no-loop" };

/**
 * The role of `input`: the loop is that of the default break's junction (the blocks it feeds that feed back to it);
 * the input is a reference when the first blocks of that loop it reaches are the junction alone.
 * Example: d into a sum after the plant of r → e(+, −) → G → s2 → y, y → e: { kind: "disturbance", entersAt: ["s2"], junction: "e" }.
 */
export function inputRole(doc: DiagramDocument, input: string): InputRole {
  const bp = defaultBreak(doc, input);
  if (!bp) return { kind: "no-loop" };
  const out = outgoingWires(doc);
  const next = (id: string) => (out.get(id) ?? []).map((r) => r.wire.to);
  const junction = bp.wire.to;
  const feeds = reachable([junction], next);
  const loop = new Set([...feeds].filter((id) => reachable([id], next).has(junction)));
  // Walk from the input and stop at the loop: where the walk first touches it is where the input enters.
  const entersAt: string[] = [];
  const seen = new Set([input]);
  const queue = [input];
  for (let k = 0; k < queue.length; k++) {
    for (const to of next(queue[k])) {
      if (seen.has(to)) continue;
      seen.add(to);
      if (loop.has(to)) entersAt.push(to);
      else queue.push(to);
    }
  }
  const blocks = blocksById(doc);
  const sorted = entersAt.filter((id) => blocks.has(id)).sort();
  return sorted.length === 1 && sorted[0] === junction ? { kind: "reference" } : { kind: "disturbance", entersAt: sorted, junction };
}
