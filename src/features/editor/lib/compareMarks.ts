import type { DiagramDiff } from "@shared/diagram/diff";
import type { Change, Marks } from "@/features/editor/lib/flowModel";

const NONE = new Set<string>();

/**
 * The canvas marks of one side of a comparison: the older version marks what was removed or changed, the newer one
 * what was added or changed. Example: compareMarks(diff, "after").changes.get("g") === "changed".
 */
export function compareMarks(diff: DiagramDiff, side: "before" | "after"): Marks {
  const changes = new Map<string, Change>();
  for (const b of diff.blocks.changed) changes.set(b.id, "changed");
  const own = side === "before" ? { blocks: diff.blocks.removed, wires: diff.wires.removed, as: "removed" as const } : { blocks: diff.blocks.added, wires: diff.wires.added, as: "added" as const };
  for (const b of own.blocks) changes.set(b.id, own.as);
  for (const w of own.wires) if (w.id) changes.set(w.id, own.as);
  return { highlightBlocks: NONE, highlightWires: NONE, blockProblems: new Map(), wireProblems: new Map(), breakWire: null, changes };
}
