import type { ImportJob } from '@railyard/shared';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/layout/page-header';
import { paths } from '../../config/paths';
import { RoleGate } from '../../features/auth/components/role-gate';
import { boardQueryKey, boardQueryOptions, useBoard } from '../../features/boards/api/get-board';
import { boardsQueryKey } from '../../features/boards/api/get-boards';
import { ImportForm } from '../../features/imports/components/import-form';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(boardQueryOptions(params.slug ?? ''));
    return null;
  };

export default function BoardImportRoute() {
  const slug = useParams().slug ?? '';
  const { data: board } = useBoard(slug);
  const queryClient = useQueryClient();
  const onSucceeded = useCallback(
    (_job: ImportJob) => {
      // The list shows counts too, so both the list and everything under this board go stale.
      void queryClient.invalidateQueries({ queryKey: boardQueryKey(slug) });
      void queryClient.invalidateQueries({ queryKey: boardsQueryKey, exact: true });
    },
    [queryClient, slug],
  );
  return (
    <div className="mx-auto max-w-6xl px-4 py-5">
      <title>{`Import into ${board.title} · Railyard`}</title>
      <PageHeader
        title={
          <>
            Import a netlist into{' '}
            <Link to={paths.board.getHref(slug)} className="text-accent hover:underline">
              {board.title}
            </Link>
          </>
        }
        description="A board keeps one netlist. To load a new revision of it, tick “Replace the netlist”."
      />
      <RoleGate needed="admin" action="Importing boards">
        <ImportForm
          target={{ kind: 'existing', slug, title: board.title, netCount: board.netCount }}
          onSucceeded={onSucceeded}
        />
      </RoleGate>
    </div>
  );
}
