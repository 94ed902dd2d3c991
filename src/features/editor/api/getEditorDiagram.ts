import { queryOptions, useQuery } from "@tanstack/react-query";
import type { DiagramDetail } from "@shared/api/diagrams";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** The diagram and its latest version: the one fetcher of GET /api/diagrams/:id (the team nav reads it too). */
export const getEditorDiagram = (id: string) => api<DiagramDetail>(`/api/diagrams/${encodeURIComponent(id)}`);

export const editorDiagramQuery = (id: string) =>
  // The editor keeps its own copy of the document; a background refetch only feeds the "newer version" notice.
  queryOptions({ queryKey: queryKeys.diagram(id), queryFn: () => getEditorDiagram(id), refetchOnWindowFocus: true });

export const useEditorDiagram = (id: string | undefined) => useQuery({ ...editorDiagramQuery(id ?? ""), enabled: id !== undefined });
