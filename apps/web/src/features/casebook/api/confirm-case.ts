// "This worked for me": a technician who followed the fix on their own board says so, with an
// optional note. Shown at once, like a vote, and put back when the API refuses.
import type { CaseDetail, CaseScore } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { withConfirmation } from '../case-score';
import { boardCasesQueryKey, caseQueryKey } from './case-keys';

export type ConfirmationChange = { confirmed: true; note: string } | { confirmed: false };

export async function confirmCase(id: number, change: ConfirmationChange): Promise<CaseScore> {
  const answer = change.confirmed
    ? await api.post<{ score: CaseScore }>(`/cases/${id}/confirmation`, { note: change.note })
    : await api.delete<{ score: CaseScore }>(`/cases/${id}/confirmation`);
  return answer.score;
}

export function useConfirmCase(slug: string, id: number) {
  const queryClient = useQueryClient();
  const key = caseQueryKey(id);
  const setScore = (score: CaseScore) =>
    queryClient.setQueryData<CaseDetail>(key, (current) => current && { ...current, score });
  return useMutation({
    mutationFn: (change: ConfirmationChange) => confirmCase(id, change),
    onMutate: async (change) => {
      await queryClient.cancelQueries({ queryKey: key, exact: true });
      const before = queryClient.getQueryData<CaseDetail>(key)?.score;
      if (before) setScore(withConfirmation(before, change.confirmed));
      return { before };
    },
    onError: (_error, _change, context) => {
      if (context?.before) setScore(context.before);
    },
    onSuccess: setScore,
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: [...key, 'confirmations'] }),
        queryClient.invalidateQueries({ queryKey: boardCasesQueryKey(slug) }),
      ]),
  });
}
