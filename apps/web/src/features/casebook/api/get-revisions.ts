import type { CaseRevision } from '@railyard/shared';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { caseQueryKey } from './case-keys';

/** Every saved state of a case, as the API lists them, with what each one changed. */
export async function getRevisions(caseId: number, signal?: AbortSignal): Promise<CaseRevision[]> {
  const answer = await api.get<{ caseId: number; revisions: CaseRevision[] }>(
    `/cases/${caseId}/revisions`,
    { signal },
  );
  return answer.revisions;
}

export function revisionsQueryOptions(caseId: number) {
  return queryOptions({
    queryKey: [...caseQueryKey(caseId), 'revisions'] as const,
    queryFn: ({ signal }) => getRevisions(caseId, signal),
  });
}

export function useRevisions(caseId: number) {
  return useSuspenseQuery(revisionsQueryOptions(caseId));
}
