import { wireLabel, type DiagramDocument } from "@shared/diagram/schema";
import type { ReductionStep } from "@shared/reduce/result";

/**
 * Consistency of a reduction trace, as the editor replays it: indexes run 0, 1, 2…; within each pair every
 * consumed id is a document block, a document wire (by id or label) or an equivalent block produced earlier
 * in that pair, and is consumed at most once; every produced id is new and is consumed later in the pair,
 * except the pair's last step, which produces the final result. Returns the violations (empty when fine).
 */
export function traceViolations(doc: DiagramDocument, steps: readonly Omit<ReductionStep, "expr" | "latex">[]): string[] {
  const out: string[] = [];
  const blocks = new Set(doc.blocks.map((b) => b.id));
  const wires = new Set(doc.wires.map((w, i) => wireLabel(w, i)));
  const produced = new Set<string>();
  const byPair = new Map<string, Omit<ReductionStep, "expr" | "latex">[]>();
  steps.forEach((s, i) => {
    if (s.index !== i) out.push(`step ${i} has index ${s.index}`);
    if (produced.has(s.produced)) out.push(`${s.produced} produced twice`);
    produced.add(s.produced);
    const key = `${s.input}→${s.output}`;
    byPair.set(key, [...(byPair.get(key) ?? []), s]);
  });
  for (const [key, list] of byPair) {
    const made = new Set<string>();
    const used = new Set<string>();
    for (const s of list) {
      for (const id of s.consumedBlocks) {
        if (!blocks.has(id) && !made.has(id)) out.push(`${key}: step ${s.index} consumes unknown block ${id}`);
        if (used.has(id)) out.push(`${key}: ${id} consumed twice`);
        used.add(id);
      }
      for (const id of s.consumedWires) {
        if (!wires.has(id)) out.push(`${key}: step ${s.index} consumes unknown wire ${id}`);
        if (used.has(`wire:${id}`)) out.push(`${key}: wire ${id} consumed twice`);
        used.add(`wire:${id}`);
      }
      made.add(s.produced);
    }
    const last = list[list.length - 1].produced;
    for (const id of made) if (!used.has(id) && id !== last) out.push(`${key}: ${id} is never consumed`);
    if (used.has(last)) out.push(`${key}: the final ${last} is consumed`);
  }
  return out;
}
