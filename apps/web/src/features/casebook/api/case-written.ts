import type { CaseDetail } from '@railyard/shared';
import type { QueryClient } from '@tanstack/react-query';
import { boardCasesQueryKey, caseQueryKey } from './case-keys';

/**
 * After a case was written or changed: its page shows the API's answer at once, and every list of
 * its board (case list, rail panels, duplicate suggestions) and its history go stale.
 */
export function refreshWrittenCase(
  queryClient: QueryClient,
  slug: string,
  written: CaseDetail,
): Promise<unknown> {
  queryClient.setQueryData(caseQueryKey(written.id), written);
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: boardCasesQueryKey(slug) }),
    queryClient.invalidateQueries({ queryKey: [...caseQueryKey(written.id), 'revisions'] }),
  ]);
}
