import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CommentView, ReplyInput, ThreadView } from "@shared/api/comments";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** POST /api/diagrams/:id/comments/:commentId/replies → 201 { comment, thread }. */
export const replyToThread = (diagramId: string, threadId: string, input: ReplyInput) =>
  api<{ comment: CommentView; thread: ThreadView }>(
    `/api/diagrams/${encodeURIComponent(diagramId)}/comments/${encodeURIComponent(threadId)}/replies`,
    "POST",
    input,
  );

export function useReplyToThread(diagramId: string, version: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ threadId, body }: { threadId: string; body: string }) => replyToThread(diagramId, threadId, { body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.comments(diagramId, version) }),
  });
}
