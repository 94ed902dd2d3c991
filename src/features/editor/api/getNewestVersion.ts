import { queryOptions, useQuery } from "@tanstack/react-query";
import type { VersionListItem } from "@shared/api/versions";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/**
 * How often an open editor asks whether a teammate saved: a short poll of one small row. Polling rather than
 * server-sent events: it needs no long-lived connection per editor and works unchanged across server processes.
 */
export const NEWEST_VERSION_POLL_MS = 4000;

/** The diagram's newest version (number, author, time), or null before the first save. */
export const getNewestVersion = (id: string) =>
  api<{ versions: VersionListItem[] }>(`/api/diagrams/${encodeURIComponent(id)}/versions?limit=1`).then((r) => r.versions[0] ?? null);

export const newestVersionQuery = (id: string) =>
  queryOptions({
    queryKey: queryKeys.newestVersion(id),
    queryFn: () => getNewestVersion(id),
    refetchInterval: NEWEST_VERSION_POLL_MS,
    refetchIntervalInBackground: true,
  });

export const useNewestVersion = (id: string) => useQuery(newestVersionQuery(id));
