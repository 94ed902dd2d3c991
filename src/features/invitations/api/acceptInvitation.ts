import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** Joins the invitation's team as the signed-in user (403 when signed in with another e-mail). */
export const acceptInvitation = (token: string) =>
  api<{ teamId: string }>(`/api/invitations/${encodeURIComponent(token)}/accept`, "POST").then((r) => r.teamId);

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => acceptInvitation(token),
    onSuccess: () => {
      // The invitation is used up; the teams list gains one.
      queryClient.removeQueries({ queryKey: queryKeys.invitation(token) });
      return queryClient.invalidateQueries({ queryKey: queryKeys.teams(), exact: true });
    },
  });
}
