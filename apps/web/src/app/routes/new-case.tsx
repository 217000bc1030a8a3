// Writing up a repair of a board. Opened from a net's page, the case starts with that net picked.
import { useQuery, type QueryClient } from '@tanstack/react-query';
import {
  Link,
  useNavigate,
  useParams,
  useSearchParams,
  type LoaderFunctionArgs,
} from 'react-router-dom';
import { PageHeader } from '../../components/layout/page-header';
import { paths } from '../../config/paths';
import { RoleGate } from '../../features/auth/components/role-gate';
import { boardQueryOptions, useBoard } from '../../features/boards/api/get-board';
import { netsQueryOptions } from '../../features/boards/api/get-nets';
import { boardPartsQueryOptions } from '../../features/casebook/api/get-board-parts';
import { CaseEditor } from '../../features/casebook/components/case-editor';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const slug = params.slug ?? '';
    // The pickers fill in as their lists arrive; only the board's title is awaited.
    void queryClient.prefetchQuery(netsQueryOptions(slug));
    void queryClient.prefetchQuery(boardPartsQueryOptions(slug));
    await queryClient.ensureQueryData(boardQueryOptions(slug));
    return null;
  };

export default function NewCaseRoute() {
  const slug = useParams().slug ?? '';
  const [searchParams] = useSearchParams();
  const { data: board } = useBoard(slug);
  const nets = useQuery(netsQueryOptions(slug)).data?.nets;
  const navigate = useNavigate();
  const preset = {
    nets: searchParams.getAll('net').filter(Boolean),
    parts: searchParams.getAll('component').filter(Boolean),
  };
  return (
    <div className="mx-auto max-w-7xl px-4 py-5">
      <title>{`Write up a repair · ${board.title} · Railyard`}</title>
      <PageHeader
        title={
          <>
            Write up a repair of{' '}
            <Link to={paths.board.getHref(slug)} className="text-accent hover:underline">
              {board.title}
            </Link>
          </>
        }
        description="So the next technician with this board and this symptom finds the fix in minutes: what it did, what you measured, what was at fault and how you fixed it."
      />
      <RoleGate needed="member" action="Writing up a repair">
        <CaseEditor
          slug={slug}
          boardNets={nets}
          preset={preset}
          cancelHref={paths.boardCases.getHref(slug)}
          onSaved={(saved) => void navigate(paths.case.getHref(saved.id))}
        />
      </RoleGate>
    </div>
  );
}
