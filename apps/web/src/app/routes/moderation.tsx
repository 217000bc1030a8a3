// The moderators' page: reports of cases and comments sent by members, open and resolved.
import type { QueryClient } from '@tanstack/react-query';
import { Suspense } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { SectionErrorBoundary } from '../../components/errors/error-boundary';
import { PageHeader } from '../../components/layout/page-header';
import { SectionLoading } from '../../components/layout/section-loading';
import { meQueryOptions } from '../../lib/viewer';
import { RoleGate } from '../../features/auth/components/role-gate';
import { flagsQueryOptions } from '../../features/moderation/api/get-flags';
import { FlagQueue, FlagQueueTabs } from '../../features/moderation/components/flag-queue';
import { flagStatusOf } from '../../features/moderation/flag-queue';
import { hasRole } from '../../lib/roles';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    // Anyone else gets the page's "needs the moderator role" message, without asking for a refusal.
    if (hasRole(me.user, 'moderator')) {
      await queryClient.ensureQueryData(
        flagsQueryOptions(flagStatusOf(new URL(request.url).searchParams)),
      );
    }
    return null;
  };

export default function ModerationRoute() {
  const [search] = useSearchParams();
  const status = flagStatusOf(search);
  return (
    <div className="mx-auto max-w-7xl px-4 py-5">
      <title>Moderation · Railyard</title>
      <PageHeader
        title="Moderation"
        description="Cases and comments members reported. Open one to read it in place and act there (hide, lock, merge), then resolve the report with what you did."
      />
      <RoleGate needed="moderator" action="The moderation queue">
        <FlagQueueTabs status={status} />
        <SectionErrorBoundary title="Could not list the reports" resetKeys={[status]}>
          <Suspense fallback={<SectionLoading label="Loading the reports…" />}>
            <FlagQueue status={status} />
          </Suspense>
        </SectionErrorBoundary>
      </RoleGate>
    </div>
  );
}
