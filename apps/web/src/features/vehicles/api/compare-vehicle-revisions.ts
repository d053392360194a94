import { queryOptions, useQuery } from '@tanstack/react-query';
import { vehicleCompareSchema, type VehicleCompare } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** `GET .../vehicles/:vehicleId/compare?from=&to=`: what changed from one revision to another, per plate and field. */
export function compareVehicleRevisions(
  missionId: string,
  vehicleId: string,
  from: number,
  to: number,
  signal?: AbortSignal,
): Promise<VehicleCompare> {
  return apiRequest(
    `/api/missions/${encodeURIComponent(missionId)}/vehicles/${encodeURIComponent(vehicleId)}/compare`,
    vehicleCompareSchema,
    { query: { from: String(from), to: String(to) }, signal },
  );
}

/** Query options of one comparison; the only place its key is written. Revisions never change, so neither does the answer. */
export function vehicleCompareQueryOptions(missionId: string, vehicleId: string, from: number, to: number) {
  return queryOptions({
    queryKey: ['missions', missionId, 'vehicles', 'compare', vehicleId, from, to] as const,
    queryFn: ({ signal }) => compareVehicleRevisions(missionId, vehicleId, from, to, signal),
    staleTime: Infinity,
  });
}

/** The changes between two revisions; idle until both are chosen and differ. */
export function useVehicleCompare(missionId: string, vehicleId: string, from: number | null, to: number | null) {
  return useQuery({
    ...vehicleCompareQueryOptions(missionId, vehicleId, from ?? 0, to ?? 0),
    enabled: from !== null && to !== null && from !== to,
  });
}
