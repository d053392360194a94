import { useMutation, useQueryClient } from '@tanstack/react-query';
import { vehicleSavedSchema, type VehicleRevisionCreate, type VehicleSaved } from '@photon-ledger/shared';
import { ApiRequestError, apiRequest } from '../../../lib/api-client';
import { vehicleQueryOptions } from './get-vehicle';
import { vehiclesQueryOptions } from './list-vehicles';

/**
 * `POST .../vehicles/:vehicleId/revisions`: the next immutable revision; a 409 when `basedOnRevision`
 * is no longer the latest (someone saved in between).
 */
export function createVehicleRevision(missionId: string, vehicleId: string, body: VehicleRevisionCreate): Promise<VehicleSaved> {
  return apiRequest(
    `/api/missions/${encodeURIComponent(missionId)}/vehicles/${encodeURIComponent(vehicleId)}/revisions`,
    vehicleSavedSchema,
    { method: 'POST', body },
  );
}

/**
 * Saves a revision; the vehicle and the mission's list are fetched again afterwards, and after a
 * 409 too, so the page learns which revision is now the latest.
 */
export function useCreateVehicleRevision(missionId: string, vehicleId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: VehicleRevisionCreate) => createVehicleRevision(missionId, vehicleId, body),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: vehicleQueryOptions(missionId, vehicleId).queryKey }),
        queryClient.invalidateQueries({ queryKey: vehiclesQueryOptions(missionId).queryKey }),
      ]),
    onError: (error) => {
      if (error instanceof ApiRequestError && error.status === 409) {
        void queryClient.invalidateQueries({ queryKey: vehicleQueryOptions(missionId, vehicleId).queryKey });
      }
    },
  });
}
