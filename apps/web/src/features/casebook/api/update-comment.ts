import type { CaseComment } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { commentsQueryKey } from './get-comments';

export type CommentChange = {
  body: string;
  /** a moderator changing someone else's comment says why; the audit log keeps it */
  reason?: string;
};

export async function updateComment(id: number, change: CommentChange): Promise<CaseComment> {
  const answer = await api.patch<{ comment: CaseComment }>(`/comments/${id}`, change);
  return answer.comment;
}

export function useUpdateComment(caseId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...change }: CommentChange & { id: number }) => updateComment(id, change),
    onSuccess: (updated) =>
      queryClient.setQueryData<CaseComment[]>(commentsQueryKey(caseId), (current) =>
        current?.map((comment) => (comment.id === updated.id ? updated : comment)),
      ),
  });
}
