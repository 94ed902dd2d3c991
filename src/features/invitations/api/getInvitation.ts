import { queryOptions, useQuery } from "@tanstack/react-query";
import type { InvitationPreview } from "@shared/api/teams";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** Public preview of an invitation (404 unknown or used, 410 expired). */
export const getInvitation = (token: string) =>
  api<{ invitation: InvitationPreview }>(`/api/invitations/${encodeURIComponent(token)}`).then((r) => r.invitation);

export const invitationQuery = (token: string) =>
  queryOptions({ queryKey: queryKeys.invitation(token), queryFn: () => getInvitation(token) });

export const useInvitation = (token: string) => useQuery(invitationQuery(token));
