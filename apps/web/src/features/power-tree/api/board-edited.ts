import type { QueryClient } from '@tanstack/react-query';

/**
 * After a moderator's edit of a board: everything cached under the board's key (['boards', slug]:
 * the board, its nets, every net page, every trace and the power-link lists), the list of boards
 * (it shows each root) and rail searches (they show kinds and voltages). Resolves once the queries
 * on screen have their new answers, so a form can say "saved" with the page already showing it.
 */
export async function refreshEditedBoard(queryClient: QueryClient, slug: string): Promise<void> {
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: ['boards', slug] }),
    queryClient.invalidateQueries({ queryKey: ['boards'], exact: true }),
    queryClient.invalidateQueries({ queryKey: ['search'] }),
  ]);
}
