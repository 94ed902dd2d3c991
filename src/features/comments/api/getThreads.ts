import { queryOptions, useQuery } from "@tanstack/react-query";
import type { ThreadList } from "@shared/api/comments";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

export const threadsPath = (diagramId: string, version: number) => `/api/diagrams/${encodeURIComponent(diagramId)}/versions/${version}/comments`;

/** GET …/versions/:n/comments — the version's review threads, oldest first, each with its replies. */
export const getThreads = (diagramId: string, version: number) => api<ThreadList>(threadsPath(diagramId, version)).then((r) => r.threads);

// Polled like the newer-version notice: a teammate's comment shows up without a reload.
export const threadsQuery = (diagramId: string, version: number) =>
  queryOptions({ queryKey: queryKeys.comments(diagramId, version), queryFn: () => getThreads(diagramId, version), refetchInterval: 10_000 });

export const useThreads = (diagramId: string, version: number) => useQuery({ ...threadsQuery(diagramId, version), enabled: version > 0 });
