import { queryOptions, useQuery } from '@tanstack/react-query';
import { meshListSchema, type MeshList } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { meshesApiPath } from './mesh-paths';

/** `GET /api/missions/:missionId/meshes`: the mission's imported meshes, newest first. */
export function listMeshes(missionId: string, signal?: AbortSignal): Promise<MeshList> {
  return apiRequest(meshesApiPath(missionId), meshListSchema, { signal });
}

/** Query options of a mission's mesh list; the only place its key is written. */
export function meshesQueryOptions(missionId: string) {
  return queryOptions({
    queryKey: ['missions', missionId, 'meshes', 'list'] as const,
    queryFn: ({ signal }) => listMeshes(missionId, signal),
  });
}

/** The meshes of a mission. */
export function useMeshes(missionId: string) {
  return useQuery(meshesQueryOptions(missionId));
}
