import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/apiClient";
import { refreshShareLinks } from "@/features/shareLinks/api/cache";

export const revokeShareLink = (diagramId: string, linkId: string) =>
  api<void>(`/api/diagrams/${encodeURIComponent(diagramId)}/share-links/${encodeURIComponent(linkId)}`, "DELETE");

export function useRevokeShareLink() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ diagramId, linkId }: { diagramId: string; linkId: string }) => revokeShareLink(diagramId, linkId),
    onSuccess: (_done, { diagramId }) => refreshShareLinks(queryClient, diagramId),
  });
}
