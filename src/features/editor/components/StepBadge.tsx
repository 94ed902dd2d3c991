import { useLayoutEffect, useMemo, useRef, useState } from "react";
import { ViewportPortal } from "@xyflow/react";
import type { ReductionStep } from "@shared/reduce/result";
import type { Size } from "@shared/geometry/blockBox";
import type { EditorDoc } from "@/features/editor/commands/types";
import { isLarge } from "@/features/editor/components/LargeTex";
import { Tex } from "@/features/editor/components/Tex";
import { stepCallout } from "@/features/editor/geometry/stepCallout";
import type { FlowNode } from "@/features/editor/lib/flowModel";

interface Props {
  step: ReductionStep;
  /** The step's number within its pair, from 1. */
  number: number;
  /** What the step consumed, on the drawing (see stepFootprint). */
  footprint: { blocks: ReadonlySet<string>; wires: ReadonlySet<string> };
  nodes: FlowNode[];
  doc: EditorDoc;
}

/**
 * The equivalent block a step produced, as a callout on the canvas beside the blocks and wires it replaced, never
 * over them (see stepCallout). It is measured once drawn and shown once placed (a step that consumed nothing drawn
 * has no place).
 */
export function StepBadge({ step, number, footprint, nodes, doc }: Props) {
  const ref = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState<Size | null>(null);
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el) return;
    // offsetWidth/Height are in canvas units: the viewport's zoom is a transform above the portal.
    const measure = () => setSize((s) => (s?.width === el.offsetWidth && s.height === el.offsetHeight ? s : { width: el.offsetWidth, height: el.offsetHeight }));
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  const box = useMemo(() => (size ? stepCallout(nodes, doc, footprint, size) : null), [nodes, doc, footprint, size]);
  return (
    <ViewportPortal>
      <div
        ref={ref}
        role="note"
        aria-label={`Result of step ${number}: ${step.produced}`}
        className="pointer-events-none absolute rounded border-2 border-trace bg-paper-raised px-2 py-1 text-sm shadow-md"
        style={{ transform: `translate(${box?.x ?? 0}px, ${box?.y ?? 0}px)`, visibility: box ? "visible" : "hidden" }}
      >
        <span className="mr-1 font-mono text-xs text-ink-soft">{step.produced} =</span>
        {/* A large formula stays text here; the steps panel typesets it on request. */}
        {isLarge(step.latex) ? <span className="inline-block max-w-md truncate align-bottom font-mono text-xs">{step.expr}</span> : <Tex latex={step.latex} />}
      </div>
    </ViewportPortal>
  );
}
