import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { DiagramSummary } from "@shared/api/diagrams";
import { api } from "@/lib/apiClient";
import { refreshDiagram } from "@/features/diagrams/api/cache";

/**
 * POST /api/teams/:teamId/diagrams/import — a .json diagram file becomes a new diagram with version 1;
 * 422 `invalid_json` (line and column) or `invalid_document` (with problems), 413 over 1 MB.
 */
export function importDiagram(teamId: string, file: File): Promise<DiagramSummary> {
  const form = new FormData();
  form.append("file", file);
  return api<{ diagram: DiagramSummary }>(`/api/teams/${encodeURIComponent(teamId)}/diagrams/import`, "POST", form).then(
    (r) => r.diagram,
  );
}

export function useImportDiagram(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => importDiagram(teamId, file),
    onSuccess: (d) => refreshDiagram(queryClient, d),
  });
}
