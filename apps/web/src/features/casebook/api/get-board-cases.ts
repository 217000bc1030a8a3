import type { CaseListResponse } from '@railyard/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api, type QueryParams } from '../../../lib/api-client';
import { listQueryOf, type CaseListFilters } from '../case-list-params';
import { boardCasesQueryKey } from './case-keys';

/** A page of a board's cases, filtered, searched and sorted by the API. */
export function getBoardCases(
  slug: string,
  query: QueryParams,
  signal?: AbortSignal,
): Promise<CaseListResponse> {
  return api.get<CaseListResponse>(`/boards/${encodeURIComponent(slug)}/cases`, {
    params: query,
    signal,
  });
}

export function boardCasesQueryOptions(slug: string, filters: CaseListFilters) {
  const query = listQueryOf(filters);
  return queryOptions({
    queryKey: [...boardCasesQueryKey(slug), 'list', query] as const,
    queryFn: ({ signal }) => getBoardCases(slug, query, signal),
    // Votes and new write-ups come from other people: a list a minute old is worth asking again.
    staleTime: 30_000,
  });
}

/** Not a suspense query: while another filter's page loads, the last one stays on screen, dimmed. */
export function useBoardCases(slug: string, filters: CaseListFilters) {
  return useQuery({ ...boardCasesQueryOptions(slug, filters), placeholderData: keepPreviousData });
}
