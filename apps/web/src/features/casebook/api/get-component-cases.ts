import type { CaseSummary } from '@railyard/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { boardCasesQueryKey } from './case-keys';

export type ComponentCasesResponse = {
  board: string;
  /** the board's own spelling of the refdes asked for */
  refdes: string;
  /** solved published cases that name the part as the culprit */
  solvedAsCulprit: number;
  page: number;
  pageSize: number;
  total: number;
  cases: (CaseSummary & { relevance: number | null })[];
};

/** Published cases that name the part, culprit or not, best rated first (the API ranks them). */
export function getComponentCases(
  slug: string,
  refdes: string,
  pageSize: number,
  signal?: AbortSignal,
): Promise<ComponentCasesResponse> {
  return api.get<ComponentCasesResponse>(
    `/boards/${encodeURIComponent(slug)}/components/${encodeURIComponent(refdes)}/cases`,
    { params: { pageSize }, signal },
  );
}

// Under the board's case lists, so a case written or voted on re-ranks this list too.
export function componentCasesQueryOptions(slug: string, refdes: string, pageSize: number) {
  return queryOptions({
    queryKey: [...boardCasesQueryKey(slug), 'component', refdes, { pageSize }] as const,
    queryFn: ({ signal }) => getComponentCases(slug, refdes, pageSize, signal),
    staleTime: 30_000,
  });
}

/** Not a suspense query: the part's page does not wait for its cases. */
export function useComponentCases(slug: string, refdes: string, pageSize: number) {
  return useQuery(componentCasesQueryOptions(slug, refdes, pageSize));
}
