import { useMemo, useRef } from "react";
import { ReactFlowProvider } from "@xyflow/react";
import type { EditorDoc, Point } from "@/features/editor/commands/types";
import { DiagramCanvas } from "@/features/editor/components/DiagramCanvas";
import { EditorContext, type EditorActions } from "@/features/editor/components/EditorContext";
import { useFlowState } from "@/features/editor/hooks/useFlowState";
import type { Marks } from "@/features/editor/lib/flowModel";

const READ_ONLY: EditorActions = { act: () => false, readOnly: true };
const ignore = () => {};

function Canvas({ doc, marks }: { doc: EditorDoc; marks: Marks }) {
  const state = useFlowState(doc, marks, ignore);
  const pointer = useRef<Point | null>(null);
  return (
    <DiagramCanvas
      nodes={state.nodes}
      edges={state.edges}
      onNodesChange={state.onNodesChange}
      onEdgesChange={state.onEdgesChange}
      readOnly
      pointer={pointer}
      onConnectWire={ignore}
      onDropBlock={ignore}
    />
  );
}

/** One version's diagram, read-only, with the comparison's changes highlighted; its own canvas state and viewport. */
export function CompareCanvas({ label, doc, marks }: { label: string; doc: EditorDoc; marks: Marks }) {
  const changed = useMemo(() => [...(marks.changes?.values() ?? [])].length, [marks]);
  return (
    <section aria-label={`Diagram of ${label}`} className="flex flex-col gap-1">
      <h3 className="text-sm font-medium">
        {label}
        <span className="ml-2 text-xs font-normal text-ink-soft">{changed ? `${changed} highlighted` : "nothing highlighted"}</span>
      </h3>
      <div className="relative h-80 overflow-hidden rounded border border-rule">
        <EditorContext.Provider value={READ_ONLY}>
          <ReactFlowProvider>
            <Canvas doc={doc} marks={marks} />
          </ReactFlowProvider>
        </EditorContext.Provider>
      </div>
    </section>
  );
}
