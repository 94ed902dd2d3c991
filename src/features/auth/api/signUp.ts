import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { SignUpInput, UserView } from "@shared/api/auth";
import { api } from "@/lib/apiClient";
import { switchSession } from "@/features/auth/api/session";

export const signUp = (input: SignUpInput) =>
  api<{ user: UserView }>("/api/auth/sign-up", "POST", input).then((r) => r.user);

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: signUp, onSuccess: (user) => switchSession(queryClient, user) });
}
