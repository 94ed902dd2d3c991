import { queryOptions, useQuery } from "@tanstack/react-query";
import type { TeamShareLinkView } from "@shared/api/shareLinks";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** Every share link of the team's diagrams, with each diagram's title (editors and owners). */
export const getTeamShareLinks = (teamId: string) =>
  api<{ shareLinks: TeamShareLinkView[] }>(`/api/teams/${encodeURIComponent(teamId)}/share-links`).then((r) => r.shareLinks);

export const teamShareLinksQuery = (teamId: string) =>
  queryOptions({ queryKey: queryKeys.teamShareLinks(teamId), queryFn: () => getTeamShareLinks(teamId) });

export const useTeamShareLinks = (teamId: string, enabled = true) => useQuery({ ...teamShareLinksQuery(teamId), enabled });
