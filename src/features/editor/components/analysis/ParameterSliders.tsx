import { useId, useState } from "react";
import { Button } from "@/components/Button";
import { formatNumber } from "@/features/editor/lib/analysisFormat";
import { isLogRange } from "@shared/analysis/scale";
import { SLIDER_STEPS, sliderToValue, valueToSlider } from "@/features/editor/lib/sliderScale";
import type { ParameterInfo } from "@shared/analysis/answer";

interface Props {
  parameters: ParameterInfo[];
  /** Slider values; a parameter not named here sits at its nominal value. */
  values: Record<string, number>;
  /** null resets the parameter to its nominal value. */
  onValue: (name: string, value: number | null) => void;
  /** The parameter the sweep tab sweeps (null: the first). */
  sweep: string | null;
  onSweep: (name: string) => void;
}

/** One slider per parameter over its range from the parameter table; moving one leaves the diagram unchanged. */
export function ParameterSliders({ parameters, values, onValue, sweep, onSweep }: Props) {
  const sweepId = useId();
  if (parameters.length === 0) return <p className="text-sm text-ink-soft">No parameters: add one to the parameter table to get a slider.</p>;
  return (
    <div className="flex flex-col gap-3">
      <p className="text-xs text-ink-soft">Slider values apply to the analysis only; the diagram keeps its nominal values.</p>
      {parameters.map((p) => (
        <SliderRow key={p.name} parameter={p} value={values[p.name]} onValue={(v) => onValue(p.name, v)} />
      ))}
      <div className="flex items-center gap-2 text-sm">
        <label htmlFor={sweepId} className="text-ink-soft">Parameter swept</label>
        <select id={sweepId} value={sweep ?? parameters[0].name} onChange={(e) => onSweep(e.target.value)} className="rounded border border-rule-strong bg-paper-raised px-2 py-1">
          {parameters.map((p) => (
            <option key={p.name} value={p.name}>{p.name}</option>
          ))}
        </select>
      </div>
    </div>
  );
}

function SliderRow({ parameter, value, onValue }: { parameter: ParameterInfo; value: number | undefined; onValue: (v: number | null) => void }) {
  const id = useId();
  const { name, nominal, range, unit, description } = parameter;
  const current = value ?? nominal;
  // What the user is typing, until the field loses focus (so "1." or "-" can be typed on the way to a number).
  const [draft, setDraft] = useState<string | null>(null);
  const unitText = unit ? ` (${unit})` : "";
  return (
    <div role="group" aria-labelledby={`${id}-label`} className="flex flex-col gap-1 rounded border border-rule bg-paper px-3 py-2">
      <div className="flex items-baseline justify-between gap-2 text-sm">
        <label id={`${id}-label`} htmlFor={`${id}-slider`} className="font-mono font-medium">
          {name}
          <span className="font-sans text-xs text-ink-soft">{unitText}</span>
        </label>
        <span className="text-xs text-ink-faint">
          {formatNumber(range[0])} … {formatNumber(range[1])}
          {isLogRange(range) ? ", log scale" : ""}
        </span>
      </div>
      {description && <p id={`${id}-desc`} className="text-xs text-ink-soft">{description}</p>}
      <input
        id={`${id}-slider`}
        type="range"
        min={0}
        max={SLIDER_STEPS}
        step={1}
        value={valueToSlider(range, current)}
        aria-valuetext={`${formatNumber(current)}${unit ? ` ${unit}` : ""}`}
        aria-describedby={description ? `${id}-desc` : undefined}
        onChange={(e) => onValue(sliderToValue(range, Number(e.target.value)))}
        className="accent-signal"
      />
      <div className="flex items-center gap-2">
        <input
          type="number"
          step="any"
          aria-label={`${name} value`}
          value={draft ?? String(current)}
          onChange={(e) => {
            setDraft(e.target.value);
            const v = e.target.valueAsNumber;
            if (Number.isFinite(v)) onValue(v);
          }}
          onBlur={() => setDraft(null)}
          className="w-28 rounded border border-rule-strong bg-paper-raised px-2 py-1 font-mono text-sm"
        />
        <Button size="sm" variant="quiet" aria-label={`Reset ${name} to its nominal value ${formatNumber(nominal)}`} disabled={value === undefined} onClick={() => onValue(null)}>
          Reset to {formatNumber(nominal)}
        </Button>
      </div>
    </div>
  );
}
