import type { QueryClient } from '@tanstack/react-query';
import { PageHeader } from '../../components/layout/page-header';
import { LinkButton } from '../../components/ui/button';
import { paths } from '../../config/paths';
import { hasRole } from '../../lib/roles';
import { useSignedInUser } from '../../lib/viewer';
import { boardsQueryOptions } from '../../features/boards/api/get-boards';
import { BoardList } from '../../features/boards/components/board-list';

export const clientLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(boardsQueryOptions());
  return null;
};

export default function BoardsRoute() {
  // Importing needs the admin role; the API checks it again.
  const canImport = hasRole(useSignedInUser(), 'admin');
  return (
    <div className="mx-auto max-w-6xl px-4 py-5">
      <title>Boards · Railyard</title>
      <PageHeader
        title="Boards"
        description="Every imported board with its nets, parts and the rail power enters by."
        actions={
          canImport && (
            <LinkButton variant="primary" size="sm" to={paths.newBoardImport.getHref()}>
              Import a board
            </LinkButton>
          )
        }
      />
      <BoardList canImport={canImport} />
    </div>
  );
}
