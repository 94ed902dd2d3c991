import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/apiClient";
import { switchSession } from "@/features/auth/api/session";

export const signOut = () => api<void>("/api/auth/sign-out", "POST");

/** Signs out and drops the session's cached answers; callers decide where to go next. */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: signOut, onSuccess: () => switchSession(queryClient, null) });
}
