import { queryOptions, useQuery } from "@tanstack/react-query";
import type { UserView } from "@shared/api/auth";
import { api, isApiError } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** The signed-in user, or null when signed out (a 401 here is an answer, not a failure). */
export async function getMe(): Promise<UserView | null> {
  try {
    return (await api<{ user: UserView }>("/api/auth/me")).user;
  } catch (e) {
    if (isApiError(e, 401)) return null;
    throw e;
  }
}

export const meQuery = () => queryOptions({ queryKey: queryKeys.me(), queryFn: getMe, staleTime: 5 * 60_000 });

export const useMe = () => useQuery(meQuery());
