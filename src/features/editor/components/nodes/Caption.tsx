import type { Block } from "@shared/diagram/schema";
import { useFarView } from "@/features/editor/components/nodes/farView";

/** The id (and label) printed above a block, in the mono face so ids match the problem list and steps; left out when too small to read. */
export function Caption({ block }: { block: Block }) {
  if (useFarView()) return null;
  return (
    <div className="pointer-events-none absolute bottom-full left-1/2 mb-0.5 -translate-x-1/2 whitespace-nowrap font-mono text-[11px] text-ink-soft">
      {block.label ? `${block.label} · ${block.id}` : block.id}
    </div>
  );
}
