import type { SimilarCase } from '@railyard/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { SimilarCasesParams } from '../similar-cases-query';
import { boardCasesQueryKey } from './case-keys';

export type SimilarCasesResponse = { board: string; cases: SimilarCase[] };

/** Cases of the board that look like the one being written: shared nets and culprits, alike text. */
export function getSimilarCases(
  slug: string,
  params: SimilarCasesParams,
  signal?: AbortSignal,
): Promise<SimilarCasesResponse> {
  return api.get<SimilarCasesResponse>(`/boards/${encodeURIComponent(slug)}/cases/similar`, {
    params,
    signal,
  });
}

export function similarCasesQueryOptions(slug: string, params: SimilarCasesParams) {
  return queryOptions({
    queryKey: [...boardCasesQueryKey(slug), 'similar', params] as const,
    queryFn: ({ signal }) => getSimilarCases(slug, params, signal),
    staleTime: 60_000,
  });
}

/** Asks only while there is something to compare (`params` not null); the last answer stays meanwhile. */
export function useSimilarCases(slug: string, params: SimilarCasesParams | null) {
  return useQuery({
    ...similarCasesQueryOptions(slug, params ?? {}),
    enabled: params !== null,
    placeholderData: keepPreviousData,
  });
}
