import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CreatedShareLink, CreateShareLinkInput } from "@shared/api/shareLinks";
import { api } from "@/lib/apiClient";
import { refreshShareLinks } from "@/features/shareLinks/api/cache";

export const createShareLink = (diagramId: string, input: CreateShareLinkInput) =>
  api<{ shareLink: CreatedShareLink }>(`/api/diagrams/${encodeURIComponent(diagramId)}/share-links`, "POST", input).then((r) => r.shareLink);

export function useCreateShareLink(diagramId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateShareLinkInput) => createShareLink(diagramId, input),
    onSuccess: () => refreshShareLinks(queryClient, diagramId),
  });
}
