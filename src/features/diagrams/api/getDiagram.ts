import { queryOptions, useQuery } from "@tanstack/react-query";
import type { DiagramDetail } from "@shared/api/diagrams";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

export const getDiagram = (id: string) => api<DiagramDetail>(`/api/diagrams/${encodeURIComponent(id)}`);

export const diagramQuery = (id: string) => queryOptions({ queryKey: queryKeys.diagram(id), queryFn: () => getDiagram(id) });

export const useDiagram = (id: string | undefined) => useQuery({ ...diagramQuery(id ?? ""), enabled: id !== undefined });
