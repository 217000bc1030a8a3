import type { CaseSummary } from '@railyard/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { boardCasesQueryKey } from './case-keys';

export type NetCasesResponse = {
  board: string;
  net: string;
  page: number;
  pageSize: number;
  total: number;
  cases: (CaseSummary & { relevance: number | null })[];
};

/** Published cases that name the net, best rated first (the API ranks them). */
export function getNetCases(
  slug: string,
  net: string,
  pageSize: number,
  signal?: AbortSignal,
): Promise<NetCasesResponse> {
  return api.get<NetCasesResponse>(
    `/boards/${encodeURIComponent(slug)}/nets/${encodeURIComponent(net)}/cases`,
    { params: { pageSize }, signal },
  );
}

export function netCasesQueryOptions(slug: string, net: string, pageSize: number) {
  return queryOptions({
    queryKey: [...boardCasesQueryKey(slug), 'net', net, { pageSize }] as const,
    queryFn: ({ signal }) => getNetCases(slug, net, pageSize, signal),
    staleTime: 30_000,
  });
}

/** Not a suspense query: the net page does not wait for its cases. */
export function useNetCases(slug: string, net: string, pageSize: number) {
  return useQuery(netCasesQueryOptions(slug, net, pageSize));
}
