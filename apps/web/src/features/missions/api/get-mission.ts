import { queryOptions, useQuery } from '@tanstack/react-query';
import { missionDetailSchema, type MissionDetail } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/missions/:missionId`: one mission with its members; 404 when it does not exist or is not yours. */
export function getMission(missionId: string, signal?: AbortSignal): Promise<MissionDetail> {
  return apiRequest(`/api/missions/${encodeURIComponent(missionId)}`, missionDetailSchema, { signal });
}

/** Query options of one mission; the only place its key is written. */
export function missionQueryOptions(missionId: string) {
  return queryOptions({
    queryKey: ['missions', 'detail', missionId] as const,
    queryFn: ({ signal }) => getMission(missionId, signal),
  });
}

/** One mission with its members. */
export function useMission(missionId: string) {
  return useQuery(missionQueryOptions(missionId));
}
