import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";
import { refreshMembership } from "@/features/members/api/cache";

/** Removes a member (owners), or with the caller's own id leaves the team. */
export const removeMember = (teamId: string, userId: string) =>
  api<void>(`/api/teams/${encodeURIComponent(teamId)}/members/${encodeURIComponent(userId)}`, "DELETE");

export function useRemoveMember(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId }: { userId: string; leaving: boolean }) => removeMember(teamId, userId),
    onSuccess: (_, { leaving }) => {
      if (!leaving) return refreshMembership(queryClient, teamId);
      // Someone who left can no longer read the team: drop it instead of refetching into a 404.
      queryClient.removeQueries({ queryKey: queryKeys.team(teamId) });
      return queryClient.invalidateQueries({ queryKey: queryKeys.teams(), exact: true });
    },
  });
}
