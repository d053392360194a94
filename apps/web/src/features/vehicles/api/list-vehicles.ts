import { queryOptions, useQuery } from '@tanstack/react-query';
import { vehicleListSchema, type VehicleList } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/missions/:missionId/vehicles`: the mission's vehicles, by name, with their latest revision. */
export function listVehicles(missionId: string, signal?: AbortSignal): Promise<VehicleList> {
  return apiRequest(`/api/missions/${encodeURIComponent(missionId)}/vehicles`, vehicleListSchema, { signal });
}

/** Query options of a mission's vehicle list; the only place its key is written. */
export function vehiclesQueryOptions(missionId: string) {
  return queryOptions({
    queryKey: ['missions', missionId, 'vehicles', 'list'] as const,
    queryFn: ({ signal }) => listVehicles(missionId, signal),
  });
}

/** The vehicles of a mission. */
export function useVehicles(missionId: string) {
  return useQuery(vehiclesQueryOptions(missionId));
}
