import { useMemo } from "react";
import { Link, useParams } from "react-router-dom";
import type { CheckedResult } from "@shared/api/versions";
import { loadDiagram } from "@shared/diagram/validate";
import { href } from "@shared/routes";
import { LoadError, Loading } from "@/components/QueryState";
import { useEditorDiagram } from "@/features/editor/api/getEditorDiagram";
import { useEditorVersion } from "@/features/editor/api/getEditorVersion";
import { versionFigureSrc } from "@/features/editor/api/versionExport";
import { withWireIds } from "@/features/editor/commands/document";
import { SavedVersionAnalysis } from "@/features/editor/components/SavedVersionAnalysis";
import { ReviewSheet } from "@/features/reviewSheet/components/ReviewSheet";
import { savedProblems } from "@/features/reviewSheet/lib/savedProblems";

const versionNumber = (v: string | undefined) => {
  const n = Number(v);
  return Number.isInteger(n) && n > 0 ? n : null;
};

/** /diagrams/:id/versions/:n/sheet — one saved version's printable review sheet. */
export function ReviewSheetRoute() {
  const params = useParams();
  const id = params.id!;
  const n = versionNumber(params.n);
  const detail = useEditorDiagram(id);
  const version = useEditorVersion(id, n);
  const loaded = useMemo(() => (version.data ? loadDiagram(version.data.document) : null), [version.data]);
  const doc = useMemo(() => (loaded?.doc ? withWireIds(loaded.doc) : null), [loaded]);

  if (n === null) return <p role="alert" className="text-sm text-fault">No such version: the address needs a version number (1, 2, …) before /sheet.</p>;
  if (detail.isPending || version.isPending) return <Loading label={`Loading v${n}…`} />;
  if (detail.isError) return <LoadError what="this diagram" error={detail.error} onRetry={() => detail.refetch()} />;
  if (version.isError) return <LoadError what={`version ${n}`} error={version.error} onRetry={() => version.refetch()} />;
  const d = detail.data.diagram;
  const v = version.data;
  // A document this client cannot read shows why, as a version saved with problems does.
  const problems = savedProblems(v.result as CheckedResult | null) ?? (doc ? null : (loaded?.problems.map((p) => p.message) ?? []));
  return (
    <ReviewSheet
      version={{ title: d.title, teamName: d.teamName, number: v.number, message: v.message, author: v.createdBy, savedAt: v.createdAt }}
      figureSrc={versionFigureSrc(id, v.number, "svg")}
      problems={problems}
      analysis={doc && <SavedVersionAnalysis label={`v${v.number}`} doc={doc} />}
      backLink={
        <>
          <Link to={href.diagramVersion(id, v.number)} className="text-signal underline underline-offset-2">
            ← Open v{v.number} in the editor
          </Link>
          <Link to={href.versions(id)} className="text-signal underline underline-offset-2">
            All versions
          </Link>
        </>
      }
    />
  );
}
