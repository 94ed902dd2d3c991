import { ChevronLeft, ChevronRight } from "lucide-react";
import type { ReductionStep } from "@shared/reduce/result";
import { Button } from "@/components/Button";
import { Tex } from "@/features/editor/components/Tex";

const RULE_NAME: Record<ReductionStep["rule"], string> = {
  series: "Series",
  parallel: "Parallel",
  feedback: "Feedback loop",
  "move-sum": "Move summing junction",
  "move-pickoff": "Move pickoff point",
  "eliminate-node": "Eliminate signal",
};

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
          {current === null ? `${steps.length} step${steps.length === 1 ? "" : "s"}` : `Step ${current + 1} of ${steps.length}`}
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
            <Tex latex={step.latex} />
          </p>
        </section>
      )}
      <ol className="flex flex-col gap-0.5 text-sm" aria-label="Reduction steps">
        {steps.map((s, i) => (
          <li key={`${s.index}-${i}`}>
            <button
              type="button"
              aria-current={i === current ? "step" : undefined}
              onClick={() => onChange(i)}
              className="w-full rounded px-2 py-1 text-left hover:bg-paper-sunk aria-[current=step]:bg-trace-tint aria-[current=step]:font-medium"
            >
              <span className="mr-2 font-mono text-xs text-ink-faint">{i + 1}.</span>
              {RULE_NAME[s.rule]} → <span className="font-mono">{s.produced}</span>
            </button>
          </li>
        ))}
      </ol>
    </div>
  );
}
