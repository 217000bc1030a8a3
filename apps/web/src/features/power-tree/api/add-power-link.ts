import type { PowerLinkCreate, PowerLinkRow } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { refreshEditedBoard } from './board-edited';

export function addPowerLink(slug: string, link: PowerLinkCreate): Promise<{ link: PowerLinkRow }> {
  return api.post<{ link: PowerLinkRow }>(`/boards/${encodeURIComponent(slug)}/power-links`, link);
}

export function useAddPowerLink(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (link: PowerLinkCreate) => addPowerLink(slug, link),
    onSuccess: () => refreshEditedBoard(queryClient, slug),
  });
}
