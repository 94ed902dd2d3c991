import { useId, type Ref } from "react";
import { Button } from "@/components/Button";
import { setLabel } from "@/features/editor/commands/blocks";
import { deleteSelection, duplicate } from "@/features/editor/commands/selection";
import type { EditorDoc, Selection } from "@/features/editor/commands/types";
import { useEditorActions } from "@/features/editor/components/EditorContext";
import { BreakHere } from "@/features/editor/components/analysis/BreakPicker";
import { Connections } from "@/features/editor/components/panels/Connections";
import { ExpressionField } from "@/features/editor/components/panels/ExpressionField";
import { SumPorts } from "@/features/editor/components/panels/SumPorts";
import { BLOCK_KINDS, hasExpression } from "@shared/diagram/blockKinds";
import { BLOCK_VIEWS } from "@/features/editor/blockKinds";
import { wireAriaLabel } from "@/features/editor/lib/flowModel";
import type { BreakWire } from "@shared/analysis/answer";
import { counted } from "@shared/text/words";

interface Props {
  doc: EditorDoc;
  selection: Selection;
  /** Receives the first field of the selected block, so Enter on the canvas can focus it. */
  firstFieldRef: Ref<HTMLInputElement>;
  /** The analysis' break point: the wire it used, the one chosen, and how to choose one. */
  analysisBreak: { used: BreakWire | null; chosen: string | null; onBreak: (wireId: string | null) => void };
}

/** What the selection is and everything that can be changed about it. */
export function PropertiesPanel({ doc, selection, firstFieldRef, analysisBreak }: Props) {
  const { act, readOnly } = useEditorActions();
  const labelId = useId();
  const { blocks, wires } = selection;

  if (blocks.length === 0 && wires.length === 0) {
    return (
      <p className="text-sm text-ink-soft">
        {readOnly
          ? "Select a block or a wire to see its details."
          : "Select a block or a wire to see and change it. Add blocks from the rail; drag from a block's right-hand port to another block's input to wire them."}
      </p>
    );
  }
  if (blocks.length + wires.length > 1) {
    return (
      <div className="flex flex-col gap-3 text-sm">
        <p>
          {counted(blocks.length, "block")} and {counted(wires.length, "wire")} selected.
        </p>
        {!readOnly && (
          <div className="flex gap-2">
            <Button size="sm" onClick={() => act("Duplicate", (d) => duplicate(d, selection))} disabled={blocks.length === 0}>
              Duplicate
            </Button>
            <Button size="sm" variant="danger" onClick={() => act("Delete", (d) => deleteSelection(d, selection))}>
              Delete selection
            </Button>
          </div>
        )}
      </div>
    );
  }
  if (wires.length === 1) {
    const wire = doc.wires.find((w) => w.id === wires[0]);
    if (!wire) return null;
    return (
      <div className="flex flex-col gap-3 text-sm">
        <h3 className="font-medium">Wire {wire.id}</h3>
        <p className="text-ink-soft">{wireAriaLabel(wire, doc.blocks.find((b) => b.id === wire.to))}.</p>
        <BreakHere wireId={wire.id} {...analysisBreak} />
        {!readOnly && (
          <Button size="sm" variant="danger" onClick={() => act("Delete wire", (d) => deleteSelection(d, selection))}>
            Delete wire
          </Button>
        )}
      </div>
    );
  }
  const block = doc.blocks.find((b) => b.id === blocks[0]);
  if (!block) return null;
  return (
    <div className="flex flex-col gap-4">
      <h3 className="text-sm font-semibold">
        {BLOCK_VIEWS[block.type].name} <span className="font-mono">{block.id}</span>
      </h3>
      {hasExpression(block) && (
        <ExpressionField
          key={block.id}
          blockId={block.id}
          expr={block.expr}
          allowS={BLOCK_KINDS[block.type].expression.mayContainS}
          sRefusal={BLOCK_KINDS[block.type].expression.sRefusal}
          label={BLOCK_VIEWS[block.type].exprLabel ?? "Expression"}
          parameters={doc.parameters}
          inputRef={firstFieldRef}
        />
      )}
      <div className="flex flex-col gap-1">
        <label htmlFor={labelId} className="text-sm font-medium">
          Label
        </label>
        <input
          id={labelId}
          ref={hasExpression(block) ? undefined : firstFieldRef}
          value={block.label ?? ""}
          readOnly={readOnly}
          placeholder={block.id}
          maxLength={200}
          onChange={(e) => act("Edit label", (d) => setLabel(d, block.id, e.target.value), { coalesce: `label:${block.id}` })}
          className="rounded border border-rule-strong bg-paper-raised px-2.5 py-1.5 text-sm read-only:bg-paper-sunk"
        />
      </div>
      {block.type === "sum" && <SumPorts doc={doc} block={block} />}
      <Connections doc={doc} blockId={block.id} hasOutput={block.type !== "output"} />
      {!readOnly && (
        <div className="flex gap-2 border-t border-rule pt-3">
          <Button size="sm" onClick={() => act("Duplicate", (d) => duplicate(d, selection))}>
            Duplicate
          </Button>
          <Button size="sm" variant="danger" onClick={() => act("Delete block", (d) => deleteSelection(d, selection))}>
            Delete block
          </Button>
        </div>
      )}
    </div>
  );
}
