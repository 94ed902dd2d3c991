import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { ChangeRoleInput, MemberView } from "@shared/api/teams";
import { api } from "@/lib/apiClient";
import { refreshMembership } from "@/features/members/api/cache";

export const changeRole = (teamId: string, userId: string, input: ChangeRoleInput) =>
  api<{ member: MemberView }>(
    `/api/teams/${encodeURIComponent(teamId)}/members/${encodeURIComponent(userId)}`,
    "PATCH",
    input,
  ).then((r) => r.member);

export function useChangeRole(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, input }: { userId: string; input: ChangeRoleInput }) => changeRole(teamId, userId, input),
    onSuccess: () => refreshMembership(queryClient, teamId),
  });
}
