import { useEffect, useMemo } from "react";
import { ReactFlowProvider } from "@xyflow/react";
import type { DiagramDetail } from "@shared/api/diagrams";
import { loadDiagram } from "@shared/diagram/validate";
import { withWireIds } from "@/features/editor/commands/document";
import { EditorSession } from "@/features/editor/components/EditorSession";
import { warmLiveWorker } from "@/features/editor/hooks/useLiveDiagram";
import { ProblemAlert } from "@/components/ProblemAlert";

interface Props {
  title: string;
  version: { number: number; document: unknown };
}

const noReload = () => Promise.resolve();

/**
 * One saved version in the editor's view-only mode, for a reader who holds a share link: the same canvas, result
 * and analysis, with nothing that talks to the team's API (no newer-version poll, no draft, no save, no download).
 */
export function SharedDiagramView({ title, version }: Props) {
  useEffect(warmLiveWorker, []);
  const loaded = useMemo(() => loadDiagram(version.document), [version.document]);
  // The session reads only the title and role of its diagram when view-only; the reader knows nothing else of it.
  const diagram = useMemo<DiagramDetail["diagram"]>(
    () => ({ id: "", teamId: "", teamName: "", title, description: "", latestVersion: version.number, updatedAt: "", author: "", archivedAt: null, role: "viewer" }),
    [title, version.number],
  );
  if (!loaded.doc)
    return <ProblemAlert title={`Version ${version.number} is not a diagram this page can show.`} problems={loaded.problems.map((p) => p.message)} />;
  return (
    <ReactFlowProvider>
      <EditorSession viewOnly diagram={diagram} initialDoc={withWireIds(loaded.doc)} baseVersion={version.number} latestNow={null} onReload={noReload} />
    </ReactFlowProvider>
  );
}
