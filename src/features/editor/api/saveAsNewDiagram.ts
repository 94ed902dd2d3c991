import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { DiagramSummary } from "@shared/api/diagrams";
import { api } from "@/lib/apiClient";
import { refreshAfterSave, saveVersion } from "@/features/editor/api/saveVersion";

interface Input {
  teamId: string;
  title: string;
  description: string;
  message: string;
  document: unknown;
}

/** Creates a diagram in the same team (POST /api/teams/:teamId/diagrams) and saves the document as its version 1. */
export async function saveAsNewDiagram({ teamId, title, description, message, document }: Input): Promise<DiagramSummary> {
  const { diagram } = await api<{ diagram: DiagramSummary }>(`/api/teams/${encodeURIComponent(teamId)}/diagrams`, "POST", { title, description });
  await saveVersion(diagram.id, { baseVersion: 0, message, document });
  return diagram;
}

export function useSaveAsNewDiagram() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveAsNewDiagram,
    onSuccess: (d) => refreshAfterSave(queryClient, d.id, d.teamId),
  });
}
