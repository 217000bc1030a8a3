import type { PowerLinkRow } from '@railyard/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export type PowerLinksResponse = { links: PowerLinkRow[] };

/** The power links with `net` at either end, each with where it came from and who entered it. */
export function getPowerLinks(
  slug: string,
  net: string,
  signal?: AbortSignal,
): Promise<PowerLinksResponse> {
  return api.get<PowerLinksResponse>(`/boards/${encodeURIComponent(slug)}/power-links`, {
    params: { net },
    signal,
  });
}

// Under the board's key, so any edit or import of the board makes it stale too.
export function powerLinksQueryOptions(slug: string, net: string) {
  return queryOptions({
    queryKey: ['boards', slug, 'power-links', { net }] as const,
    queryFn: ({ signal }) => getPowerLinks(slug, net, signal),
  });
}

/** Not a suspense query: the edit area opens at once and the list fills in. */
export function usePowerLinks(slug: string, net: string) {
  return useQuery(powerLinksQueryOptions(slug, net));
}
