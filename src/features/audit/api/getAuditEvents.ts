import { infiniteQueryOptions, useInfiniteQuery } from "@tanstack/react-query";
import type { AuditKind, AuditPage } from "@shared/api/audit";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** What the activity page filters by; an absent field does not filter. */
export interface AuditFilters {
  actor?: string;
  kind?: AuditKind;
  diagram?: string;
}

/** One page of the team's trail (owners only), newest first, starting after `before` (a page's `nextCursor`). */
export const getAuditEvents = (teamId: string, filters: AuditFilters, before: string | null) => {
  const query = new URLSearchParams(Object.entries({ ...filters, before }).filter((e): e is [string, string] => Boolean(e[1])));
  return api<AuditPage>(`/api/teams/${encodeURIComponent(teamId)}/audit${query.size ? `?${query}` : ""}`);
};

export const auditEventsQuery = (teamId: string, filters: AuditFilters) =>
  infiniteQueryOptions({
    queryKey: queryKeys.audit(teamId, filters),
    queryFn: ({ pageParam }) => getAuditEvents(teamId, filters, pageParam),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
  });

export const useAuditEvents = (teamId: string, filters: AuditFilters) => useInfiniteQuery(auditEventsQuery(teamId, filters));
