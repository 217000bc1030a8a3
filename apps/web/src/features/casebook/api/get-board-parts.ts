import type { ComponentListResponse } from '@railyard/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** Every component of a board: what the editor's parts picker offers. */
export function getBoardParts(slug: string, signal?: AbortSignal): Promise<ComponentListResponse> {
  return api.get<ComponentListResponse>(`/boards/${encodeURIComponent(slug)}/components`, {
    signal,
  });
}

// Under the board's key, so an import into the board makes the list stale too.
export function boardPartsQueryOptions(slug: string) {
  return queryOptions({
    queryKey: ['boards', slug, 'components', { net: null }] as const,
    queryFn: ({ signal }) => getBoardParts(slug, signal),
    staleTime: 5 * 60_000,
  });
}

/** Not a suspense query: the editor can be filled in while a big board's parts arrive. */
export function useBoardParts(slug: string) {
  return useQuery(boardPartsQueryOptions(slug));
}
