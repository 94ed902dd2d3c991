import { Link } from "react-router-dom";
import { useDiagram } from "@/features/diagrams/api/getDiagram";
import { PageTitle } from "@/components/PageTitle";
import { LoadError, Loading } from "@/components/QueryState";
import { formatDateTime, roleLabel } from "@/lib/format";
import { href } from "@/lib/paths";

/** The diagram page until the canvas editor ships: what the diagram is and where it belongs. */
export function DiagramSummaryView({ id }: { id: string }) {
  const detail = useDiagram(id);
  if (detail.isPending) return <Loading label="Loading the diagram…" />;
  if (detail.isError) return <LoadError what="this diagram" error={detail.error} onRetry={() => detail.refetch()} />;
  const { diagram: d, latestVersion } = detail.data;
  return (
    <>
      <PageTitle title={d.title} kicker={`Diagram in ${d.teamName}`}>
        <Link to={href.team(d.teamId)} className="text-sm text-signal underline underline-offset-2">
          ← Back to {d.teamName}
        </Link>
      </PageTitle>
      {d.archivedAt && (
        <p className="mb-4 rounded border border-trace/50 bg-trace-tint px-3 py-2 text-sm">
          This diagram was archived on {formatDateTime(d.archivedAt)}.
        </p>
      )}
      <dl className="grid max-w-xl grid-cols-[max-content_1fr] gap-x-6 gap-y-2 text-sm">
        <dt className="text-ink-soft">Team</dt>
        <dd>{d.teamName}</dd>
        <dt className="text-ink-soft">Latest version</dt>
        <dd className="font-mono">{latestVersion ? `v${latestVersion.number}` : "No version saved yet"}</dd>
        <dt className="text-ink-soft">Updated</dt>
        <dd>
          <time dateTime={d.updatedAt}>{formatDateTime(d.updatedAt)}</time> by {d.author}
        </dd>
        <dt className="text-ink-soft">Your role</dt>
        <dd>{roleLabel(d.role)}</dd>
        {d.description && (
          <>
            <dt className="text-ink-soft">Description</dt>
            <dd className="whitespace-pre-line">{d.description}</dd>
          </>
        )}
      </dl>
      <p className="mt-8 rounded-md border border-dashed border-rule-strong bg-paper-raised px-5 py-10 text-center text-ink-soft">
        The canvas editor arrives in a later release.
      </p>
    </>
  );
}
