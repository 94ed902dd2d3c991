import { queryOptions, useQuery } from "@tanstack/react-query";
import type { VersionListItem } from "@shared/api/versions";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** GET /api/diagrams/:id/versions — every version, newest first, each with its check's summary. */
export const getVersions = (diagramId: string) =>
  api<{ versions: VersionListItem[] }>(`/api/diagrams/${encodeURIComponent(diagramId)}/versions`).then((r) => r.versions);

export const versionsQuery = (diagramId: string) => queryOptions({ queryKey: queryKeys.versions(diagramId), queryFn: () => getVersions(diagramId) });

export const useVersions = (diagramId: string) => useQuery(versionsQuery(diagramId));
