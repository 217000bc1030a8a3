import type { RootNetUpdate } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { refreshEditedBoard } from './board-edited';

/** Makes `net` the rail the board's power enters by, where traces "from the root" start. */
export function setRootNet(slug: string, change: RootNetUpdate): Promise<{ rootNet: string }> {
  return api.put<{ rootNet: string }>(`/boards/${encodeURIComponent(slug)}/root`, change);
}

export function useSetRootNet(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: RootNetUpdate) => setRootNet(slug, change),
    onSuccess: () => refreshEditedBoard(queryClient, slug),
  });
}
