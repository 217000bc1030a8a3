import { useQuery, type QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { SectionErrorBoundary } from '../../components/errors/error-boundary';
import { useSignedInUser } from '../../features/auth/api/get-me';
import { boardQueryOptions, useBoard } from '../../features/boards/api/get-board';
import { netsQueryOptions } from '../../features/boards/api/get-nets';
import { BoardHeader } from '../../features/boards/components/board-header';
import { BoardNets } from '../../features/boards/components/board-nets';
import { RailSearchBox } from '../../features/rails/components/rail-search-box';
import { hasRole } from '../../lib/roles';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const slug = params.slug ?? '';
    await Promise.all([
      queryClient.ensureQueryData(boardQueryOptions(slug)),
      queryClient.ensureQueryData(netsQueryOptions(slug)),
    ]);
    return null;
  };

export default function BoardRoute() {
  const slug = useParams().slug ?? '';
  const { data: board } = useBoard(slug);
  // Already loaded for the nets table below; its errors are shown there, not here.
  const nets = useQuery(netsQueryOptions(slug)).data?.nets;
  const canImport = hasRole(useSignedInUser(), 'admin');
  return (
    <>
      <title>{`${board.title} · Railyard`}</title>
      <BoardHeader
        board={board}
        search={<RailSearchBox slug={slug} nets={nets} />}
        canImport={canImport}
      />
      <SectionErrorBoundary title="Could not show the nets" resetKeys={[slug]}>
        {/* Keyed by board: filter, order and paging start fresh on another board. */}
        <BoardNets key={slug} slug={slug} />
      </SectionErrorBoundary>
    </>
  );
}
