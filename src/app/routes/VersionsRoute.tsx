import { Link, useParams } from "react-router-dom";
import { PageTitle } from "@/components/PageTitle";
import { Panel } from "@/components/Panel";
import { LoadError, Loading } from "@/components/QueryState";
import { useEditorDiagram } from "@/features/editor/api/getEditorDiagram";
import { useVersions } from "@/features/versions/api/getVersions";
import { VersionTable } from "@/features/versions/components/VersionTable";
import { href } from "@shared/routes";
import { counted } from "@shared/text/words";

/** /diagrams/:id/versions — the diagram's history. */
export function VersionsRoute() {
  const id = useParams().id!;
  const detail = useEditorDiagram(id);
  const versions = useVersions(id);
  if (detail.isPending || versions.isPending) return <Loading label="Loading the versions…" />;
  if (detail.isError) return <LoadError what="this diagram" error={detail.error} onRetry={() => detail.refetch()} />;
  if (versions.isError) return <LoadError what="the versions" error={versions.error} onRetry={() => versions.refetch()} />;
  const d = detail.data.diagram;
  return (
    <>
      <PageTitle title={`Versions of ${d.title}`} kicker={`Diagram in ${d.teamName}`}>
        <Link to={href.diagram(id)} className="text-sm text-signal underline underline-offset-2">
          ← Back to the editor
        </Link>
      </PageTitle>
      <Panel title={counted(versions.data.length, "version")}>
        <VersionTable diagramId={id} versions={versions.data} editable={d.role !== "viewer"} />
      </Panel>
    </>
  );
}
