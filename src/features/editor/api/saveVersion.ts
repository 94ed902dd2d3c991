import { useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import type { DiagramVersionView } from "@shared/api/diagrams";
import type { SaveVersionInput } from "@shared/api/versions";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** POST /api/diagrams/:id/versions — 409 when another version was saved after `baseVersion`. */
export const saveVersion = (diagramId: string, input: SaveVersionInput) =>
  api<{ version: DiagramVersionView }>(`/api/diagrams/${encodeURIComponent(diagramId)}/versions`, "POST", input).then((r) => r.version);

/** After a save the team's lists show the new latest version; the detail refetches too. */
export const refreshAfterSave = (queryClient: QueryClient, diagramId: string, teamId: string) =>
  Promise.all([
    queryClient.invalidateQueries({ queryKey: queryKeys.diagram(diagramId) }),
    queryClient.invalidateQueries({ queryKey: queryKeys.diagrams(teamId) }),
  ]);

export function useSaveVersion(diagramId: string, teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SaveVersionInput) => saveVersion(diagramId, input),
    onSuccess: () => refreshAfterSave(queryClient, diagramId, teamId),
  });
}
