// A board's casebook: the write-ups of repairs of this board, filtered and searched.
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { SectionErrorBoundary } from '../../components/errors/error-boundary';
import { PageHeader } from '../../components/layout/page-header';
import { LinkButton } from '../../components/ui/button';
import { paths } from '../../config/paths';
import { boardQueryOptions, useBoard } from '../../features/boards/api/get-board';
import { netsQueryOptions } from '../../features/boards/api/get-nets';
import { boardCasesQueryOptions } from '../../features/casebook/api/get-board-cases';
import { filtersFromSearch } from '../../features/casebook/case-list-params';
import { CaseList } from '../../features/casebook/components/case-list';
import { useSignedInUser } from '../../lib/viewer';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    const slug = params.slug ?? '';
    const filters = filtersFromSearch(new URL(request.url).searchParams);
    // The list's own errors (an unknown net in the filter) are shown in the list, not as the page's.
    void queryClient.prefetchQuery(boardCasesQueryOptions(slug, filters));
    void queryClient.prefetchQuery(netsQueryOptions(slug));
    await queryClient.ensureQueryData(boardQueryOptions(slug));
    return null;
  };

export default function BoardCasesRoute() {
  const slug = useParams().slug ?? '';
  const { data: board } = useBoard(slug);
  // The net filter works without them until they arrive.
  const nets = useQuery(netsQueryOptions(slug)).data?.nets;
  const viewer = useSignedInUser();
  return (
    <div className="mx-auto max-w-6xl px-4 py-5">
      <title>{`Cases · ${board.title} · Railyard`}</title>
      <PageHeader
        title={
          <>
            Cases on{' '}
            <Link to={paths.board.getHref(slug)} className="text-accent hover:underline">
              {board.title}
            </Link>
          </>
        }
        description="Repairs of this board, written up by the technicians who did them: symptom, readings, culprit and fix. Best rated first."
        actions={
          viewer ? (
            <LinkButton variant="primary" size="sm" to={paths.newCase.getHref(slug)}>
              Write up a repair
            </LinkButton>
          ) : viewer === null ? (
            <a
              href={paths.signIn.getHref(paths.newCase.getHref(slug))}
              className="text-[13px] text-ink-muted hover:text-accent"
            >
              Sign in to write up a repair
            </a>
          ) : null
        }
      />
      <SectionErrorBoundary title="Could not show the cases" resetKeys={[slug]}>
        <CaseList key={slug} slug={slug} nets={nets} signedIn={viewer != null} />
      </SectionErrorBoundary>
    </div>
  );
}
