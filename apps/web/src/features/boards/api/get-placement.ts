import type { BoardPlacement } from '@railyard/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { boardQueryKey } from './get-board';

/** Where every part of the board sits: boxes around their pins, in millimetres. */
export function getPlacement(slug: string, signal?: AbortSignal): Promise<BoardPlacement> {
  return api.get<BoardPlacement>(`/boards/${encodeURIComponent(slug)}/placement`, { signal });
}

export function placementQueryOptions(slug: string) {
  return queryOptions({
    queryKey: [...boardQueryKey(slug), 'placement'] as const,
    queryFn: ({ signal }) => getPlacement(slug, signal),
    // positions change only with a new import of the board
    staleTime: 10 * 60_000,
  });
}

/** Not suspending: the page shows without it and the map fills in. */
export function usePlacement(slug: string) {
  return useQuery(placementQueryOptions(slug));
}
