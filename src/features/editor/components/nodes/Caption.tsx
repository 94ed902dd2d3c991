import type { Block } from "@shared/diagram/schema";

/** The id (and label) printed above a block, in the mono face so ids match the problem list and steps. */
export function Caption({ block }: { block: Block }) {
  return (
    <div className="pointer-events-none absolute bottom-full left-1/2 mb-0.5 -translate-x-1/2 whitespace-nowrap font-mono text-[11px] text-ink-soft">
      {block.label ? `${block.label} · ${block.id}` : block.id}
    </div>
  );
}
