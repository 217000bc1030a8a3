// One case: the write-up, its readings, and what peers made of it.
import type { QueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { caseQueryOptions, useCase } from '../../features/casebook/api/get-case';
import { commentsQueryOptions } from '../../features/casebook/api/get-comments';
import { caseIdOf } from '../../features/casebook/case-id';
import { mergedRedirectHref } from '../../features/casebook/case-merge';
import { CaseView } from '../../features/casebook/components/case-view';
import { useSignedInUser } from '../../lib/viewer';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = caseIdOf(params.id);
    void queryClient.prefetchQuery(commentsQueryOptions(id));
    const detail = await queryClient.ensureQueryData(caseQueryOptions(id));
    // Merged into another case: the page moves there, which then needs no second request.
    if (detail.id !== id) queryClient.setQueryData(caseQueryOptions(detail.id).queryKey, detail);
    return null;
  };

export default function CaseRoute() {
  const id = caseIdOf(useParams().id);
  const { data: detail } = useCase(id);
  const viewer = useSignedInUser();
  const navigate = useNavigate();
  // A merged case's id answers with the case it was merged into: go to that case's own address,
  // and drop this address from the history (it would only lead there again).
  const redirect = mergedRedirectHref(id, detail);
  useEffect(() => {
    if (redirect) void navigate(redirect, { replace: true });
  }, [redirect, navigate]);
  return (
    <>
      <title>{`${detail.title} · ${detail.board.title} · Railyard`}</title>
      <CaseView key={detail.id} detail={detail} viewer={viewer} />
    </>
  );
}
