import type { CaseFlag } from '@railyard/shared';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { FlagStatus } from '../flag-queue';

/** What only a moderator may read sits under this key, so a sign-out can drop it all at once. */
export const moderationQueryKey = ['moderation'] as const;

export type FlagListResponse = { status: FlagStatus; flags: CaseFlag[] };

/** The open (or resolved) reports of cases and comments, oldest first, as the API lists them. */
export function getFlags(status: FlagStatus, signal?: AbortSignal): Promise<FlagListResponse> {
  return api.get<FlagListResponse>('/moderation/flags', { params: { status }, signal });
}

export function flagsQueryKey(status: FlagStatus) {
  return [...moderationQueryKey, 'flags', status] as const;
}

export function flagsQueryOptions(status: FlagStatus) {
  return queryOptions({
    queryKey: flagsQueryKey(status),
    queryFn: ({ signal }) => getFlags(status, signal),
    // Members report at any time; a queue half a minute old is worth asking again.
    staleTime: 30_000,
  });
}

export function useFlags(status: FlagStatus) {
  return useSuspenseQuery(flagsQueryOptions(status));
}
