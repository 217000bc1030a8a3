import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-client';

/** A 4xx will answer the same way a second time; only network trouble and 5xx are retried. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

/**
 * Answers that mean the session is not what the page believes: it ended (401), the account was
 * banned, or the role was lowered since the page learnt it (403 forbidden). A refused cross-site
 * request says nothing about the session.
 */
export function saysSessionChanged(error: unknown): boolean {
  if (!isApiError(error)) return false;
  return error.status === 401 || (error.status === 403 && error.code !== 'cross_site_request');
}

type QueryClientOptions = {
  /** Called when an answer says the session changed, so whoever caches the user reloads it. */
  onSessionChanged?: (queryClient: QueryClient) => void;
};

export function createQueryClient(options: QueryClientOptions = {}): QueryClient {
  const onError = (error: unknown) => {
    if (saysSessionChanged(error)) options.onSessionChanged?.(queryClient);
  };
  const queryClient: QueryClient = new QueryClient({
    queryCache: new QueryCache({ onError }),
    mutationCache: new MutationCache({ onError }),
    defaultOptions: {
      queries: {
        // Board data changes only through an import or an edit, which invalidate what they touched.
        staleTime: 60_000,
        refetchOnWindowFocus: false,
        retry: shouldRetry,
      },
      mutations: { retry: false },
    },
  });
  return queryClient;
}
