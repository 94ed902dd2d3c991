import type { Problem } from "@shared/diagram/problems";
import type { DiagramDocument } from "@shared/diagram/schema";
import { incomingWiresByPort, outgoingWires, reachable } from "@shared/diagram/graph";

/**
 * Warnings for blocks that cannot matter: none of the inputs reaches them, or they reach no output.
 * Skipped in a direction when the diagram has no input (or no output) at all — that is already an error.
 * Example: a gain fed by an input but wired to nothing → "does-not-reach-output" on that gain.
 */
export function reachabilityProblems(doc: DiagramDocument): Problem[] {
  const outgoing = outgoingWires(doc);
  const incoming = incomingWiresByPort(doc);
  const inputs = doc.blocks.filter((b) => b.type === "input").map((b) => b.id);
  const outputs = doc.blocks.filter((b) => b.type === "output").map((b) => b.id);
  const problems: Problem[] = [];
  const warn = (code: string, blockId: string, message: string) =>
    problems.push({ severity: "warning", code, blockId, message });
  const reported = new Set<string>();
  if (inputs.length > 0) {
    const fed = reachable(inputs, (id) => (outgoing.get(id) ?? []).map((r) => r.wire.to));
    for (const { id } of doc.blocks) {
      if (fed.has(id) || reported.has(id)) continue;
      reported.add(id);
      warn("unreachable-from-input", id, `Block "${id}" is not reached from any input, so no result depends on it`);
    }
  }
  if (outputs.length > 0) {
    const feeding = reachable(outputs, (id) => (incoming.get(id) ?? []).flat().map((r) => r.wire.from));
    reported.clear();
    for (const { id } of doc.blocks) {
      if (feeding.has(id) || reported.has(id)) continue;
      reported.add(id);
      warn("does-not-reach-output", id, `Block "${id}" reaches no output, so it does not appear in any result`);
    }
  }
  return problems;
}
