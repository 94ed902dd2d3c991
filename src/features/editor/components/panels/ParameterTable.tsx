import { useId, useState } from "react";
import { parameterProblems } from "@shared/diagram/expressions";
import { Button } from "@/components/Button";
import {
  blocksUsing,
  parameterFields,
  parameterNameRefusal,
  removeParameter,
  setParameter,
  undeclaredNames,
} from "@/features/editor/commands/parameters";
import type { EditorDoc } from "@/features/editor/commands/types";
import { useEditorActions } from "@/features/editor/components/EditorContext";
import { ParameterRow } from "@/features/editor/components/panels/ParameterRow";
import { parseNumberField } from "@/features/editor/lib/numberField";

const head = "py-1.5 pr-3 text-left font-medium";

/** The diagram's parameters: nominal value, unit, range and note, each validated before it is stored. */
export function ParameterTable({ doc }: { doc: EditorDoc }) {
  const { act, readOnly } = useEditorActions();
  const names = Object.keys(doc.parameters);
  const warnings = parameterProblems(doc);
  const missing = undeclaredNames(doc);
  return (
    <div className="flex flex-col gap-3">
      {names.length === 0 ? (
        <p className="text-sm text-ink-soft">
          {readOnly ? "This diagram has no parameters." : "No parameters yet. Expressions may only use the names declared here."}
        </p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full text-sm">
            <caption className="sr-only">Parameters</caption>
            <thead className="border-b border-rule text-xs text-ink-soft">
              <tr>
                <th scope="col" className={head}>Name</th>
                <th scope="col" className={head}>Nominal value</th>
                <th scope="col" className={head}>Unit</th>
                <th scope="col" className={head}>Min</th>
                <th scope="col" className={head}>Max</th>
                <th scope="col" className={head}>Description</th>
                <th scope="col" className={head}>Used by</th>
                {!readOnly && <th scope="col" className={head}><span className="sr-only">Actions</span></th>}
              </tr>
            </thead>
            <tbody>
              {names.map((name) => (
                <ParameterRow
                  key={name}
                  name={name}
                  fields={parameterFields(doc.parameters[name])}
                  usedBy={blocksUsing(doc, name)}
                  warning={warnings.find((w) => w.field === `parameters.${name}`)?.message}
                  onRemove={() => act("Remove parameter", (d) => removeParameter(d, name))}
                />
              ))}
            </tbody>
          </table>
        </div>
      )}
      {missing.length > 0 && (
        <p role="status" className="text-sm text-fault">
          Used in expressions but not declared: {missing.map((n) => <code key={n} className="mx-0.5">{n}</code>)}
          {!readOnly && " — add them below."}
        </p>
      )}
      {!readOnly && <AddParameter taken={names} suggestion={missing[0]} />}
    </div>
  );
}

function AddParameter({ taken, suggestion }: { taken: string[]; suggestion?: string }) {
  const { act } = useEditorActions();
  const [name, setName] = useState("");
  const [value, setValue] = useState("1");
  const [error, setError] = useState<string | null>(null);
  const id = useId();
  const submit = () => {
    const chosen = name.trim() || suggestion || "";
    const bad = parameterNameRefusal(chosen) ?? (taken.includes(chosen) ? `A parameter named ${chosen} already exists` : null);
    const number = parseNumberField(value, "Value", true);
    const problem = bad ?? (number.ok ? null : number.error);
    setError(problem);
    if (problem || !number.ok) return;
    if (act("Add parameter", (d) => setParameter(d, chosen, { value: number.value as number }))) {
      setName("");
      setValue("1");
    }
  };
  return (
    <form
      className="flex flex-wrap items-end gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-name`} className="text-xs text-ink-soft">New parameter name</label>
        <input id={`${id}-name`} value={name} placeholder={suggestion ?? "K"} onChange={(e) => setName(e.target.value)} aria-invalid={error ? true : undefined} aria-describedby={error ? `${id}-err` : undefined} className="w-32 rounded border border-rule-strong bg-paper-raised px-2 py-1 font-mono text-sm aria-invalid:border-fault" />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-value`} className="text-xs text-ink-soft">New parameter value</label>
        <input id={`${id}-value`} value={value} inputMode="decimal" onChange={(e) => setValue(e.target.value)} className="w-28 rounded border border-rule-strong bg-paper-raised px-2 py-1 font-mono text-sm" />
      </div>
      <Button type="submit" size="sm">Add parameter</Button>
      {error && <p id={`${id}-err`} role="alert" className="basis-full text-xs font-medium text-fault">{error}</p>}
    </form>
  );
}
