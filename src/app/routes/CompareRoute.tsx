import { useMemo } from "react";
import { Link, useParams, useSearchParams } from "react-router-dom";
import { loadDiagram } from "@shared/diagram/validate";
import { PageTitle } from "@/components/PageTitle";
import { LoadError, Loading } from "@/components/QueryState";
import { useEditorDiagram } from "@/features/editor/api/getEditorDiagram";
import { useEditorVersion } from "@/features/editor/api/getEditorVersion";
import { withWireIds } from "@/features/editor/commands/document";
import { CompareView } from "@/features/editor/components/compare/CompareView";
import { href } from "@shared/routes";

const versionNumber = (v: string | null) => {
  const n = Number(v);
  return v !== null && Number.isInteger(n) && n > 0 ? n : null;
};

/** /diagrams/:id/compare?from=a&to=b — two saved versions side by side. */
export function CompareRoute() {
  const id = useParams().id!;
  const [params] = useSearchParams();
  const from = versionNumber(params.get("from"));
  const to = versionNumber(params.get("to"));
  const detail = useEditorDiagram(id);
  const a = useEditorVersion(id, from);
  const b = useEditorVersion(id, to);
  const docs = useMemo(() => [a.data, b.data].map((v) => (v ? loadDiagram(v.document) : null)), [a.data, b.data]);

  if (from === null || to === null)
    return <p role="alert" className="text-sm text-fault">Choose two versions to compare: the address needs ?from=N&amp;to=M with version numbers.</p>;
  if (detail.isPending || a.isPending || b.isPending) return <Loading label={`Loading v${from} and v${to}…`} />;
  if (detail.isError) return <LoadError what="this diagram" error={detail.error} onRetry={() => detail.refetch()} />;
  if (a.isError) return <LoadError what={`version ${from}`} error={a.error} onRetry={() => a.refetch()} />;
  if (b.isError) return <LoadError what={`version ${to}`} error={b.error} onRetry={() => b.refetch()} />;
  const d = detail.data.diagram;
  const [docA, docB] = docs;
  const title = (
    <PageTitle title={`${d.title}: v${from} compared with v${to}`} kicker={`Diagram in ${d.teamName}`}>
      <Link to={href.versions(id)} className="text-sm text-signal underline underline-offset-2">
        All versions
      </Link>
      <Link to={href.diagram(id)} className="text-sm text-signal underline underline-offset-2">
        ← Back to the editor
      </Link>
    </PageTitle>
  );
  const unreadable = [docA?.doc ? null : from, docB?.doc ? null : to].filter((n) => n !== null);
  if (!docA?.doc || !docB?.doc)
    return (
      <>
        {title}
        <p role="alert" className="text-sm text-fault">
          {unreadable.map((n) => `v${n}`).join(" and ")} cannot be read as a diagram, so there is nothing to compare.
        </p>
      </>
    );
  return (
    <>
      {title}
      <CompareView before={{ label: `v${from}`, doc: withWireIds(docA.doc) }} after={{ label: `v${to}`, doc: withWireIds(docB.doc) }} />
    </>
  );
}
