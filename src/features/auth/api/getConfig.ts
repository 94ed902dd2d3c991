import { queryOptions, useQuery } from "@tanstack/react-query";
import type { PublicConfig } from "@shared/api/errors";
import { api } from "@/lib/apiClient";
import { queryKeys } from "@/lib/queryKeys";

export const getConfig = () => api<PublicConfig>("/api/config");

export const configQuery = () =>
  queryOptions({ queryKey: queryKeys.config(), queryFn: getConfig, staleTime: Infinity });

export const useConfig = () => useQuery(configQuery());
