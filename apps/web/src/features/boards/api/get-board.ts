import type { BoardDetail } from '@railyard/shared';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { boardsQueryKey } from './get-boards';

export function getBoard(slug: string, signal?: AbortSignal): Promise<BoardDetail> {
  return api.get<BoardDetail>(`/boards/${encodeURIComponent(slug)}`, { signal });
}

export function boardQueryKey(slug: string) {
  return [...boardsQueryKey, slug] as const;
}

export function boardQueryOptions(slug: string) {
  return queryOptions({
    queryKey: boardQueryKey(slug),
    queryFn: ({ signal }) => getBoard(slug, signal),
  });
}

export function useBoard(slug: string) {
  return useSuspenseQuery(boardQueryOptions(slug));
}
