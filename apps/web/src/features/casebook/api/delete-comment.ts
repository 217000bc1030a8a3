import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { caseQueryKey } from './case-keys';
import { commentsQueryKey } from './get-comments';

/** Deletes a comment; a moderator deleting someone else's gives a reason for the audit log. */
export function deleteComment(id: number, reason?: string): Promise<void> {
  return api.delete(`/comments/${id}`, { params: reason ? { reason } : undefined });
}

export function useDeleteComment(caseId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, reason }: { id: number; reason?: string }) => deleteComment(id, reason),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: commentsQueryKey(caseId) }),
        queryClient.invalidateQueries({ queryKey: caseQueryKey(caseId), exact: true }),
      ]),
  });
}
