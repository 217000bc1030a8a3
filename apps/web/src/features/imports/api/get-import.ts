import type { ImportJob, ImportJobStatus } from '@railyard/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export type ImportJobResponse = { job: ImportJob };

export function getImport(id: string, signal?: AbortSignal): Promise<ImportJobResponse> {
  return api.get<ImportJobResponse>(`/imports/${encodeURIComponent(id)}`, { signal });
}

export function isFinished(status: ImportJobStatus): boolean {
  return status === 'succeeded' || status === 'failed';
}

/** How often a running job is asked for its progress. */
const pollMs = 300;

export function importQueryOptions(id: string) {
  return queryOptions({
    queryKey: ['imports', id] as const,
    queryFn: ({ signal }) => getImport(id, signal),
    // A finished job never changes again; a running one is polled until it finishes.
    staleTime: (query) =>
      query.state.data && isFinished(query.state.data.job.status) ? Infinity : 0,
    refetchInterval: (query) =>
      query.state.data && isFinished(query.state.data.job.status) ? false : pollMs,
    refetchIntervalInBackground: true,
  });
}

export function useImport(id: string | null) {
  return useQuery({ ...importQueryOptions(id ?? ''), enabled: id !== null });
}
