import { queryOptions, useQuery } from "@tanstack/react-query";
import type { ShareLinkView } from "@shared/api/shareLinks";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** A diagram's share links (editors and owners), newest first, never with their tokens. */
export const getShareLinks = (diagramId: string) =>
  api<{ shareLinks: ShareLinkView[] }>(`/api/diagrams/${encodeURIComponent(diagramId)}/share-links`).then((r) => r.shareLinks);

export const shareLinksQuery = (diagramId: string) =>
  queryOptions({ queryKey: queryKeys.shareLinks(diagramId), queryFn: () => getShareLinks(diagramId) });

export const useShareLinks = (diagramId: string) => useQuery(shareLinksQuery(diagramId));
