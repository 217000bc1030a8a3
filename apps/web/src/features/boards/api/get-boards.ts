import type { BoardListResponse } from '@railyard/shared';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export function getBoards(signal?: AbortSignal): Promise<BoardListResponse> {
  return api.get<BoardListResponse>('/boards', { signal });
}

export const boardsQueryKey = ['boards'] as const;

export function boardsQueryOptions() {
  return queryOptions({
    queryKey: boardsQueryKey,
    queryFn: ({ signal }) => getBoards(signal),
  });
}

export function useBoards() {
  return useSuspenseQuery(boardsQueryOptions());
}
