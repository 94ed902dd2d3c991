import { queryOptions, useQuery } from "@tanstack/react-query";
import type { DiagramVersionView } from "@shared/api/diagrams";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

/** GET /api/diagrams/:id/versions/:n — one saved version with its document and stored check result. */
export const getEditorVersion = (diagramId: string, number: number) =>
  api<{ version: DiagramVersionView }>(`/api/diagrams/${encodeURIComponent(diagramId)}/versions/${number}`).then((r) => r.version);

// A saved version never changes: fetched once per session.
export const editorVersionQuery = (diagramId: string, number: number) =>
  queryOptions({ queryKey: queryKeys.version(diagramId, number), queryFn: () => getEditorVersion(diagramId, number), staleTime: Infinity });

export const useEditorVersion = (diagramId: string, number: number | null) =>
  useQuery({ ...editorVersionQuery(diagramId, number ?? 0), enabled: number !== null && number > 0 });
