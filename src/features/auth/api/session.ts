import type { QueryClient } from "@tanstack/react-query";
import type { UserView } from "@shared/api/auth";
import { queryKeys } from "@/lib/queryKeys";

// Public answers (configuration, invitation previews) outlive a session change.
const kept = new Set<unknown>([queryKeys.config()[0], queryKeys.me()[0], queryKeys.invitation("")[0]]);

/**
 * Switches the cache to a new session (a user after sign-in/up, null after sign-out): every answer
 * that belonged to the previous session is dropped so no one sees another account's teams.
 */
export function switchSession(queryClient: QueryClient, user: UserView | null) {
  queryClient.setQueryData(queryKeys.me(), user);
  queryClient.removeQueries({ predicate: (q) => !kept.has(q.queryKey[0]) });
}
