import { queryOptions, useQuery } from "@tanstack/react-query";
import type { InvitationView, MemberView } from "@shared/api/teams";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** Members of a team, and (for owners; empty for others) its open invitations. */
export const getMembers = (teamId: string) =>
  api<{ members: MemberView[]; invitations: InvitationView[] }>(`/api/teams/${encodeURIComponent(teamId)}/members`);

export const membersQuery = (teamId: string) =>
  queryOptions({ queryKey: queryKeys.members(teamId), queryFn: () => getMembers(teamId) });

export const useMembers = (teamId: string) => useQuery(membersQuery(teamId));
