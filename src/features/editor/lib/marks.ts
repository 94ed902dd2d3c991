import type { Problem, Severity } from "@shared/diagram/problems";
import type { ReductionStep } from "@shared/reduce/result";
import type { Marks } from "@/features/editor/lib/flowModel";

const worse = (a: Severity | undefined, b: Severity): Severity => (a === "error" || b === "error" ? "error" : "warning");

/**
 * What a step consumed, in terms of the drawing: an equivalent block an earlier step produced (`eq1`)
 * stands for everything that step consumed, recursively.
 * Example: step 2 consumes eq1 and h, step 1 made eq1 from c and p → blocks c, p, h.
 */
export function stepFootprint(steps: ReductionStep[], index: number): { blocks: Set<string>; wires: Set<string> } {
  const made = new Map(steps.slice(0, index).map((s) => [s.produced, s]));
  const blocks = new Set<string>();
  const wires = new Set<string>();
  const visit = (s: ReductionStep) => {
    s.consumedWires.forEach((w) => wires.add(w));
    for (const id of s.consumedBlocks) {
      const earlier = made.get(id);
      if (earlier) {
        made.delete(id);
        visit(earlier);
      } else blocks.add(id);
    }
  };
  if (steps[index]) visit(steps[index]);
  return { blocks, wires };
}

/** Canvas marks: what the current reduction step consumed, the worst problem on each block and wire, the break wire. */
export function problemMarks(problems: Problem[], step: { blocks: Set<string>; wires: Set<string> } | null, breakWire: string | null = null): Marks {
  const blockProblems = new Map<string, Severity>();
  const wireProblems = new Map<string, Severity>();
  for (const p of problems) {
    for (const id of [p.blockId, ...(p.related ?? [])]) if (id) blockProblems.set(id, worse(blockProblems.get(id), p.severity));
    if (p.wireId) wireProblems.set(p.wireId, worse(wireProblems.get(p.wireId), p.severity));
  }
  return {
    highlightBlocks: step?.blocks ?? new Set(),
    highlightWires: step?.wires ?? new Set(),
    blockProblems,
    wireProblems,
    breakWire,
  };
}
