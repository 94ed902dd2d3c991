import type { BlockType } from "@shared/diagram/schema";
import { ArrowLeftToLine, ArrowRightFromLine, CircleDot, CirclePlus, Divide, Triangle } from "lucide-react";
import type { ReactNode } from "react";
import { TYPE_NAME } from "@/features/editor/lib/flowModel";

/** Drag payload type for blocks dragged from the rail onto the canvas. */
export const BLOCK_MIME = "application/x-loopwright-block";

/** The rail's blocks in order; the digit is the keyboard shortcut that adds one. */
const RAIL: { type: BlockType; short: string; key: string; glyph: ReactNode; hint: string }[] = [
  { type: "input", short: "Input", key: "1", glyph: <ArrowRightFromLine className="size-5" />, hint: "External signal: reference or disturbance" },
  { type: "sum", short: "Sum", key: "2", glyph: <CirclePlus className="size-5" />, hint: "Adds and subtracts its inputs" },
  { type: "gain", short: "Gain", key: "3", glyph: <Triangle className="size-5 rotate-90" />, hint: "Static gain, no s" },
  { type: "transfer", short: "Transfer", key: "4", glyph: <Divide className="size-5" />, hint: "Rational function of s" },
  { type: "integrator", short: "Integrator", key: "5", glyph: <span className="font-serif text-xl leading-5 italic">∫</span>, hint: "1/s" },
  { type: "branch", short: "Pickoff", key: "6", glyph: <CircleDot className="size-5" />, hint: "Pickoff: one signal to several wires" },
  { type: "output", short: "Output", key: "7", glyph: <ArrowLeftToLine className="size-5" />, hint: "A signal to observe" },
];

/** Blocks to add: click puts one in view, drag places it where it is dropped. */
export function BlockRail({ onAdd }: { onAdd: (type: BlockType) => void }) {
  return (
    <nav aria-label="Blocks" className="flex flex-col gap-1 border-r border-rule bg-paper-raised p-1.5">
      <p className="px-1 pb-1 text-[10px] font-semibold tracking-wider text-ink-faint uppercase">Add</p>
      {RAIL.map(({ type, short, key, glyph, hint }) => (
        <button
          key={type}
          type="button"
          draggable
          onDragStart={(e) => {
            e.dataTransfer.setData(BLOCK_MIME, type);
            e.dataTransfer.effectAllowed = "copy";
          }}
          onClick={() => onAdd(type)}
          aria-label={`Add ${TYPE_NAME[type].toLowerCase()}`}
          aria-keyshortcuts={key}
          title={`${TYPE_NAME[type]} — ${hint} (key ${key})`}
          className="group flex w-16 cursor-grab flex-col items-center gap-0.5 rounded px-1 py-1.5 text-ink-soft hover:bg-signal-tint hover:text-signal active:cursor-grabbing"
        >
          <span aria-hidden className="flex h-5 items-center">{glyph}</span>
          <span className="text-center text-[10px] leading-tight">{short}</span>
        </button>
      ))}
    </nav>
  );
}
