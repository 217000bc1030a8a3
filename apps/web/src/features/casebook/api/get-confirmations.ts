import type { CaseConfirmation } from '@railyard/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { caseQueryKey } from './case-keys';

/** Who said the fix worked for them, with their notes. */
export async function getConfirmations(id: number, signal?: AbortSignal) {
  const answer = await api.get<{ caseId: number; confirmations: CaseConfirmation[] }>(
    `/cases/${id}/confirmations`,
    { signal },
  );
  return answer.confirmations;
}

export function confirmationsQueryOptions(id: number) {
  return queryOptions({
    queryKey: [...caseQueryKey(id), 'confirmations'] as const,
    queryFn: ({ signal }) => getConfirmations(id, signal),
  });
}

export function useConfirmations(id: number, enabled = true) {
  return useQuery({ ...confirmationsQueryOptions(id), enabled });
}
