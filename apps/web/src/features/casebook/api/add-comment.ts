import type { CaseComment } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { caseQueryKey } from './case-keys';
import { commentsQueryKey } from './get-comments';

/** Adds a comment (Markdown) to a published case. */
export async function addComment(caseId: number, body: string): Promise<CaseComment> {
  const answer = await api.post<{ comment: CaseComment }>(`/cases/${caseId}/comments`, { body });
  return answer.comment;
}

export function useAddComment(caseId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: string) => addComment(caseId, body),
    onSuccess: (comment) => {
      queryClient.setQueryData<CaseComment[]>(commentsQueryKey(caseId), (current) =>
        current ? [...current, comment] : [comment],
      );
      // The case's comment count.
      return queryClient.invalidateQueries({ queryKey: caseQueryKey(caseId), exact: true });
    },
  });
}
