import type { NetListResponse } from '@railyard/shared';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { boardQueryKey } from './get-board';

export function getNets(slug: string, signal?: AbortSignal): Promise<NetListResponse> {
  return api.get<NetListResponse>(`/boards/${encodeURIComponent(slug)}/nets`, { signal });
}

export function netsQueryOptions(slug: string) {
  return queryOptions({
    queryKey: [...boardQueryKey(slug), 'nets'] as const,
    queryFn: ({ signal }) => getNets(slug, signal),
  });
}

export function useNets(slug: string) {
  return useSuspenseQuery(netsQueryOptions(slug));
}
