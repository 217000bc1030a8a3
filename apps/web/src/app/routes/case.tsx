// One case: the write-up, its readings, and what peers made of it.
import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { caseQueryOptions, useCase } from '../../features/casebook/api/get-case';
import { commentsQueryOptions } from '../../features/casebook/api/get-comments';
import { caseIdOf } from '../../features/casebook/case-id';
import { CaseView } from '../../features/casebook/components/case-view';
import { useViewer } from '../../lib/viewer';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = caseIdOf(params.id);
    void queryClient.prefetchQuery(commentsQueryOptions(id));
    await queryClient.ensureQueryData(caseQueryOptions(id));
    return null;
  };

export default function CaseRoute() {
  const id = caseIdOf(useParams().id);
  const { data: detail } = useCase(id);
  const viewer = useViewer();
  return (
    <>
      <title>{`${detail.title} · ${detail.board.title} · Railyard`}</title>
      <CaseView key={detail.id} detail={detail} viewer={viewer} />
    </>
  );
}
