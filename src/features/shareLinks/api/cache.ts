import type { QueryClient } from "@tanstack/react-query";
import { queryKeys } from "@/lib/queryKeys";

/** After a link is made or revoked: the diagram's list and every team list (the team page may show it). */
export const refreshShareLinks = (queryClient: QueryClient, diagramId: string) =>
  Promise.all([
    queryClient.invalidateQueries({ queryKey: queryKeys.shareLinks(diagramId) }),
    queryClient.invalidateQueries({ predicate: (q) => q.queryKey[0] === "teams" && q.queryKey[2] === "share-links" }),
  ]);
