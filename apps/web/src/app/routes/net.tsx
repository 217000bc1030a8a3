// A net's page: where it sits in the power tree, what it is coupled to, what hangs on it.
// Moving between nets keeps this route mounted, so the graph stays and only re-lights.
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { redirect, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { SectionErrorBoundary } from '../../components/errors/error-boundary';
import { paths } from '../../config/paths';
import { useSignedInUser } from '../../lib/viewer';
import { boardQueryOptions, useBoard } from '../../features/boards/api/get-board';
import { BoardPlacementPanel } from '../../features/boards/components/board-placement-map';
import { NetCasesPanel } from '../../features/casebook/components/net-cases-panel';
import { netsQueryOptions } from '../../features/boards/api/get-nets';
import {
  netDetailQueryKey,
  netDetailQueryOptions,
  useNetDetail,
} from '../../features/power-tree/api/get-net-detail';
import { powerTreeQueryOptions } from '../../features/power-tree/api/get-power-tree';
import { CoupledGroupPanel } from '../../features/power-tree/components/coupled-group-panel';
import { InjectionCaution } from '../../features/power-tree/components/injection-caution';
import { NetHeader } from '../../features/power-tree/components/net-header';
import { PowerLinksPanel } from '../../features/power-tree/components/power-links-panel';
import {
  PowerTreeSection,
  preloadPowerTreeGraph,
} from '../../features/power-tree/components/power-tree-section';
import { RailEditPanel } from '../../features/power-tree/components/rail-edit-panel';
import { RailPartsTable } from '../../features/power-tree/components/rail-parts-table';
import { RailSearchBox } from '../../features/rails/components/rail-search-box';
import { hasRole } from '../../lib/roles';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const slug = params.slug ?? '';
    const name = params.net ?? '';
    // Everything below the header starts now, in parallel; only the header's data is awaited.
    preloadPowerTreeGraph();
    void queryClient.prefetchQuery(netsQueryOptions(slug));
    const board = queryClient.ensureQueryData(boardQueryOptions(slug));
    void board
      .then((found) => {
        if (found.rootNet)
          return queryClient.prefetchQuery(powerTreeQueryOptions(slug, { from: 'root' }));
      })
      .catch(() => {});
    const [, detail] = await Promise.all([
      board,
      queryClient.ensureQueryData(netDetailQueryOptions(slug, name)),
    ]);
    // Opened by an alias: show the printed name in the URL, without asking the API again.
    if (detail.net.name !== name) {
      queryClient.setQueryData(netDetailQueryKey(slug, detail.net.name), detail);
      return redirect(paths.net.getHref(slug, detail.net.name));
    }
    return null;
  };

export default function NetRoute() {
  const params = useParams();
  const slug = params.slug ?? '';
  const name = params.net ?? '';
  const { data: board } = useBoard(slug);
  const { data: detail } = useNetDetail(slug, name);
  // The search box works without them until they arrive; the page does not wait.
  const nets = useQuery(netsQueryOptions(slug)).data?.nets;
  const navigate = useNavigate();
  const net = detail.net;
  // Editing is for moderators and admins; the API checks the role again on every edit.
  const user = useSignedInUser();
  const canEdit = hasRole(user, 'moderator');

  const openRail = useCallback(
    (rail: string) => {
      if (rail !== net.name) void navigate(paths.net.getHref(slug, rail));
    },
    [navigate, slug, net.name],
  );

  return (
    <>
      <title>{`${net.name} · ${board.title} · Railyard`}</title>
      <NetHeader board={board} detail={detail} search={<RailSearchBox slug={slug} nets={nets} />} />
      <div className="grid items-start gap-3 px-4 pt-3 pb-6 xl:grid-cols-[minmax(0,1fr)_24rem]">
        <SectionErrorBoundary title="Could not draw the power tree" resetKeys={[slug]}>
          {/* Keyed by board only: between rails of one board the graph stays and re-lights. */}
          <PowerTreeSection key={slug} slug={slug} detail={detail} onOpenRail={openRail} />
        </SectionErrorBoundary>
        <div className="space-y-3">
          <CoupledGroupPanel slug={slug} net={net.name} group={detail.coupledGroup} />
          <SectionErrorBoundary title="Could not show the cases" resetKeys={[slug, net.name]}>
            <NetCasesPanel slug={slug} net={net.name} />
          </SectionErrorBoundary>
          {/* Keyed by net: a resistance typed for one rail is not carried to the next. */}
          <InjectionCaution key={net.name} nominalVoltage={net.nominalVoltage} />
          <PowerLinksPanel slug={slug} linksIn={detail.linksIn} linksOut={detail.linksOut} />
          <SectionErrorBoundary title="Could not draw the board" resetKeys={[slug, net.name]}>
            <BoardPlacementPanel
              key={net.name}
              slug={slug}
              marked={detail.loads.parts.map((part) => part.refdes)}
              title={`Parts of ${net.name} on the board`}
            />
          </SectionErrorBoundary>
        </div>
        {canEdit && (
          <div className="min-w-0 xl:col-span-2">
            <RailEditPanel
              slug={slug}
              detail={detail}
              nets={nets}
              currentUserId={user?.id ?? null}
            />
          </div>
        )}
        <div className="min-w-0 xl:col-span-2">
          <SectionErrorBoundary title="Could not list the parts" resetKeys={[slug, net.name]}>
            {/* Keyed by net: filters and order start fresh on another rail. */}
            <RailPartsTable key={net.name} slug={slug} net={net.name} loads={detail.loads} />
          </SectionErrorBoundary>
        </div>
      </div>
    </>
  );
}
