// Who is reading the page: the account corner, sign-in notices and every feature that shows or hides
// controls by role or by authorship read this one cached answer (GET /api/me), so a sign-out, which
// sets it, and a refusal that reloads it reach them all at once.
import type { MeResponse, SessionUser } from '@railyard/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from './api-client';

/** Who is signed in on this browser; `user` is null when nobody is. */
export function getMe(signal?: AbortSignal): Promise<MeResponse> {
  return api.get<MeResponse>('/me', { signal });
}

export const meQueryKey = ['me'] as const;

export function meQueryOptions() {
  return queryOptions({
    queryKey: meQueryKey,
    queryFn: ({ signal }) => getMe(signal),
    // Sign-in and sign-out are page navigations or set this query themselves, and an answer that
    // says the session changed (401, 403) reloads it; refetching often would only add requests.
    staleTime: 5 * 60_000,
  });
}

/** Not a suspense query: the top bar and the edit controls show once the answer is in. */
export function useMe() {
  return useQuery(meQueryOptions());
}

/**
 * The signed-in person: null when signed out (or when the API could not say), undefined while the
 * answer is not in yet, so controls that need a role neither flash in nor flash out.
 */
export function useSignedInUser(): SessionUser | null | undefined {
  const { data, isError } = useMe();
  if (data) return data.user;
  return isError ? null : undefined;
}
