import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CreateThreadInput, ThreadView } from "@shared/api/comments";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";
import { threadsPath } from "@/features/comments/api/getThreads";

/** POST …/versions/:n/comments → 201 { thread }: a new thread, pinned to a block or a wire or to nothing. */
export const createThread = (diagramId: string, version: number, input: CreateThreadInput) =>
  api<{ thread: ThreadView }>(threadsPath(diagramId, version), "POST", input).then((r) => r.thread);

export function useCreateThread(diagramId: string, version: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateThreadInput) => createThread(diagramId, version, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.comments(diagramId, version) }),
  });
}
