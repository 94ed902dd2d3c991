import type { Block } from "@shared/diagram/schema";
import { Button } from "@/components/Button";
import { addSumPort, removeSumPort, setSign } from "@/features/editor/commands/sum";
import type { EditorDoc } from "@/features/editor/commands/types";
import { useEditorActions } from "@/features/editor/components/EditorContext";
import { sumPortPlaces } from "@shared/geometry/sumPorts";

type Sum = Extract<Block, { type: "sum" }>;
const SIDE = { left: "left", top: "top", bottom: "bottom" } as const;

/** The junction's ports: sign of each, the wire feeding it, add and remove. */
export function SumPorts({ doc, block }: { doc: EditorDoc; block: Sum }) {
  const { act, readOnly } = useEditorActions();
  const places = sumPortPlaces(block.signs.length);
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 text-sm font-medium">Inputs and signs</legend>
      <ul className="flex flex-col gap-1.5">
        {block.signs.map((sign, port) => {
          const feed = doc.wires.find((w) => w.to === block.id && w.port === port);
          return (
            <li key={port} className="flex items-center gap-2 text-sm">
              <span className="w-14 text-xs text-ink-soft">Port {port}</span>
              <span role="group" aria-label={`Sign of port ${port}`} className="inline-flex overflow-hidden rounded border border-rule-strong">
                {(["+", "-"] as const).map((s) => (
                  <button
                    key={s}
                    type="button"
                    disabled={readOnly}
                    aria-pressed={sign === s}
                    aria-label={`Port ${port} ${s === "+" ? "plus" : "minus"}`}
                    onClick={() => act("Set sign", (d) => setSign(d, block.id, port, s))}
                    className="w-7 py-0.5 font-mono text-sm aria-pressed:bg-signal aria-pressed:text-white disabled:opacity-70"
                  >
                    {s === "+" ? "+" : "−"}
                  </button>
                ))}
              </span>
              <span className="flex-1 truncate font-mono text-xs text-ink-soft" title={`Enters from the ${SIDE[places[port].side]}`}>
                {feed ? `← ${feed.from} (${feed.id})` : "not wired"}
              </span>
              {!readOnly && block.signs.length > 1 && (
                <button
                  type="button"
                  aria-label={`Remove port ${port}`}
                  onClick={() => act("Remove port", (d) => removeSumPort(d, block.id, port))}
                  className="rounded px-1 text-xs text-fault hover:bg-fault-tint"
                >
                  Remove
                </button>
              )}
            </li>
          );
        })}
      </ul>
      {!readOnly && (
        <div className="flex gap-2">
          <Button size="sm" onClick={() => act("Add port", (d) => addSumPort(d, block.id, "+"))}>
            Add + input
          </Button>
          <Button size="sm" onClick={() => act("Add port", (d) => addSumPort(d, block.id, "-"))}>
            Add − input
          </Button>
        </div>
      )}
    </fieldset>
  );
}
