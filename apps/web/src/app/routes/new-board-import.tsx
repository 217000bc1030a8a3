import type { ImportJob } from '@railyard/shared';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { PageHeader } from '../../components/layout/page-header';
import { RoleGate } from '../../features/auth/components/role-gate';
import { boardsQueryKey } from '../../features/boards/api/get-boards';
import { ImportForm } from '../../features/imports/components/import-form';

export default function NewBoardImportRoute() {
  const queryClient = useQueryClient();
  const onSucceeded = useCallback(
    (_job: ImportJob) => void queryClient.invalidateQueries({ queryKey: boardsQueryKey }),
    [queryClient],
  );
  return (
    <div className="mx-auto max-w-6xl px-4 py-5">
      <title>Import a board · Railyard</title>
      <PageHeader
        title="Import a new board"
        description="Name the board, then upload its netlist. Parts list and annotations can come now or with a later import."
      />
      <RoleGate needed="admin" action="Importing boards">
        <ImportForm target={{ kind: 'new' }} onSucceeded={onSucceeded} />
      </RoleGate>
    </div>
  );
}
