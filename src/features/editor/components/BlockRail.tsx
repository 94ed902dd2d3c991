import type { BlockType } from "@shared/diagram/schema";
import { BLOCK_TYPES, BLOCK_VIEWS } from "@/features/editor/blockKinds";

/** Drag payload type for blocks dragged from the rail onto the canvas. */
export const BLOCK_MIME = "application/x-loopwright-block";

/** Blocks to add: click puts one in view, drag places it where it is dropped. */
export function BlockRail({ onAdd }: { onAdd: (type: BlockType) => void }) {
  return (
    <nav aria-label="Blocks" className="flex flex-col gap-1 border-r border-rule bg-paper-raised p-1.5">
      <p className="px-1 pb-1 text-[10px] font-semibold tracking-wider text-ink-faint uppercase">Add</p>
      {BLOCK_TYPES.map((type) => ({ type, name: BLOCK_VIEWS[type].name, ...BLOCK_VIEWS[type].rail })).map(({ type, name, short, key, glyph, hint }) => (
        <button
          key={type}
          type="button"
          draggable
          onDragStart={(e) => {
            e.dataTransfer.setData(BLOCK_MIME, type);
            e.dataTransfer.effectAllowed = "copy";
          }}
          onClick={() => onAdd(type)}
          aria-label={`Add ${name.toLowerCase()}`}
          aria-keyshortcuts={key}
          title={`${name} — ${hint} (key ${key})`}
          className="group flex w-16 cursor-grab flex-col items-center gap-0.5 rounded px-1 py-1.5 text-ink-soft hover:bg-signal-tint hover:text-signal active:cursor-grabbing"
        >
          <span aria-hidden className="flex h-5 items-center">{glyph}</span>
          <span className="text-center text-[10px] leading-tight">{short}</span>
        </button>
      ))}
    </nav>
  );
}
