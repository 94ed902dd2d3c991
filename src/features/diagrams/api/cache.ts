import type { QueryClient } from "@tanstack/react-query";
import type { DiagramSummary } from "@shared/api/diagrams";
import { queryKeys } from "@/lib/queryKeys";

/** After any change to a diagram: refetch its team's lists (active and archived) and its detail. */
export const refreshDiagram = (queryClient: QueryClient, d: Pick<DiagramSummary, "id" | "teamId">) =>
  Promise.all([
    queryClient.invalidateQueries({ queryKey: queryKeys.diagrams(d.teamId) }),
    queryClient.invalidateQueries({ queryKey: queryKeys.diagram(d.id) }),
  ]);
