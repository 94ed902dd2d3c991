import { queryOptions, useQuery } from "@tanstack/react-query";
import type { DiagramDetail } from "@shared/api/diagrams";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** The diagram and its latest version; shares the detail cache key with the rest of the app. */
export const getEditorDiagram = (id: string) => api<DiagramDetail>(`/api/diagrams/${encodeURIComponent(id)}`);

export const editorDiagramQuery = (id: string) =>
  // The editor keeps its own copy of the document; a background refetch only feeds the "newer version" notice.
  queryOptions({ queryKey: queryKeys.diagram(id), queryFn: () => getEditorDiagram(id), refetchOnWindowFocus: true });

export const useEditorDiagram = (id: string) => useQuery(editorDiagramQuery(id));
