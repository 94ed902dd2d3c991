import { useEffect, useId, useState } from "react";
import { DISCRETISATION_METHODS, type DiscretisationMethod } from "@shared/implement/discretise";
import { METHOD_NAMES } from "@shared/implement/differenceEquation";
import { REALISATION_FORMS, type RealisationForm } from "@shared/implement/realise";
import type { ImplementRequest } from "@shared/implement/view";
import { parseNumberField } from "@/features/editor/lib/numberField";

interface Props {
  request: ImplementRequest;
  candidates: { id: string; what: string }[];
  /** The analysed pair, "r → y". */
  pair: string;
  /** The pre-warp frequency in use when the request leaves it to the default. */
  prewarpInUse: number | null;
  onRequest: (change: Partial<ImplementRequest>) => void;
}

const FORM_NAMES: Record<RealisationForm, string> = { controllable: "controllable canonical", observable: "observable canonical", minimal: "minimal (balanced when stable)" };
const field = "rounded border border-rule-strong bg-paper-raised px-2 py-1 text-sm";

/** A positive number field that reports only valid values and says what is wrong with the others. */
function PositiveField({ label, value, placeholder, onValue }: { label: string; value: number | null; placeholder?: string; onValue: (v: number | null) => void }) {
  const id = useId();
  const [text, setText] = useState(value === null ? "" : String(value));
  useEffect(() => setText((t) => (value !== null && Number(t) === value ? t : value === null ? "" : String(value))), [value]);
  const parsed = parseNumberField(text, label, placeholder === undefined);
  const error = !parsed.ok ? parsed.error : parsed.value !== undefined && parsed.value <= 0 ? `${label} must be positive` : null;
  return (
    <label htmlFor={id} className="flex flex-col gap-0.5 text-xs text-ink-soft">
      {label}
      <input
        id={id}
        inputMode="decimal"
        value={text}
        placeholder={placeholder}
        aria-invalid={error !== null}
        aria-describedby={error ? `${id}-error` : undefined}
        onChange={(e) => {
          setText(e.target.value);
          const p = parseNumberField(e.target.value, label, placeholder === undefined);
          if (p.ok && (p.value === undefined || p.value > 0)) onValue(p.value ?? null);
        }}
        className={`${field} w-32 font-mono ${error ? "border-fault" : ""}`}
      />
      {error && <span id={`${id}-error`} className="text-fault">{error}</span>}
    </label>
  );
}

/** What to implement and how: the block or the pair, Ts, the method (and its pre-warp frequency) and the form. */
export function ImplementationControls({ request, candidates, pair, prewarpInUse, onRequest }: Props) {
  const target = useId();
  const method = useId();
  const form = useId();
  return (
    <div className="flex flex-wrap items-end gap-x-4 gap-y-2">
      <label htmlFor={target} className="flex flex-col gap-0.5 text-xs text-ink-soft">
        Implement
        <select id={target} value={request.block ?? ""} onChange={(e) => onRequest({ block: e.target.value || null })} className={field}>
          <option value="">closed loop {pair}</option>
          {candidates.map((c) => (
            <option key={c.id} value={c.id}>{c.what}</option>
          ))}
        </select>
      </label>
      <PositiveField label="Sample time Ts (s)" value={request.ts} onValue={(ts) => ts !== null && onRequest({ ts })} />
      <label htmlFor={method} className="flex flex-col gap-0.5 text-xs text-ink-soft">
        Method
        <select id={method} value={request.method} onChange={(e) => onRequest({ method: e.target.value as DiscretisationMethod })} className={field}>
          {DISCRETISATION_METHODS.map((m) => (
            <option key={m} value={m}>{METHOD_NAMES[m]}</option>
          ))}
        </select>
      </label>
      {request.method === "prewarp" && (
        <PositiveField
          label="Pre-warp ω (rad/s)"
          value={request.prewarp}
          placeholder={prewarpInUse === null ? "bandwidth" : String(Number(prewarpInUse.toPrecision(6)))}
          onValue={(prewarp) => onRequest({ prewarp })}
        />
      )}
      <label htmlFor={form} className="flex flex-col gap-0.5 text-xs text-ink-soft">
        State-space form
        <select id={form} value={request.form} onChange={(e) => onRequest({ form: e.target.value as RealisationForm })} className={field}>
          {REALISATION_FORMS.map((f) => (
            <option key={f} value={f}>{FORM_NAMES[f]}</option>
          ))}
        </select>
      </label>
    </div>
  );
}
