import { QueryCache, QueryClient } from '@tanstack/react-query';
import { setSessionUser } from '../features/auth/api/get-me';
import { ApiRequestError } from '../lib/api-client';

/** Retries only what may pass on its own: no answer, or a server fault; never a 4xx. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (!(error instanceof ApiRequestError)) return false;
  return (error.status === 0 || error.status >= 500) && failureCount < 2;
}

/**
 * The app's query client. A 401 on any query means the session ended (expired, or signed out in
 * another tab): the session is cleared, so the guard sends the user to sign in and back again.
 */
export function createQueryClient(): QueryClient {
  const queryClient: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      onError: (error) => {
        if (error instanceof ApiRequestError && error.status === 401) setSessionUser(queryClient, null);
      },
    }),
    defaultOptions: {
      queries: { staleTime: 30_000, retry: shouldRetry },
      mutations: { retry: false },
    },
  });
  return queryClient;
}
