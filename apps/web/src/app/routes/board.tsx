import { useQuery, type QueryClient } from '@tanstack/react-query';
import { Navigate, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { SectionErrorBoundary } from '../../components/errors/error-boundary';
import { paths } from '../../config/paths';
import { useSignedInUser } from '../../lib/viewer';
import { boardQueryOptions, useBoard } from '../../features/boards/api/get-board';
import { netsQueryOptions } from '../../features/boards/api/get-nets';
import { BoardHeader } from '../../features/boards/components/board-header';
import { BoardNets } from '../../features/boards/components/board-nets';
import { RailSearchBox } from '../../features/rails/components/rail-search-box';
import { hasRole } from '../../lib/roles';

// Case text once linked parts as /boards/:slug?component=R1. Such an address now hands over to the
// part's page, replacing itself in the history so that Back does not bounce off it again. The
// hand-over happens once the address is in the history: a loader's redirect during an in-app
// navigation would replace the page the reader came from instead.
const oldPartLink = (search: URLSearchParams) => search.get('component') || null;

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    const slug = params.slug ?? '';
    if (oldPartLink(new URL(request.url).searchParams)) return null;
    await Promise.all([
      queryClient.ensureQueryData(boardQueryOptions(slug)),
      queryClient.ensureQueryData(netsQueryOptions(slug)),
    ]);
    return null;
  };

export default function BoardRoute() {
  const slug = useParams().slug ?? '';
  const refdes = oldPartLink(useSearchParams()[0]);
  if (refdes) return <Navigate replace to={paths.component.getHref(slug, refdes)} />;
  return <BoardPage slug={slug} />;
}

function BoardPage({ slug }: { slug: string }) {
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
