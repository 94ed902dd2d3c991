import { useParams } from "react-router-dom";
import { PageTitle } from "@/components/PageTitle";
import { Loading } from "@/components/QueryState";
import { errorMessage, isApiError } from "@/lib/apiClient";
import { SharedDiagramView } from "@/features/editor/components/SharedDiagramView";
import { SharedFigureDownloads } from "@/features/editor/components/SharedFigureDownloads";
import { useSharedVersion } from "@/features/shareLinks/api/getSharedVersion";

/** /s/:token — the version a share link opens, read-only, for anyone holding the link. */
export function SharedRoute() {
  const token = useParams().token!;
  const shared = useSharedVersion(token);
  if (shared.isPending) return <Loading label="Loading the shared diagram…" />;
  if (shared.isError) {
    const heading = isApiError(shared.error, 410) ? "This share link no longer works" : isApiError(shared.error, 404) ? "This share link does not exist" : "Could not load the shared diagram";
    return (
      <div role="alert" className="mx-auto my-8 max-w-xl rounded border border-fault/40 bg-fault-tint px-4 py-3 text-sm">
        <h1 className="font-medium text-fault">{heading}</h1>
        <p className="mt-1 text-ink">{errorMessage(shared.error)}</p>
      </div>
    );
  }
  const { diagram, version } = shared.data;
  return (
    <>
      <PageTitle compact title={diagram.title} kicker={`Version ${version.number} · shared read-only`}>
        <SharedFigureDownloads token={token} />
      </PageTitle>
      <SharedDiagramView title={diagram.title} version={version} />
    </>
  );
}
