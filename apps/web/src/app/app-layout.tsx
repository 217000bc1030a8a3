// The shell of every page with what depends on who is signed in: the account corner, the sign-in
// notice and the actions only some roles have. Composed here, where features may meet.
import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { AppShell } from '../components/layout/app-shell';
import { adminQueryKey } from '../features/admin/api/get-admin-users';
import { useSignedInUser } from '../lib/viewer';
import { SignInNotice } from '../features/auth/components/sign-in-notice';
import { UserMenu } from '../features/auth/components/user-menu';
import { useMailboxAvailable } from '../features/mailbox/api/get-mailbox';
import { moderationQueryKey } from '../features/moderation/api/get-flags';
import { hasRole } from '../lib/roles';

export function AppLayout() {
  const user = useSignedInUser();
  const queryClient = useQueryClient();
  const hasMailbox = useMailboxAvailable();
  // What only an admin or a moderator could read must not stay in memory for whoever uses the browser next.
  const dropPrivileged = useCallback(() => {
    queryClient.removeQueries({ queryKey: adminQueryKey });
    queryClient.removeQueries({ queryKey: moderationQueryKey });
  }, [queryClient]);
  return (
    <AppShell
      account={<UserMenu onSignedOut={dropPrivileged} hasMailbox={hasMailbox} />}
      notice={<SignInNotice />}
      canImport={hasRole(user, 'admin')}
    />
  );
}
