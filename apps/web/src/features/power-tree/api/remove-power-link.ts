import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { refreshEditedBoard } from './board-edited';

/** A DELETE has no body: the reason travels in the query string. */
export function removePowerLink(slug: string, id: number, reason: string): Promise<void> {
  return api.delete(`/boards/${encodeURIComponent(slug)}/power-links/${id}`, {
    params: { reason },
  });
}

export function useRemovePowerLink(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, reason }: { id: number; reason: string }) =>
      removePowerLink(slug, id, reason),
    onSuccess: () => refreshEditedBoard(queryClient, slug),
  });
}
