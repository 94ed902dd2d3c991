import { useId, useMemo, type Ref } from "react";
import { parseExpression } from "@shared/expr/parse";
import { setExpression } from "@/features/editor/commands/blocks";
import { parameterNameRefusal, setParameter } from "@/features/editor/commands/parameters";
import { useEditorActions } from "@/features/editor/components/EditorContext";
import { Tex } from "@/features/editor/components/Tex";
import { exprLatex } from "@shared/expr/exprLatex";

interface Props {
  blockId: string;
  expr: string;
  allowS: boolean;
  /** How a refused `s` is explained (the kind's words). */
  sRefusal?: string;
  label: string;
  parameters: Record<string, unknown>;
  inputRef?: Ref<HTMLInputElement>;
}

/** Shows the expression with every offending character marked, so the messages and the places agree. */
function Pointer({ text, positions }: { text: string; positions: number[] }) {
  const marks = [...new Set(positions.map((p) => Math.min(p, text.length)))].sort((x, y) => x - y);
  const pieces = marks.flatMap((at, i) => [
    text.slice(i === 0 ? 0 : marks[i - 1] + 1, at),
    <mark key={at} className="rounded-sm bg-fault px-px text-white">
      {text.slice(at, at + 1) || " "}
    </mark>,
  ]);
  return (
    <code aria-hidden className="block overflow-x-auto rounded bg-paper-sunk px-2 py-1 text-xs whitespace-pre">
      {pieces}
      {text.slice((marks.at(-1) ?? -1) + 1)}
    </code>
  );
}

/** One click to declare the name the parser did not know, with nominal value 1 (edit it in the table). */
function DeclareButton({ expr, position }: { expr: string; position: number }) {
  const { act } = useEditorActions();
  const name = /^[A-Za-z][A-Za-z0-9_]*/.exec(expr.slice(position))?.[0];
  if (!name || parameterNameRefusal(name)) return null;
  return (
    <button
      type="button"
      onClick={() => act("Add parameter", (d) => setParameter(d, name, { value: 1 }))}
      className="self-start rounded border border-signal px-2 py-0.5 text-xs text-signal hover:bg-signal-tint"
    >
      Declare parameter {name} = 1
    </button>
  );
}

/** The expression of a gain or transfer block, parsed on every keystroke against the declared parameters. */
export function ExpressionField({ blockId, expr, allowS, sRefusal, label, parameters, inputRef }: Props) {
  const { act, readOnly } = useEditorActions();
  const id = useId();
  const parsed = useMemo(() => parseExpression(expr, { allowS, sRefusal, parameters: Object.keys(parameters) }), [expr, allowS, sRefusal, parameters]);
  const latex = parsed.ok ? exprLatex(parsed.ast) : null;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <input
        id={id}
        ref={inputRef}
        value={expr}
        readOnly={readOnly}
        spellCheck={false}
        autoComplete="off"
        aria-invalid={parsed.ok ? undefined : true}
        aria-describedby={`${id}-status`}
        onChange={(e) => act("Edit expression", (d) => setExpression(d, blockId, e.target.value), { coalesce: `expr:${blockId}` })}
        className="w-full rounded border border-rule-strong bg-paper-raised px-2.5 py-1.5 font-mono text-sm aria-invalid:border-fault read-only:bg-paper-sunk"
      />
      <div id={`${id}-status`} aria-live="polite">
        {parsed.ok ? (
          <p className="text-xs text-ink-soft">
            Reads as <Tex latex={latex ?? ""} />
          </p>
        ) : (
          <div className="flex flex-col gap-1">
            {/* Every error at once: fixing one does not uncover the next. */}
            <ul className="flex flex-col gap-0.5 text-xs font-medium text-fault">
              {parsed.errors.map((e) => (
                <li key={e.position}>
                  {e.message}
                  {/position \d+/.test(e.message) ? "" : ` (at position ${e.position})`}
                </li>
              ))}
            </ul>
            <Pointer text={expr} positions={parsed.errors.map((e) => e.position)} />
            {!readOnly &&
              parsed.errors.filter((e) => e.code === "unknown-name").map((e) => <DeclareButton key={e.position} expr={expr} position={e.position} />)}
          </div>
        )}
      </div>
    </div>
  );
}
