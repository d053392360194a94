import { queryOptions, useQuery } from '@tanstack/react-query';
import { meshSummarySchema, type MeshSummary } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { meshApiPath } from './mesh-paths';

/** `GET /api/missions/:missionId/meshes/:meshId`: a mesh's summary (groups, area, bounds, checksum). */
export function getMesh(missionId: string, meshId: string, signal?: AbortSignal): Promise<MeshSummary> {
  return apiRequest(meshApiPath(missionId, meshId), meshSummarySchema, { signal });
}

/** Query options of one mesh (a mesh never changes once imported); the only place its key is written. */
export function meshQueryOptions(missionId: string, meshId: string) {
  return queryOptions({
    queryKey: ['missions', missionId, 'meshes', 'detail', meshId] as const,
    queryFn: ({ signal }) => getMesh(missionId, meshId, signal),
    staleTime: Infinity,
  });
}

/** One mesh's summary. */
export function useMesh(missionId: string, meshId: string, options: { enabled?: boolean } = {}) {
  return useQuery({ ...meshQueryOptions(missionId, meshId), enabled: options.enabled ?? true });
}
