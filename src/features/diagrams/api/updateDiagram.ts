import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { DiagramSummary, UpdateDiagramInput } from "@shared/api/diagrams";
import { api } from "@/lib/apiClient";
import { refreshDiagram } from "@/features/diagrams/api/cache";

export const updateDiagram = (id: string, input: UpdateDiagramInput) =>
  api<{ diagram: DiagramSummary }>(`/api/diagrams/${encodeURIComponent(id)}`, "PATCH", input).then((r) => r.diagram);

export function useUpdateDiagram() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id: string; input: UpdateDiagramInput }) => updateDiagram(id, input),
    onSuccess: (d) => refreshDiagram(queryClient, d),
  });
}
