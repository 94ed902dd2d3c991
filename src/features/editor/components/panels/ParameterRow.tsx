import { useState } from "react";
import { renameParameter, setParameter, type ParameterFields } from "@/features/editor/commands/parameters";
import { useEditorActions } from "@/features/editor/components/EditorContext";
import { parseNumberField } from "@/features/editor/lib/numberField";

type Key = "name" | "value" | "unit" | "min" | "max" | "description";

interface Props {
  name: string;
  fields: ParameterFields;
  usedBy: string[];
  warning?: string;
  onRemove: () => void;
}

const text = (v: number | string | undefined) => (v === undefined ? "" : String(v));
const cell = "w-full rounded border border-rule-strong bg-paper-raised px-2 py-1 text-sm aria-invalid:border-fault read-only:border-transparent read-only:bg-transparent";

/** One parameter; each cell is checked and stored when the user leaves it (Enter also stores). */
export function ParameterRow({ name, fields, usedBy, warning, onRemove }: Props) {
  const { act, readOnly } = useEditorActions();
  const stored: Record<Key, string> = {
    name,
    value: text(fields.value),
    unit: text(fields.unit),
    min: text(fields.min),
    max: text(fields.max),
    description: text(fields.description),
  };
  const [draft, setDraft] = useState<Partial<Record<Key, string>>>({});
  const [error, setError] = useState<{ key: Key; message: string } | null>(null);
  const shown = (k: Key) => draft[k] ?? stored[k];

  const commit = (k: Key) => {
    const typed = draft[k];
    if (typed === undefined || typed === stored[k]) return setDraft(({ [k]: _, ...rest }) => rest);
    let ok = true;
    if (k === "name") ok = act("Rename parameter", (d) => renameParameter(d, name, typed.trim()));
    else if (k === "unit" || k === "description") ok = act("Edit parameter", (d) => setParameter(d, name, { ...fields, [k]: typed.trim() || undefined }));
    else {
      const what = k === "value" ? "The nominal value" : k === "min" ? "Min" : "Max";
      const parsed = parseNumberField(typed, what, k === "value");
      if (!parsed.ok) return setError({ key: k, message: `${name}: ${parsed.error}` });
      ok = act("Edit parameter", (d) => setParameter(d, name, { ...fields, [k]: parsed.value }));
    }
    if (ok || k === "name") setDraft(({ [k]: _, ...rest }) => rest);
    setError(null);
  };

  const input = (k: Key, label: string, extra: { mono?: boolean; max?: number } = {}) => (
    <input
      aria-label={`${label} of ${name}`}
      value={shown(k)}
      readOnly={readOnly}
      maxLength={extra.max}
      spellCheck={false}
      aria-invalid={error?.key === k ? true : undefined}
      onChange={(e) => setDraft((d) => ({ ...d, [k]: e.target.value }))}
      onBlur={() => commit(k)}
      onKeyDown={(e) => e.key === "Enter" && commit(k)}
      className={`${cell} ${extra.mono ? "font-mono" : ""}`}
    />
  );

  const columns = readOnly ? 7 : 8;
  return (
    <>
      <tr className="border-b border-rule/60 align-top">
        <td className="py-1 pr-2">{input("name", "Name", { mono: true })}</td>
        <td className="py-1 pr-2">{input("value", "Nominal value", { mono: true })}</td>
        <td className="py-1 pr-2">{input("unit", "Unit", { max: 40 })}</td>
        <td className="py-1 pr-2">{input("min", "Min", { mono: true })}</td>
        <td className="py-1 pr-2">{input("max", "Max", { mono: true })}</td>
        <td className="py-1 pr-2">{input("description", "Description", { max: 500 })}</td>
        <td className="py-1 pr-2 pt-2 font-mono text-xs text-ink-soft">{usedBy.join(", ") || "unused"}</td>
        {!readOnly && (
          <td className="py-1">
            <button type="button" aria-label={`Remove parameter ${name}`} onClick={onRemove} className="rounded px-1.5 py-1 text-xs text-fault hover:bg-fault-tint">
              Remove
            </button>
          </td>
        )}
      </tr>
      {(error || warning) && (
        <tr>
          <td colSpan={columns} className={`pb-2 text-xs font-medium ${error ? "text-fault" : "text-ink"}`} role={error ? "alert" : undefined}>
            {error?.message ?? warning}
          </td>
        </tr>
      )}
    </>
  );
}
