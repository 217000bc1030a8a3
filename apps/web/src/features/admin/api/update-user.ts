import type { AdminUser, UserRole } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { auditLogQueryKey } from './get-audit-log';
import { adminUsersQueryKey, type AdminUsersResponse } from './get-admin-users';

export type UserChange = { role?: UserRole; banned?: boolean; reason: string };

export function updateUser(id: number, change: UserChange): Promise<{ user: AdminUser }> {
  return api.patch<{ user: AdminUser }>(`/admin/users/${id}`, change);
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: number; change: UserChange }) => updateUser(id, change),
    onSuccess: async ({ user }) => {
      queryClient.setQueryData<AdminUsersResponse>(adminUsersQueryKey, (current) =>
        current
          ? { users: current.users.map((row) => (row.id === user.id ? user : row)) }
          : current,
      );
      // The change wrote its audit row; the log shows it once this resolves.
      await queryClient.invalidateQueries({ queryKey: auditLogQueryKey });
    },
  });
}
