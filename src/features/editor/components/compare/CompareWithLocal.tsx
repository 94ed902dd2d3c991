import { useMemo, useState } from "react";
import { loadDiagram } from "@shared/diagram/validate";
import { LoadError, Loading } from "@/components/QueryState";
import { useEditorVersion } from "@/features/editor/api/getEditorVersion";
import { withWireIds } from "@/features/editor/commands/document";
import type { EditorDoc } from "@/features/editor/commands/types";
import { CompareView } from "@/features/editor/components/compare/CompareView";

/** A saved version (a teammate's newer one) against the document open in the editor, unsaved changes included. */
export function CompareWithLocal({ diagramId, number, doc, label }: { diagramId: string; number: number; doc: EditorDoc; label: string }) {
  const version = useEditorVersion(diagramId, number);
  const loaded = useMemo(() => (version.data ? loadDiagram(version.data.document) : null), [version.data]);
  // The editor's document is taken once: editing behind the dialog is not possible, and a stable input keeps the analysis still.
  const [local] = useState(doc);
  if (version.isPending) return <Loading label={`Loading v${number}…`} />;
  if (version.isError) return <LoadError what={`version ${number}`} error={version.error} onRetry={() => version.refetch()} />;
  if (!loaded?.doc) return <p role="alert" className="text-sm text-fault">v{number} cannot be read as a diagram: {loaded?.problems[0]?.message}</p>;
  return <CompareView before={{ label: `v${number}`, doc: withWireIds(loaded.doc) }} after={{ label, doc: local }} />;
}
