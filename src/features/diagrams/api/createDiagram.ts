import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CreateDiagramInput, DiagramSummary } from "@shared/api/diagrams";
import { api } from "@/lib/apiClient";
import { refreshDiagram } from "@/features/diagrams/api/cache";

export const createDiagram = (teamId: string, input: CreateDiagramInput) =>
  api<{ diagram: DiagramSummary }>(`/api/teams/${encodeURIComponent(teamId)}/diagrams`, "POST", input).then(
    (r) => r.diagram,
  );

export function useCreateDiagram(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateDiagramInput) => createDiagram(teamId, input),
    onSuccess: (d) => refreshDiagram(queryClient, d),
  });
}
