import { queryOptions, useQuery } from "@tanstack/react-query";
import type { TeamView } from "@shared/api/teams";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

export const getTeams = () => api<{ teams: TeamView[] }>("/api/teams").then((r) => r.teams);

export const teamsQuery = () => queryOptions({ queryKey: queryKeys.teams(), queryFn: getTeams });

export const useTeams = () => useQuery(teamsQuery());
