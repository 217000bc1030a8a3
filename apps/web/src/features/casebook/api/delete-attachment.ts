import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { attachmentsQueryKey, type CaseAttachment } from './get-attachments';

export function deleteAttachment(id: number): Promise<void> {
  return api.delete(`/attachments/${id}`);
}

export function useDeleteAttachment(caseId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => deleteAttachment(id),
    onSuccess: (_answer, id) =>
      queryClient.setQueryData<CaseAttachment[]>(attachmentsQueryKey(caseId), (current) =>
        current?.filter((attachment) => attachment.id !== id),
      ),
  });
}
