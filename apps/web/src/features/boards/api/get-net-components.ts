import type { ComponentListResponse } from '@railyard/shared';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { boardQueryKey } from './get-board';

/** The components with at least one pin on `net`. */
export function getNetComponents(
  slug: string,
  net: string,
  signal?: AbortSignal,
): Promise<ComponentListResponse> {
  return api.get<ComponentListResponse>(`/boards/${encodeURIComponent(slug)}/components`, {
    params: { net },
    signal,
  });
}

export function netComponentsQueryOptions(slug: string, net: string) {
  return queryOptions({
    queryKey: [...boardQueryKey(slug), 'components', { net }] as const,
    queryFn: ({ signal }) => getNetComponents(slug, net, signal),
  });
}

export function useNetComponents(slug: string, net: string) {
  return useSuspenseQuery(netComponentsQueryOptions(slug, net));
}
