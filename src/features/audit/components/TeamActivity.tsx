import { useSearchParams } from "react-router-dom";
import { AUDIT_KINDS, type AuditEventView, type AuditKind } from "@shared/api/audit";
import { Button } from "@/components/Button";
import { Empty, LoadError, Loading } from "@/components/QueryState";
import { useAuditEvents, type AuditFilters } from "@/features/audit/api/getAuditEvents";
import { ActivityFilters, type FilterChoices } from "@/features/audit/components/ActivityFilters";
import { ActivityTable } from "@/features/audit/components/ActivityTable";

const isKind = (k: string | null): k is AuditKind => AUDIT_KINDS.includes(k as AuditKind);

/** The filters live in the page's address (?actor=&kind=&diagram=), so a filtered view can be bookmarked or sent. */
function useFilterParams(): [AuditFilters, (next: AuditFilters) => void] {
  const [params, setParams] = useSearchParams();
  const kind = params.get("kind");
  const filters: AuditFilters = {
    actor: params.get("actor") || undefined,
    kind: isKind(kind) ? kind : undefined,
    diagram: params.get("diagram") || undefined,
  };
  const set = (next: AuditFilters) =>
    setParams(Object.entries(next).filter((e): e is [string, string] => Boolean(e[1])), { replace: true });
  return [filters, set];
}

/**
 * The team's audit trail for owners: filters, the table and "Load older" for the next page. A share link's
 * opening moves its row to the top, so a row can come again on a later page: each is shown once.
 */
export function TeamActivity({ teamId, ...choices }: { teamId: string } & FilterChoices) {
  const [filters, setFilters] = useFilterParams();
  const trail = useAuditEvents(teamId, filters);
  const seen = new Set<string>();
  const events: AuditEventView[] = (trail.data?.pages ?? []).flatMap((p) => p.events).filter((e) => !seen.has(e.id) && Boolean(seen.add(e.id)));
  const filtered = Boolean(filters.actor || filters.kind || filters.diagram);
  return (
    <>
      <ActivityFilters filters={filters} onChange={setFilters} {...choices} />
      {trail.isPending ? (
        <Loading label="Loading the activity…" />
      ) : trail.isError && events.length === 0 ? (
        <LoadError what="the activity" error={trail.error} onRetry={() => trail.refetch()} />
      ) : events.length === 0 ? (
        <Empty>{filtered ? "Nothing matches these filters." : "Nothing has happened in this team yet."}</Empty>
      ) : (
        <>
          <ActivityTable events={events} />
          {trail.isFetchNextPageError && <LoadError what="older activity" error={trail.error} onRetry={() => void trail.fetchNextPage()} />}
          {trail.hasNextPage && (
            <Button className="mt-4" pending={trail.isFetchingNextPage} onClick={() => void trail.fetchNextPage()}>
              Load older
            </Button>
          )}
        </>
      )}
    </>
  );
}
