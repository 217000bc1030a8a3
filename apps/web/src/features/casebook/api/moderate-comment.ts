import type { CaseComment } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { caseQueryKey } from './case-keys';
import { commentsQueryKey } from './get-comments';

export type CommentModerationAction = 'hide' | 'restore';

/** A moderator hides a comment (with the reason shown to moderators and its author) or restores it. */
export async function moderateComment(
  id: number,
  action: CommentModerationAction,
  reason: string,
): Promise<CaseComment> {
  const answer = await api.post<{ comment: CaseComment }>(`/comments/${id}/${action}`, { reason });
  return answer.comment;
}

export function useModerateComment(caseId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({
      id,
      action,
      reason,
    }: {
      id: number;
      action: CommentModerationAction;
      reason: string;
    }) => moderateComment(id, action, reason),
    onSuccess: (changed) => {
      queryClient.setQueryData<CaseComment[]>(commentsQueryKey(caseId), (current) =>
        current?.map((comment) => (comment.id === changed.id ? changed : comment)),
      );
      // The case's comment count leaves hidden comments out.
      return queryClient.invalidateQueries({ queryKey: caseQueryKey(caseId), exact: true });
    },
  });
}
