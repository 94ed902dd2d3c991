import type { QueryClient } from "@tanstack/react-query";
import { queryKeys } from "@/lib/queryKeys";

/** After a membership change: the member list, the caller's role in the team and the team counts may differ. */
export const refreshMembership = (queryClient: QueryClient, teamId: string) =>
  Promise.all([
    queryClient.invalidateQueries({ queryKey: queryKeys.members(teamId) }),
    queryClient.invalidateQueries({ queryKey: queryKeys.team(teamId), exact: true }),
    queryClient.invalidateQueries({ queryKey: queryKeys.teams(), exact: true }),
  ]);
