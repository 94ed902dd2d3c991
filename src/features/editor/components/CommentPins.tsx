import { ViewportPortal } from "@xyflow/react";
import { pinTarget, type PinnedThread } from "@shared/api/comments";
import type { EditorDoc } from "@/features/editor/commands/types";
import type { FlowNode } from "@/features/editor/lib/flowModel";
import { nodeBox } from "@/features/editor/geometry/nodeBox";

const PIN = 22;

/**
 * Where a pin sits: just above a block's top-right corner, or above a wire's midpoint between its ends (clear of
 * the block, which would take the click); null when its target is gone.
 */
function anchorOf(pin: PinnedThread["pin"], boxes: ReadonlyMap<string, ReturnType<typeof nodeBox>>, doc: EditorDoc) {
  if ("blockId" in pin) {
    const b = boxes.get(pin.blockId);
    return b ? { x: b.x + b.width - PIN / 2, y: b.y - PIN - 2 } : null;
  }
  const wire = doc.wires.find((w) => w.id === pin.wireId);
  const a = wire && boxes.get(wire.from);
  const b = wire && boxes.get(wire.to);
  return a && b ? { x: (a.x + a.width + b.x) / 2 - PIN / 2, y: (a.y + a.height / 2 + b.y + b.height / 2) / 2 - PIN } : null;
}

/**
 * The numbered pins of the open version's review threads, drawn over the canvas. Each is a button that opens its
 * thread in the side panel; several on one target stand side by side.
 */
export function CommentPins({ pins, nodes, doc, onOpen }: { pins: PinnedThread[]; nodes: FlowNode[]; doc: EditorDoc; onOpen: (threadId: string) => void }) {
  if (pins.length === 0) return null;
  const boxes = new Map(nodes.map((n) => [n.id, nodeBox(n)]));
  const seen = new Map<string, number>();
  return (
    <ViewportPortal>
      {pins.map((t) => {
        const at = anchorOf(t.pin, boxes, doc);
        if (!at) return null;
        const key = JSON.stringify(t.pin);
        const nth = seen.get(key) ?? 0;
        seen.set(key, nth + 1);
        return (
          <button
            key={t.id}
            type="button"
            aria-label={`Comment ${t.number} on ${pinTarget(t.pin, doc)}${t.resolved ? ", resolved" : ""}`}
            title={`Comment ${t.number}`}
            onClick={() => onOpen(t.id)}
            className={`nopan nodrag pointer-events-auto absolute z-20 flex items-center justify-center rounded-full rounded-bl-none border text-xs font-semibold shadow-sm ${
              t.resolved ? "border-rule-strong bg-paper-sunk text-ink-soft" : "border-signal-strong bg-signal text-white"
            }`}
            style={{ width: PIN, height: PIN, transform: `translate(${at.x + nth * (PIN + 2)}px, ${at.y}px)` }}
          >
            {t.number}
          </button>
        );
      })}
    </ViewportPortal>
  );
}
