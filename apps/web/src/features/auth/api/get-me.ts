import { hashKey, queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import { meResponseSchema, type User } from '@photon-ledger/shared';
import { ApiRequestError, apiRequest } from '../../../lib/api-client';

/** `GET /api/me`: the signed-in user, or null when there is no valid session (401). */
export async function getMe(signal?: AbortSignal): Promise<User | null> {
  try {
    const { user } = await apiRequest('/api/me', meResponseSchema, { signal });
    return user;
  } catch (error) {
    if (error instanceof ApiRequestError && error.status === 401) return null;
    throw error;
  }
}

/** Query options of the session; the only place its key is written. */
export function meQueryOptions() {
  return queryOptions({
    queryKey: ['auth', 'me'] as const,
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 60_000,
  });
}

/** The signed-in user (`data` is null when signed out). */
export function useMe() {
  return useQuery(meQueryOptions());
}

/**
 * Records who is signed in (null: nobody) and drops every other cached answer, so that nothing
 * fetched for one session is shown in another.
 */
export function setSessionUser(queryClient: QueryClient, user: User | null): void {
  const { queryKey } = meQueryOptions();
  const meHash = hashKey(queryKey);
  queryClient.removeQueries({ predicate: (query) => query.queryHash !== meHash });
  queryClient.setQueryData(queryKey, user);
}
