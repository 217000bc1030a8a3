import type { AuditEntry } from '@railyard/shared';
import { infiniteQueryOptions, useSuspenseInfiniteQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { adminQueryKey } from './get-admin-users';

export const auditPageSize = 100;

export type AuditLogResponse = { entries: AuditEntry[] };

/** Newest first; `before` pages back: the entries older than that id. */
export function getAuditLog(
  before: number | undefined,
  signal?: AbortSignal,
): Promise<AuditLogResponse> {
  return api.get<AuditLogResponse>('/admin/audit', {
    params: { limit: auditPageSize, before },
    signal,
  });
}

export const auditLogQueryKey = [...adminQueryKey, 'audit'] as const;

export function auditLogQueryOptions() {
  return infiniteQueryOptions({
    queryKey: auditLogQueryKey,
    queryFn: ({ pageParam, signal }) => getAuditLog(pageParam, signal),
    initialPageParam: undefined as number | undefined,
    // A short page is the last one; otherwise the next page starts below its oldest entry.
    getNextPageParam: (last) =>
      last.entries.length < auditPageSize ? undefined : last.entries.at(-1)?.id,
  });
}

export function useAuditLog() {
  return useSuspenseInfiniteQuery(auditLogQueryOptions());
}
