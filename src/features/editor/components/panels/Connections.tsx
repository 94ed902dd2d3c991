import { useId, useState } from "react";
import { Button } from "@/components/Button";
import { deleteSelection } from "@/features/editor/commands/selection";
import { connect, openInputs, type ConnectArgs } from "@/features/editor/commands/wires";
import type { EditorDoc, Outcome } from "@/features/editor/commands/types";
import { useEditorActions } from "@/features/editor/components/EditorContext";

const target = (a: { to: string; port?: number }) => (a.port === undefined ? a.to : `${a.to}:${a.port}`);

/** Wires in and out of one block, and a keyboard way to draw a new one from its output. */
export function Connections({ doc, blockId, hasOutput }: { doc: EditorDoc; blockId: string; hasOutput: boolean }) {
  const { act, readOnly } = useEditorActions();
  const selectId = useId();
  const [choice, setChoice] = useState("");
  const incoming = doc.wires.filter((w) => w.to === blockId);
  const outgoing = doc.wires.filter((w) => w.from === blockId);
  const options = hasOutput && !readOnly ? openInputs(doc, blockId) : [];
  const signOf = (to: string, port: number | undefined) => {
    const b = doc.blocks.find((x) => x.id === to);
    return b?.type === "sum" && port !== undefined ? ` port ${port} (${b.signs[port] === "-" ? "−" : "+"})` : "";
  };
  const removeWire = (id: string) => act("Delete wire", (d) => deleteSelection(d, { blocks: [], wires: [id] }));

  const wireRow = (id: string, text: string) => (
    <li key={id} className="flex items-center justify-between gap-2">
      <span className="truncate font-mono text-xs">{text}</span>
      {!readOnly && (
        <button type="button" aria-label={`Delete wire ${id}`} onClick={() => removeWire(id)} className="rounded px-1 text-xs text-fault hover:bg-fault-tint">
          Delete
        </button>
      )}
    </li>
  );

  return (
    <div className="flex flex-col gap-2 text-sm">
      <h3 className="text-sm font-medium">Wires</h3>
      <ul className="flex flex-col gap-1" aria-label="Wires into this block">
        {incoming.map((w) => wireRow(w.id, `${w.id}: from ${w.from}${signOf(w.to, w.port)}`))}
      </ul>
      <ul className="flex flex-col gap-1" aria-label="Wires out of this block">
        {outgoing.map((w) => wireRow(w.id, `${w.id}: to ${w.to}${signOf(w.to, w.port)}`))}
      </ul>
      {incoming.length + outgoing.length === 0 && <p className="text-xs text-ink-soft">{readOnly ? "No wires." : "No wires yet."}</p>}
      {options.length > 0 && (
        <div className="flex items-end gap-2">
          <div className="flex flex-1 flex-col gap-1">
            <label htmlFor={selectId} className="text-xs text-ink-soft">
              Connect output to
            </label>
            <select
              id={selectId}
              value={choice}
              onChange={(e) => setChoice(e.target.value)}
              className="rounded border border-rule-strong bg-paper-raised px-2 py-1 text-sm"
            >
              <option value="">Choose an input…</option>
              {options.map((o) => (
                <option key={target(o)} value={target(o)}>
                  {o.to}
                  {signOf(o.to, o.port)}
                </option>
              ))}
            </select>
          </div>
          <Button
            size="sm"
            disabled={!choice}
            onClick={() => {
              const picked = options.find((o) => target(o) === choice);
              // Keep this block selected, so several wires can be drawn from it in a row.
              const keep = { blocks: [blockId], wires: [] };
              const run = (d: EditorDoc): Outcome => {
                const o = connect(d, picked as ConnectArgs);
                return o.ok ? { ...o, select: keep } : o;
              };
              if (picked && act("Connect", run)) setChoice("");
            }}
          >
            Connect
          </Button>
        </div>
      )}
    </div>
  );
}
