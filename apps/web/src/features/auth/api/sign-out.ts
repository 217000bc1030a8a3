import type { MeResponse } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/viewer';

export function signOut(): Promise<void> {
  return api.post<void>('/auth/logout');
}

/** Ends the session; the page stays where it is and shows itself signed out. */
export function useSignOut(options: { onSignedOut?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      queryClient.setQueryData<MeResponse>(meQueryKey, { user: null });
      options.onSignedOut?.();
    },
  });
}
