import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { SignInInput, UserView } from "@shared/api/auth";
import { api } from "@/lib/apiClient";
import { switchSession } from "@/features/auth/api/session";

export const signIn = (input: SignInInput) =>
  api<{ user: UserView }>("/api/auth/sign-in", "POST", input).then((r) => r.user);

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: signIn, onSuccess: (user) => switchSession(queryClient, user) });
}
