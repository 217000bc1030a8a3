import type { ComponentDetail } from '@railyard/shared';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { boardQueryKey } from './get-board';

/** One part with its pins in natural order and its record in the casebook. `refdes` in any case. */
export function getComponent(
  slug: string,
  refdes: string,
  signal?: AbortSignal,
): Promise<ComponentDetail> {
  return api.get<ComponentDetail>(
    `/boards/${encodeURIComponent(slug)}/components/${encodeURIComponent(refdes)}`,
    { signal },
  );
}

export function componentQueryKey(slug: string, refdes: string) {
  return [...boardQueryKey(slug), 'components', refdes] as const;
}

export function componentQueryOptions(slug: string, refdes: string) {
  return queryOptions({
    queryKey: componentQueryKey(slug, refdes),
    queryFn: ({ signal }) => getComponent(slug, refdes, signal),
    // The casebook counts change with every case written, which refreshes the case lists but not
    // board data: each visit shows what is cached at once and asks again.
    staleTime: 0,
  });
}

export function useComponent(slug: string, refdes: string) {
  return useSuspenseQuery(componentQueryOptions(slug, refdes));
}
