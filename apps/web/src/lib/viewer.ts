// Who is reading the page, for features that show or hide controls by role or by authorship. It reads
// the same cached answer as the account corner (query key ['me'], GET /api/me), so a sign-out, which
// sets that answer, and a refusal that reloads it reach every feature at once.
import type { MeResponse, SessionUser } from '@railyard/shared';
import { useQuery } from '@tanstack/react-query';
import { api } from './api-client';

/** Must stay the key the sign-in feature caches /api/me under. */
export const viewerQueryKey = ['me'] as const;

/**
 * The signed-in person: null when signed out (or when the API could not say), undefined while the
 * answer is not in yet, so controls that need a role neither flash in nor flash out.
 */
export function useViewer(): SessionUser | null | undefined {
  const { data, isError } = useQuery({
    queryKey: viewerQueryKey,
    queryFn: ({ signal }) => api.get<MeResponse>('/me', { signal }),
    staleTime: 5 * 60_000,
  });
  if (data) return data.user;
  return isError ? null : undefined;
}
