// Changing one's own write-up. Only the author edits a case; the API checks it again.
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/layout/page-header';
import { LinkButton } from '../../components/ui/button';
import { paths } from '../../config/paths';
import { RoleGate } from '../../features/auth/components/role-gate';
import { netsQueryOptions } from '../../features/boards/api/get-nets';
import { boardPartsQueryOptions } from '../../features/casebook/api/get-board-parts';
import { caseQueryOptions, useCase } from '../../features/casebook/api/get-case';
import { caseIdOf } from '../../features/casebook/case-id';
import { CaseEditor } from '../../features/casebook/components/case-editor';
import { useSignedInUser } from '../../lib/viewer';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = caseIdOf(params.id);
    const detail = await queryClient.ensureQueryData(caseQueryOptions(id));
    void queryClient.prefetchQuery(netsQueryOptions(detail.board.slug));
    void queryClient.prefetchQuery(boardPartsQueryOptions(detail.board.slug));
    return null;
  };

export default function EditCaseRoute() {
  const id = caseIdOf(useParams().id);
  const { data: detail } = useCase(id);
  const slug = detail.board.slug;
  const nets = useQuery(netsQueryOptions(slug)).data?.nets;
  const viewer = useSignedInUser();
  const navigate = useNavigate();
  return (
    <div className="mx-auto max-w-7xl px-4 py-5">
      <title>{`Edit “${detail.title}” · Railyard`}</title>
      <PageHeader
        title={
          <>
            Edit{' '}
            <Link to={paths.case.getHref(id)} className="text-accent hover:underline">
              {detail.title}
            </Link>
          </>
        }
        description={
          <>
            On{' '}
            <Link to={paths.board.getHref(slug)} className="hover:text-accent hover:underline">
              {detail.board.title}
            </Link>
            .{' '}
            {detail.status === 'published'
              ? 'Published; every save is kept in its history.'
              : 'A draft: only you see it.'}
          </>
        }
      />
      <RoleGate needed="member" action="Editing a case">
        {viewer && viewer.id !== detail.author.id ? (
          <section className="rounded-lg border border-line bg-surface px-5 py-4">
            <h2 className="text-base font-semibold">Only the author edits a case</h2>
            <p className="mt-1.5 text-sm text-ink-muted">
              This write-up is {detail.author.name || detail.author.login}’s. To add to it, comment
              on it, or say it worked for you.
            </p>
            <LinkButton size="sm" className="mt-3" to={paths.case.getHref(id)}>
              Back to the case
            </LinkButton>
          </section>
        ) : (
          <CaseEditor
            key={detail.id}
            slug={slug}
            boardNets={nets}
            existing={detail}
            cancelHref={paths.case.getHref(id)}
            onSaved={(saved) => void navigate(paths.case.getHref(saved.id))}
            onDeleted={() => navigate(paths.boardCases.getHref(slug, { drafts: '1' }))}
          />
        )}
      </RoleGate>
    </div>
  );
}
