// Administration: who has which role, bans, and the audit log of every privileged action.
import type { QueryClient } from '@tanstack/react-query';
import { Suspense } from 'react';
import { SectionErrorBoundary } from '../../components/errors/error-boundary';
import { PageHeader } from '../../components/layout/page-header';
import { SectionLoading } from '../../components/layout/section-loading';
import { adminUsersQueryOptions } from '../../features/admin/api/get-admin-users';
import { auditLogQueryOptions } from '../../features/admin/api/get-audit-log';
import { AuditLog } from '../../features/admin/components/audit-log';
import { UsersTable } from '../../features/admin/components/users-table';
import { meQueryOptions, useSignedInUser } from '../../lib/viewer';
import { RoleGate } from '../../features/auth/components/role-gate';
import { hasRole } from '../../lib/roles';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  // Anyone else gets the page's "needs the admin role" message, without asking for refusals.
  if (hasRole(me.user, 'admin')) {
    await Promise.all([
      queryClient.ensureQueryData(adminUsersQueryOptions()),
      queryClient.ensureInfiniteQueryData(auditLogQueryOptions()),
    ]);
  }
  return null;
};

export default function AdminRoute() {
  const user = useSignedInUser();
  return (
    <div className="mx-auto max-w-7xl px-4 py-5">
      <title>Administration · Railyard</title>
      <PageHeader
        title="Administration"
        description="Who may do what on Railyard, and what privileged people did. Every change here needs a reason; the audit log keeps it."
      />
      <RoleGate needed="admin" action="The administration page">
        <div className="space-y-4">
          <SectionErrorBoundary title="Could not list the people">
            <Suspense fallback={<SectionLoading label="Loading the people…" />}>
              <UsersTable currentUserId={user?.id ?? null} />
            </Suspense>
          </SectionErrorBoundary>
          <SectionErrorBoundary title="Could not read the audit log">
            <Suspense fallback={<SectionLoading label="Loading the audit log…" />}>
              <AuditLog />
            </Suspense>
          </SectionErrorBoundary>
        </div>
      </RoleGate>
    </div>
  );
}
