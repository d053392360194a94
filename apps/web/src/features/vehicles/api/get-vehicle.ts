import { queryOptions, useQuery } from '@tanstack/react-query';
import { vehicleDetailSchema, type VehicleDetail } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/missions/:missionId/vehicles/:vehicleId`: the vehicle, its revisions (newest first) and its latest spec. */
export function getVehicle(missionId: string, vehicleId: string, signal?: AbortSignal): Promise<VehicleDetail> {
  return apiRequest(
    `/api/missions/${encodeURIComponent(missionId)}/vehicles/${encodeURIComponent(vehicleId)}`,
    vehicleDetailSchema,
    { signal },
  );
}

/** Query options of one vehicle; the only place its key is written. */
export function vehicleQueryOptions(missionId: string, vehicleId: string) {
  return queryOptions({
    queryKey: ['missions', missionId, 'vehicles', 'detail', vehicleId] as const,
    queryFn: ({ signal }) => getVehicle(missionId, vehicleId, signal),
  });
}

/** One vehicle with its revision history and latest spec. */
export function useVehicle(missionId: string, vehicleId: string) {
  return useQuery(vehicleQueryOptions(missionId, vehicleId));
}
