import { queryOptions, useQuery } from "@tanstack/react-query";
import type { SharedVersionView } from "@shared/api/shareLinks";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** The one version a share link's token opens; no session needed. */
export const getSharedVersion = (token: string) => api<SharedVersionView>(`/api/shared/${encodeURIComponent(token)}`);

export const sharedVersionQuery = (token: string) =>
  // Fetched once per visit: a reader's page never polls (each fetch counts as an opening).
  queryOptions({ queryKey: queryKeys.shared(token), queryFn: () => getSharedVersion(token), staleTime: Infinity, refetchOnWindowFocus: false });

export const useSharedVersion = (token: string) => useQuery(sharedVersionQuery(token));
