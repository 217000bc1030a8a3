import type { NetDetail } from '@railyard/shared';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** One net with its place in the power tree; `name` may be the printed name or an alias. */
export function getNetDetail(slug: string, name: string, signal?: AbortSignal): Promise<NetDetail> {
  return api.get<NetDetail>(
    `/boards/${encodeURIComponent(slug)}/nets/${encodeURIComponent(name)}`,
    { signal },
  );
}

// Under the board's key (['boards', slug]), so an import into the board makes it stale too.
export function netDetailQueryKey(slug: string, name: string) {
  return ['boards', slug, 'nets', name] as const;
}

export function netDetailQueryOptions(slug: string, name: string) {
  return queryOptions({
    queryKey: netDetailQueryKey(slug, name),
    queryFn: ({ signal }) => getNetDetail(slug, name, signal),
  });
}

export function useNetDetail(slug: string, name: string) {
  return useSuspenseQuery(netDetailQueryOptions(slug, name));
}
