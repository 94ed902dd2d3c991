import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CreateTeamInput, TeamView } from "@shared/api/teams";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

export const createTeam = (input: CreateTeamInput) =>
  api<{ team: TeamView }>("/api/teams", "POST", input).then((r) => r.team);

export function useCreateTeam() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTeam,
    onSuccess: (team) => {
      queryClient.setQueryData(queryKeys.team(team.id), team);
      return queryClient.invalidateQueries({ queryKey: queryKeys.teams(), exact: true });
    },
  });
}
