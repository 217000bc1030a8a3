import type { CaseDetail } from '@railyard/shared';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { caseQueryKey } from './case-keys';

/** One case with everything on it; a draft answers only to its author (anyone else gets 404). */
export async function getCase(id: number, signal?: AbortSignal): Promise<CaseDetail> {
  const answer = await api.get<{ case: CaseDetail }>(`/cases/${id}`, { signal });
  return answer.case;
}

export function caseQueryOptions(id: number) {
  return queryOptions({
    queryKey: caseQueryKey(id),
    queryFn: ({ signal }) => getCase(id, signal),
    staleTime: 30_000,
  });
}

export function useCase(id: number) {
  return useSuspenseQuery(caseQueryOptions(id));
}
