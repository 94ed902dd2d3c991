import { queryOptions, useQuery } from "@tanstack/react-query";
import type { DiagramSummary } from "@shared/api/diagrams";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** Active diagrams of a team, or with `archived` only the archived ones. */
export const getDiagrams = (teamId: string, archived: boolean) =>
  api<{ diagrams: DiagramSummary[] }>(
    `/api/teams/${encodeURIComponent(teamId)}/diagrams${archived ? "?archived=1" : ""}`,
  ).then((r) => r.diagrams);

export const diagramsQuery = (teamId: string, archived: boolean) =>
  queryOptions({ queryKey: queryKeys.diagramList(teamId, archived), queryFn: () => getDiagrams(teamId, archived) });

export const useDiagrams = (teamId: string, archived: boolean) => useQuery(diagramsQuery(teamId, archived));
