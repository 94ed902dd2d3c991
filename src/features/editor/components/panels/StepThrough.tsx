import { ChevronLeft, ChevronRight } from "lucide-react";
import type { ReductionStep } from "@shared/reduce/result";
import { Button } from "@/components/Button";
import { LargeTex } from "@/features/editor/components/LargeTex";
import { RULE_NAME, StepList } from "@/features/editor/components/panels/StepList";
import { counted } from "@shared/text/words";

interface Props {
  steps: ReductionStep[];
  /** Index into `steps` of the step shown on the canvas, or null when not stepping. */
  current: number | null;
  onChange: (index: number | null) => void;
}

/** Walks the reduction one rule at a time; the canvas highlights what the current step consumed. */
export function StepThrough({ steps, current, onChange }: Props) {
  if (steps.length === 0) return <p className="text-sm text-ink-soft">No reduction steps: the result follows directly from the wiring.</p>;
  const step = current === null ? null : steps[current];
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-2">
        <Button size="sm" aria-label="Previous step" aria-keyshortcuts="[" disabled={current === null || current === 0} onClick={() => onChange((current ?? 1) - 1)}>
          <ChevronLeft className="size-4" aria-hidden /> Previous
        </Button>
        <Button size="sm" aria-label="Next step" aria-keyshortcuts="]" disabled={current === steps.length - 1} onClick={() => onChange(current === null ? 0 : current + 1)}>
          Next <ChevronRight className="size-4" aria-hidden />
        </Button>
        {current !== null && (
          <Button size="sm" variant="quiet" onClick={() => onChange(null)}>
            Stop stepping
          </Button>
        )}
        <span className="text-xs text-ink-soft" aria-live="polite">
          {current === null ? counted(steps.length, "step") : `Step ${current + 1} of ${steps.length}`}
        </span>
      </div>
      {step && (
        <section aria-label={`Step ${(current ?? 0) + 1}`} className="rounded border border-trace bg-trace-tint px-3 py-2 text-sm">
          <p className="font-semibold">{RULE_NAME[step.rule]}</p>
          <p className="mt-0.5">{step.description}</p>
          <p className="mt-1 text-xs text-ink-soft">
            Consumed blocks: <span className="font-mono">{step.consumedBlocks.join(", ") || "none"}</span>; wires:{" "}
            <span className="font-mono">{step.consumedWires.join(", ") || "none"}</span>
          </p>
          <p className="mt-1">
            Produces <span className="font-mono">{step.produced}</span> ={" "}
            <LargeTex latex={step.latex} what={`step ${(current ?? 0) + 1}`} plain={<span className="font-mono text-xs break-all">{step.expr}</span>} />
          </p>
        </section>
      )}
      <StepList steps={steps} current={current} onChange={onChange} />
    </div>
  );
}
