import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { DiagramVersionView } from "@shared/api/diagrams";
import { api } from "@/lib/apiClient";
import { refreshAfterSave } from "@/features/editor/api/saveVersion";

/**
 * POST /api/diagrams/:id/versions/import — a .json diagram file becomes the diagram's next version;
 * 422 `invalid_json` (line and column) or `invalid_document` (with problems naming block and field), 413 over 1 MB.
 */
export function importVersion(diagramId: string, file: File): Promise<DiagramVersionView> {
  const form = new FormData();
  form.append("file", file);
  return api<{ version: DiagramVersionView }>(`/api/diagrams/${encodeURIComponent(diagramId)}/versions/import`, "POST", form).then((r) => r.version);
}

export function useImportVersion(diagramId: string, teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => importVersion(diagramId, file),
    onSuccess: () => refreshAfterSave(queryClient, diagramId, teamId),
  });
}
