import { queryOptions, useQuery } from '@tanstack/react-query';
import { publicConfigSchema, type PublicConfig } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/public-config`: what the sign-in page may know before sign-in (demo mode and accounts). */
export function getPublicConfig(signal?: AbortSignal): Promise<PublicConfig> {
  return apiRequest('/api/public-config', publicConfigSchema, { signal });
}

/** Query options of the public configuration; the only place its key is written. */
export function publicConfigQueryOptions() {
  return queryOptions({
    queryKey: ['public-config'] as const,
    queryFn: ({ signal }) => getPublicConfig(signal),
    // It changes only when the server restarts.
    staleTime: Infinity,
  });
}

/** The server's public configuration. */
export function usePublicConfig() {
  return useQuery(publicConfigQueryOptions());
}
