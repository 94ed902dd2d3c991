import { useId, useState, type FormEvent } from "react";
import type { ReductionStep } from "@shared/reduce/result";
import { Button } from "@/components/Button";
import { stepWindow } from "@/features/editor/lib/stepWindow";

export const RULE_NAME: Record<ReductionStep["rule"], string> = {
  series: "Series",
  parallel: "Parallel",
  feedback: "Feedback loop",
  "move-sum": "Move summing junction",
  "move-pickoff": "Move pickoff point",
  "eliminate-node": "Eliminate signal",
};

interface Props {
  steps: ReductionStep[];
  current: number | null;
  onChange: (index: number) => void;
}

/** The steps as a list to pick from; a long reduction shows only the steps around the current one, and a jump. */
export function StepList({ steps, current, onChange }: Props) {
  const { from, to } = stepWindow(steps.length, current);
  return (
    <>
      {(from > 0 || to < steps.length) && <StepJump count={steps.length} from={from} to={to} onGo={onChange} />}
      <ol className="flex flex-col gap-0.5 text-sm" aria-label="Reduction steps" start={from + 1}>
        {steps.slice(from, to).map((s, k) => {
          const i = from + k;
          return (
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
          );
        })}
      </ol>
    </>
  );
}

/** Which part of a long list is shown, and a field to go straight to any step. */
function StepJump({ count, from, to, onGo }: { count: number; from: number; to: number; onGo: (index: number) => void }) {
  const fieldId = useId();
  const [value, setValue] = useState("");
  const target = Number(value);
  const valid = Number.isInteger(target) && target >= 1 && target <= count;
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (valid) onGo(target - 1);
  };
  return (
    <form onSubmit={submit} className="flex flex-wrap items-center gap-2 text-xs text-ink-soft">
      <span>
        Showing steps {from + 1}–{to} of {count}.
      </span>
      <label htmlFor={fieldId}>Go to step</label>
      <input
        id={fieldId}
        type="number"
        min={1}
        max={count}
        value={value}
        onChange={(e) => setValue(e.target.value)}
        className="w-20 rounded border border-rule-strong bg-paper-raised px-2 py-0.5 font-mono"
      />
      <Button size="sm" type="submit" disabled={!valid}>
        Go
      </Button>
    </form>
  );
}
