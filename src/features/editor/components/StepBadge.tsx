import { ViewportPortal } from "@xyflow/react";
import type { ReductionStep } from "@shared/reduce/result";
import { isLarge } from "@/features/editor/components/LargeTex";
import { Tex } from "@/features/editor/components/Tex";
import type { FlowNode } from "@/features/editor/lib/flowModel";

/** The equivalent block a step produced, drawn on the canvas just under the blocks it replaced. */
export function StepBadge({ step, blocks, nodes }: { step: ReductionStep; blocks: ReadonlySet<string>; nodes: FlowNode[] }) {
  const consumed = nodes.filter((n) => blocks.has(n.id));
  if (consumed.length === 0) return null;
  const left = Math.min(...consumed.map((n) => n.position.x));
  const bottom = Math.max(...consumed.map((n) => n.position.y + (n.measured?.height ?? 48)));
  return (
    <ViewportPortal>
      <div
        className="pointer-events-none absolute rounded border-2 border-trace bg-paper-raised px-2 py-1 text-sm shadow-md"
        style={{ transform: `translate(${left}px, ${bottom + 28}px)` }}
      >
        <span className="mr-1 font-mono text-xs text-ink-soft">{step.produced} =</span>
        {/* A large formula stays text here; the steps panel typesets it on request. */}
        {isLarge(step.latex) ? <span className="inline-block max-w-md truncate align-bottom font-mono text-xs">{step.expr}</span> : <Tex latex={step.latex} />}
      </div>
    </ViewportPortal>
  );
}
