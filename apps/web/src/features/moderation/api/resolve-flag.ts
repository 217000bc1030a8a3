import type { CaseFlag } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { flagsQueryKey, type FlagListResponse } from './get-flags';

/** Closes a report with what the moderator did about it (kept in the audit log). */
export async function resolveFlag(id: number, reason: string): Promise<CaseFlag> {
  const answer = await api.post<{ flag: CaseFlag }>(`/moderation/flags/${id}/resolve`, { reason });
  return answer.flag;
}

export function useResolveFlag() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, reason }: { id: number; reason: string }) => resolveFlag(id, reason),
    onSuccess: (resolved) => {
      // Off the open list at once; the resolved list is asked again when its tab opens.
      queryClient.setQueryData<FlagListResponse>(
        flagsQueryKey('open'),
        (current) =>
          current && { ...current, flags: current.flags.filter((flag) => flag.id !== resolved.id) },
      );
      return queryClient.invalidateQueries({ queryKey: flagsQueryKey('resolved') });
    },
  });
}
