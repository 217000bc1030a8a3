// The saved versions of one case.
import type { QueryClient } from '@tanstack/react-query';
import { Link, redirect, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/layout/page-header';
import { paths } from '../../config/paths';
import { caseQueryOptions, useCase } from '../../features/casebook/api/get-case';
import { revisionsQueryOptions, useRevisions } from '../../features/casebook/api/get-revisions';
import { caseIdOf } from '../../features/casebook/case-id';
import { CaseHistory } from '../../features/casebook/components/case-history';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = caseIdOf(params.id);
    const revisions = queryClient.ensureQueryData(revisionsQueryOptions(id));
    const detail = await queryClient.ensureQueryData(caseQueryOptions(id));
    // A merged case's history goes on with the case it was merged into, which keeps its write-up.
    if (detail.id !== id) {
      revisions.catch(() => undefined);
      queryClient.setQueryData(caseQueryOptions(detail.id).queryKey, detail);
      return redirect(paths.caseHistory.getHref(detail.id));
    }
    await revisions;
    return null;
  };

export default function CaseHistoryRoute() {
  const id = caseIdOf(useParams().id);
  const { data: detail } = useCase(id);
  const { data: revisions } = useRevisions(id);
  return (
    <div className="mx-auto max-w-5xl px-4 py-5">
      <title>{`History of “${detail.title}” · Railyard`}</title>
      <PageHeader
        title={
          <>
            History of{' '}
            <Link to={paths.case.getHref(id)} className="text-accent hover:underline">
              {detail.title}
            </Link>
          </>
        }
        description={`${revisions.length} saved ${revisions.length === 1 ? 'version' : 'versions'}, newest first. Only the author edits a case; every save is kept.`}
      />
      <CaseHistory revisions={revisions} />
    </div>
  );
}
