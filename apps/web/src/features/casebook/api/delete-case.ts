import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { boardCasesQueryKey, caseQueryKey } from './case-keys';

/** Deletes a draft; a published case stays (others may have voted, confirmed or commented). */
export function deleteCase(id: number): Promise<void> {
  return api.delete(`/cases/${id}`);
}

/**
 * Drops a deleted case from the cache. Called once its page is left: a page still showing the case
 * would ask for it again and get "not found".
 */
export function forgetDeletedCase(queryClient: QueryClient, id: number): void {
  queryClient.removeQueries({ queryKey: caseQueryKey(id) });
}

export function useDeleteCase(slug: string, id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteCase(id),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: boardCasesQueryKey(slug) }),
  });
}
