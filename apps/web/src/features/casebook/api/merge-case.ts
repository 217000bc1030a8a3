// A moderator folds a duplicate case into the one that is kept. The duplicate's address leads to the
// kept case from then on (the API answers it with a redirect).
import type { CaseDetail, CaseMergeSummary } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { caseQueryKey } from './case-keys';
import { refreshWrittenCase } from './case-written';

export type CaseMergeResult = { case: CaseDetail; merge: CaseMergeSummary };

export function mergeCase(
  duplicateId: number,
  intoCaseId: number,
  reason: string,
): Promise<CaseMergeResult> {
  return api.post<CaseMergeResult>(`/cases/${duplicateId}/merge`, { intoCaseId, reason });
}

export function useMergeCase(slug: string, duplicateId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ intoCaseId, reason }: { intoCaseId: number; reason: string }) =>
      mergeCase(duplicateId, intoCaseId, reason),
    onSuccess: async (result) => {
      // Not refetched now: the duplicate's page is still on screen until the kept case's page
      // replaces it, and a fresh answer for it (the kept case) would redirect it a second time.
      await queryClient.invalidateQueries({
        queryKey: caseQueryKey(duplicateId),
        refetchType: 'none',
      });
      await refreshWrittenCase(queryClient, slug, result.case);
      // The comments, attachments and confirmations that moved now belong to the kept case.
      const kept = caseQueryKey(result.case.id);
      await queryClient.invalidateQueries({
        queryKey: kept,
        predicate: (query) => query.queryKey.length > kept.length,
      });
    },
  });
}
