// A part's page: its pins and the nets they sit on, and the write-ups that name it. Parts named in
// case text link here.
import type { QueryClient } from '@tanstack/react-query';
import { redirect, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { SectionErrorBoundary } from '../../components/errors/error-boundary';
import { LinkButton } from '../../components/ui/button';
import { paths } from '../../config/paths';
import { boardQueryOptions, useBoard } from '../../features/boards/api/get-board';
import {
  componentQueryKey,
  componentQueryOptions,
  useComponent,
} from '../../features/boards/api/get-component';
import { BoardPlacementPanel } from '../../features/boards/components/board-placement-map';
import { ComponentHeader } from '../../features/boards/components/component-header';
import { ComponentPinsTable } from '../../features/boards/components/component-pins-table';
import { componentCasesQueryOptions } from '../../features/casebook/api/get-component-cases';
import {
  ComponentCasesPanel,
  componentCasesShown,
} from '../../features/casebook/components/component-cases-panel';
import { PartPowerLinks } from '../../features/power-tree/components/part-power-links';
import { useSignedInUser } from '../../lib/viewer';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const slug = params.slug ?? '';
    const refdes = params.refdes ?? '';
    // The cases list fills in by itself; only the part and the board's title are awaited.
    void queryClient.prefetchQuery(componentCasesQueryOptions(slug, refdes, componentCasesShown));
    const [, detail] = await Promise.all([
      queryClient.ensureQueryData(boardQueryOptions(slug)),
      queryClient.ensureQueryData(componentQueryOptions(slug, refdes)),
    ]);
    // Opened as "u1" from a hand-typed link: show the board's spelling, without asking again.
    if (detail.component.refdes !== refdes) {
      queryClient.setQueryData(componentQueryKey(slug, detail.component.refdes), detail);
      return redirect(paths.component.getHref(slug, detail.component.refdes));
    }
    return null;
  };

function WriteUpLink({ slug, refdes }: { slug: string; refdes: string }) {
  const viewer = useSignedInUser();
  const href = paths.newCase.getHref(slug, { component: refdes });
  if (viewer) {
    return (
      <LinkButton variant="primary" size="sm" to={href}>
        Write up a case
      </LinkButton>
    );
  }
  // undefined while the session is not known yet: neither control flashes in
  if (viewer === null) {
    return (
      <a href={paths.signIn.getHref(href)} className="text-[13px] text-ink-muted hover:text-accent">
        Sign in to write up a case
      </a>
    );
  }
  return null;
}

export default function ComponentRoute() {
  const params = useParams();
  const slug = params.slug ?? '';
  const { data: board } = useBoard(slug);
  const { data: detail } = useComponent(slug, params.refdes ?? '');
  const refdes = detail.component.refdes;
  return (
    <>
      <title>{`${refdes} · ${board.title} · Railyard`}</title>
      <ComponentHeader
        board={board}
        detail={detail}
        actions={<WriteUpLink slug={slug} refdes={refdes} />}
      />
      <div className="grid items-start gap-3 px-4 pt-3 pb-6 lg:grid-cols-[minmax(0,36rem)_minmax(0,1fr)]">
        <div className="space-y-3">
          <ComponentPinsTable slug={slug} refdes={refdes} pins={detail.component.pins} />
          <PartPowerLinks slug={slug} refdes={refdes} links={detail.powerLinks} />
        </div>
        <div className="min-w-0 space-y-3">
          <SectionErrorBoundary title="Could not draw the board" resetKeys={[slug, refdes]}>
            <BoardPlacementPanel key={refdes} slug={slug} marked={[refdes]} />
          </SectionErrorBoundary>
          <SectionErrorBoundary title="Could not show the cases" resetKeys={[slug, refdes]}>
            <ComponentCasesPanel slug={slug} refdes={refdes} />
          </SectionErrorBoundary>
        </div>
      </div>
    </>
  );
}
