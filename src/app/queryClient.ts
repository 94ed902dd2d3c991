import { MutationCache, QueryCache, QueryClient } from "@tanstack/react-query";
import { isApiError } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** Retrying cannot change a 4xx answer; network trouble and 5xx get two more tries. */
const retry = (failures: number, e: unknown) => failures < 2 && !(isApiError(e) && e.status >= 400 && e.status < 500);

/**
 * Any 401 means the session ended (expired, signed out elsewhere): marking the user as signed out
 * lets RequireAuth send them to the sign-in page with ?next= pointing back here.
 */
export function makeQueryClient(): QueryClient {
  const sessionLost = (e: unknown) => {
    if (isApiError(e, 401)) client.setQueryData(queryKeys.me(), null);
  };
  const client = new QueryClient({
    queryCache: new QueryCache({ onError: sessionLost }),
    mutationCache: new MutationCache({ onError: sessionLost }),
    defaultOptions: {
      queries: { retry, staleTime: 30_000 },
      mutations: { retry: false },
    },
  });
  return client;
}
