import type { NetRow, NetUpdate } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { refreshEditedBoard } from './board-edited';

/** Changes a net's nominal voltage, description or kind; `net` is its printed name. */
export function updateNet(slug: string, net: string, change: NetUpdate): Promise<{ net: NetRow }> {
  return api.patch<{ net: NetRow }>(
    `/boards/${encodeURIComponent(slug)}/nets/${encodeURIComponent(net)}`,
    change,
  );
}

export function useUpdateNet(slug: string, net: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: NetUpdate) => updateNet(slug, net, change),
    onSuccess: () => refreshEditedBoard(queryClient, slug),
  });
}
