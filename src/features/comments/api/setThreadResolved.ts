import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { ThreadView } from "@shared/api/comments";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** POST /api/diagrams/:id/comments/:commentId/resolve (or /reopen) → { thread }. */
export const setThreadResolved = (diagramId: string, threadId: string, resolved: boolean) =>
  api<{ thread: ThreadView }>(
    `/api/diagrams/${encodeURIComponent(diagramId)}/comments/${encodeURIComponent(threadId)}/${resolved ? "resolve" : "reopen"}`,
    "POST",
  ).then((r) => r.thread);

export function useSetThreadResolved(diagramId: string, version: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ threadId, resolved }: { threadId: string; resolved: boolean }) => setThreadResolved(diagramId, threadId, resolved),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.comments(diagramId, version) }),
  });
}
