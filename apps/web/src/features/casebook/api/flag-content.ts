import type { CaseFlag } from '@railyard/shared';
import { useMutation } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';

export type FlagTarget = { type: 'case' | 'comment'; id: number };

/** A member reports a case or a comment to the moderators, saying why. */
export async function flagContent(target: FlagTarget, reason: string): Promise<CaseFlag> {
  const collection = target.type === 'case' ? 'cases' : 'comments';
  const answer = await api.post<{ flag: CaseFlag }>(`/${collection}/${target.id}/flag`, {
    reason,
  });
  return answer.flag;
}

/** Nothing on the page shows flags, so nothing is refreshed: moderators read them in their queue. */
export function useFlagContent(target: FlagTarget) {
  return useMutation({ mutationFn: (reason: string) => flagContent(target, reason) });
}

/** The API's answer while this member's earlier report of the same thing is still open. */
export function isAlreadyFlagged(error: unknown): boolean {
  return isApiError(error) && error.status === 409 && error.code === 'already_flagged';
}
