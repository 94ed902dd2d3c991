import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { InvitationView, InviteInput } from "@shared/api/teams";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** Invites an e-mail address into a team (owners); the server sends the e-mail. */
export const createInvitation = (teamId: string, input: InviteInput) =>
  api<{ invitation: InvitationView }>(`/api/teams/${encodeURIComponent(teamId)}/invitations`, "POST", input).then(
    (r) => r.invitation,
  );

export function useCreateInvitation(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InviteInput) => createInvitation(teamId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.members(teamId) }),
  });
}
