import type { RailSearchResponse } from '@railyard/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const railSearchLimit = 60;

/** Rails on every board whose name or alias looks like `query`, grouped by board. */
export function searchRails(
  query: string,
  limit: number,
  signal?: AbortSignal,
): Promise<RailSearchResponse> {
  return api.get<RailSearchResponse>('/search', { params: { q: query, limit }, signal });
}

export function railSearchQueryOptions(query: string, limit = railSearchLimit) {
  return queryOptions({
    queryKey: ['search', { q: query, limit }] as const,
    queryFn: ({ signal }) => searchRails(query, limit, signal),
  });
}

/** Idle for an empty query; while the next answer loads, the previous one stays on screen. */
export function useRailSearch(query: string) {
  return useQuery({
    ...railSearchQueryOptions(query),
    enabled: query !== '',
    placeholderData: keepPreviousData,
  });
}
