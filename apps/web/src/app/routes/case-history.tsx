// The saved versions of one case.
import type { QueryClient } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
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
    await Promise.all([
      queryClient.ensureQueryData(caseQueryOptions(id)),
      queryClient.ensureQueryData(revisionsQueryOptions(id)),
    ]);
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
