// Where notification e-mails go and how often; every mail links here.
import type { QueryClient } from '@tanstack/react-query';
import { Suspense } from 'react';
import { SectionErrorBoundary } from '../../components/errors/error-boundary';
import { PageHeader } from '../../components/layout/page-header';
import { meQueryOptions, useSignedInUser } from '../../lib/viewer';
import { RoleGate } from '../../features/auth/components/role-gate';
import { notificationSettingsQueryOptions } from '../../features/notifications/api/get-notification-settings';
import { NotificationSettingsForm } from '../../features/notifications/components/notification-settings-form';
import { hasRole } from '../../lib/roles';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  // A visitor gets the page's sign-in notice, without a request that would be refused.
  if (me.user) {
    await queryClient.ensureQueryData(notificationSettingsQueryOptions(me.user.id));
  }
  return null;
};

export default function NotificationSettingsRoute() {
  const user = useSignedInUser();
  return (
    <div className="mx-auto max-w-2xl px-4 py-5">
      <title>E-mail settings · Railyard</title>
      <PageHeader
        title="E-mail settings"
        description="Railyard e-mails you when something happens to the cases you wrote up. Choose how much of it you want."
      />
      <RoleGate needed="member" action="Choosing what Railyard e-mails you">
        {user && (
          <SectionErrorBoundary title="Could not read your e-mail settings">
            <Suspense
              fallback={
                <div aria-busy="true" className="h-64 animate-pulse rounded-lg bg-surface">
                  <span className="sr-only">Loading your e-mail settings…</span>
                </div>
              }
            >
              <NotificationSettingsForm userId={user.id} moderates={hasRole(user, 'moderator')} />
            </Suspense>
          </SectionErrorBoundary>
        )}
      </RoleGate>
    </div>
  );
}
