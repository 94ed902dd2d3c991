import type { Problem, Severity } from "@shared/diagram/problems";
import type { ReductionStep } from "@shared/reduce/result";
import type { Marks } from "@/features/editor/lib/flowModel";

const worse = (a: Severity | undefined, b: Severity): Severity => (a === "error" || b === "error" ? "error" : "warning");

/** Canvas marks: what the current reduction step consumed, and the worst problem on each block and wire. */
export function problemMarks(problems: Problem[], step: ReductionStep | null): Marks {
  const blockProblems = new Map<string, Severity>();
  const wireProblems = new Map<string, Severity>();
  for (const p of problems) {
    for (const id of [p.blockId, ...(p.related ?? [])]) if (id) blockProblems.set(id, worse(blockProblems.get(id), p.severity));
    if (p.wireId) wireProblems.set(p.wireId, worse(wireProblems.get(p.wireId), p.severity));
  }
  return {
    highlightBlocks: new Set(step?.consumedBlocks ?? []),
    highlightWires: new Set(step?.consumedWires ?? []),
    blockProblems,
    wireProblems,
  };
}
