// A moderator's lock, unlock, hide or restore of a case. Each carries a reason, which the audit log
// keeps; the answer is the case as it now stands.
import type { CaseDetail } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { refreshWrittenCase } from './case-written';

export const caseModerationActions = ['lock', 'unlock', 'hide', 'restore'] as const;
export type CaseModerationAction = (typeof caseModerationActions)[number];

export async function moderateCase(
  id: number,
  action: CaseModerationAction,
  reason: string,
): Promise<CaseDetail> {
  const answer = await api.post<{ case: CaseDetail }>(`/cases/${id}/${action}`, { reason });
  return answer.case;
}

export function useModerateCase(slug: string, id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ action, reason }: { action: CaseModerationAction; reason: string }) =>
      moderateCase(id, action, reason),
    // A hidden case leaves the board's lists, a restored one comes back: refreshWrittenCase does both.
    onSuccess: (changed) => refreshWrittenCase(queryClient, slug, changed),
  });
}
