// Voting on a case's fix. The buttons answer at once (optimistic), the API's score replaces the guess,
// and a refusal puts back the score from before the press.
import type { CaseDetail, CaseScore } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { withVote, type VoteValue } from '../case-score';
import { boardCasesQueryKey, caseQueryKey } from './case-keys';

/** Sets the viewer's vote, or takes it back (null). */
export async function voteOnCase(id: number, value: VoteValue | null): Promise<CaseScore> {
  const answer =
    value === null
      ? await api.delete<{ score: CaseScore }>(`/cases/${id}/vote`)
      : await api.put<{ score: CaseScore }>(`/cases/${id}/vote`, { value });
  return answer.score;
}

export function useVoteOnCase(slug: string, id: number) {
  const queryClient = useQueryClient();
  const key = caseQueryKey(id);
  const setScore = (score: CaseScore) =>
    queryClient.setQueryData<CaseDetail>(key, (current) => current && { ...current, score });
  return useMutation({
    mutationFn: (value: VoteValue | null) => voteOnCase(id, value),
    onMutate: async (value) => {
      // An answer already on its way must not overwrite the guess with the score from before.
      await queryClient.cancelQueries({ queryKey: key, exact: true });
      const before = queryClient.getQueryData<CaseDetail>(key)?.score;
      if (before) setScore(withVote(before, value));
      return { before };
    },
    onError: (_error, _value, context) => {
      if (context?.before) setScore(context.before);
    },
    onSuccess: setScore,
    // The board's lists are ranked by the score.
    onSettled: () => queryClient.invalidateQueries({ queryKey: boardCasesQueryKey(slug) }),
  });
}
