import type { PowerTree, TreeDirection } from '@railyard/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** Where a drawn tree starts: the board's root downwards, or one net traced either way. */
export type TreeSource = { from: 'root' } | { from: 'net'; net: string; direction: TreeDirection };

/** Deep enough for every board we know of (the API allows 64); rails cut off say so. */
export const treeDepth = 32;

export function getPowerTree(
  slug: string,
  source: TreeSource,
  depth: number,
  signal?: AbortSignal,
): Promise<PowerTree> {
  const board = `/boards/${encodeURIComponent(slug)}`;
  if (source.from === 'root') {
    return api.get<PowerTree>(`${board}/tree`, { params: { direction: 'down', depth }, signal });
  }
  return api.get<PowerTree>(`${board}/nets/${encodeURIComponent(source.net)}/tree`, {
    params: { direction: source.direction, depth },
    signal,
  });
}

export function powerTreeQueryOptions(slug: string, source: TreeSource, depth = treeDepth) {
  const queryKey =
    source.from === 'root'
      ? (['boards', slug, 'tree', { direction: 'down', depth }] as const)
      : ([
          'boards',
          slug,
          'nets',
          source.net,
          'tree',
          { direction: source.direction, depth },
        ] as const);
  return queryOptions({
    queryKey,
    queryFn: ({ signal }) => getPowerTree(slug, source, depth, signal),
  });
}

/**
 * Not a suspense query: while another trace loads, the graph keeps showing the last one
 * instead of falling back to a placeholder and losing its layout.
 */
export function usePowerTree(slug: string, source: TreeSource) {
  return useQuery({ ...powerTreeQueryOptions(slug, source), placeholderData: keepPreviousData });
}
