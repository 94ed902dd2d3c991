import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { DiagramVersionView } from "@shared/api/diagrams";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** POST /api/diagrams/:id/versions/:n/restore → the new version, a copy of n with message "Restored from vN". */
export const restoreVersion = (diagramId: string, number: number) =>
  api<{ version: DiagramVersionView }>(`/api/diagrams/${encodeURIComponent(diagramId)}/versions/${number}/restore`, "POST").then((r) => r.version);

export function useRestoreVersion(diagramId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (number: number) => restoreVersion(diagramId, number),
    // The diagram's key is the prefix of its versions' keys: the list, the newest and the detail all refetch.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.diagram(diagramId) }),
  });
}
