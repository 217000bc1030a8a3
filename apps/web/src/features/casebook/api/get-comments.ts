import type { CaseComment } from '@railyard/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { caseQueryKey } from './case-keys';

export function commentsQueryKey(caseId: number) {
  return [...caseQueryKey(caseId), 'comments'] as const;
}

/** The comments on a case, oldest first; a deleted one keeps its place with an empty body. */
export async function getComments(caseId: number, signal?: AbortSignal): Promise<CaseComment[]> {
  const answer = await api.get<{ caseId: number; comments: CaseComment[] }>(
    `/cases/${caseId}/comments`,
    { signal },
  );
  return answer.comments;
}

export function commentsQueryOptions(caseId: number) {
  return queryOptions({
    queryKey: commentsQueryKey(caseId),
    queryFn: ({ signal }) => getComments(caseId, signal),
    staleTime: 30_000,
  });
}

/** Not a suspense query: the case reads before its comments arrive. */
export function useComments(caseId: number) {
  return useQuery(commentsQueryOptions(caseId));
}
