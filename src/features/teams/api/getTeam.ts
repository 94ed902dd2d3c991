import { queryOptions, useQuery } from "@tanstack/react-query";
import type { TeamView } from "@shared/api/teams";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

export const getTeam = (teamId: string) =>
  api<{ team: TeamView }>(`/api/teams/${encodeURIComponent(teamId)}`).then((r) => r.team);

export const teamQuery = (teamId: string) =>
  queryOptions({ queryKey: queryKeys.team(teamId), queryFn: () => getTeam(teamId) });

export const useTeam = (teamId: string) => useQuery(teamQuery(teamId));
