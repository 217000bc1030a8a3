import type { AdminUser } from '@railyard/shared';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** Everything only an admin may read sits under this key, so sign-out can drop it all at once. */
export const adminQueryKey = ['admin'] as const;

export type AdminUsersResponse = { users: AdminUser[] };

export function getAdminUsers(signal?: AbortSignal): Promise<AdminUsersResponse> {
  return api.get<AdminUsersResponse>('/admin/users', { signal });
}

export const adminUsersQueryKey = [...adminQueryKey, 'users'] as const;

export function adminUsersQueryOptions() {
  return queryOptions({
    queryKey: adminUsersQueryKey,
    queryFn: ({ signal }) => getAdminUsers(signal),
  });
}

export function useAdminUsers() {
  return useSuspenseQuery(adminUsersQueryOptions());
}
