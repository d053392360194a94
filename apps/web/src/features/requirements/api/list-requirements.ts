import { queryOptions, useQuery } from '@tanstack/react-query';
import { missionRequirementListSchema, type MissionRequirementList } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/missions/:missionId/requirements`: the mission's requirements, in budget line order. */
export function listRequirements(missionId: string, signal?: AbortSignal): Promise<MissionRequirementList> {
  return apiRequest(`/api/missions/${encodeURIComponent(missionId)}/requirements`, missionRequirementListSchema, { signal });
}

/** Query options of a mission's requirements; the only place their key is written. */
export function requirementsQueryOptions(missionId: string) {
  return queryOptions({
    queryKey: ['missions', missionId, 'requirements'] as const,
    queryFn: ({ signal }) => listRequirements(missionId, signal),
  });
}

/** The requirements a mission holds its budget lines to. */
export function useRequirements(missionId: string) {
  return useQuery(requirementsQueryOptions(missionId));
}
