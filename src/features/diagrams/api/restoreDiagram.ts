import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { DiagramSummary } from "@shared/api/diagrams";
import { api } from "@/lib/apiClient";
import { refreshDiagram } from "@/features/diagrams/api/cache";

export const restoreDiagram = (id: string) =>
  api<{ diagram: DiagramSummary }>(`/api/diagrams/${encodeURIComponent(id)}/restore`, "POST").then((r) => r.diagram);

export function useRestoreDiagram() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: restoreDiagram, onSuccess: (d) => refreshDiagram(queryClient, d) });
}
