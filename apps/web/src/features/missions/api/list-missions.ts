import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { missionListSchema, type MissionList, type MissionListQuery } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/missions`: the missions the user belongs to, filtered by regime and a search text. */
export function listMissions(query: MissionListQuery, signal?: AbortSignal): Promise<MissionList> {
  return apiRequest('/api/missions', missionListSchema, { query: { regime: query.regime, q: query.q }, signal });
}

/** Query options of a mission list; the only place its key is written. */
export function missionsQueryOptions(query: MissionListQuery) {
  // Normalised so that "no search" has one key whatever the caller passed.
  const q = query.q?.trim() || undefined;
  const normalised: MissionListQuery = { regime: query.regime, q };
  return queryOptions({
    queryKey: ['missions', 'list', normalised] as const,
    queryFn: ({ signal }) => listMissions(normalised, signal),
  });
}

/** The missions matching `query`; the previous list stays on screen while a new filter loads. */
export function useMissions(query: MissionListQuery) {
  return useQuery({ ...missionsQueryOptions(query), placeholderData: keepPreviousData });
}
