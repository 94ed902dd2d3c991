import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { DiagramSummary } from "@shared/api/diagrams";
import { api } from "@/lib/apiClient";
import { refreshDiagram } from "@/features/diagrams/api/cache";

export const archiveDiagram = (id: string) =>
  api<{ diagram: DiagramSummary }>(`/api/diagrams/${encodeURIComponent(id)}/archive`, "POST").then((r) => r.diagram);

export function useArchiveDiagram() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: archiveDiagram, onSuccess: (d) => refreshDiagram(queryClient, d) });
}
