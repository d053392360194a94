import { useMutation, useQueryClient } from '@tanstack/react-query';
import { vehicleSavedSchema, type VehicleCreate, type VehicleSaved } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { vehiclesQueryOptions } from './list-vehicles';

/** `POST /api/missions/:missionId/vehicles`: a new vehicle and its revision 1 (409 on a name already used). */
export function createVehicle(missionId: string, body: VehicleCreate): Promise<VehicleSaved> {
  return apiRequest(`/api/missions/${encodeURIComponent(missionId)}/vehicles`, vehicleSavedSchema, { method: 'POST', body });
}

/** Creates a vehicle; the mission's vehicle list is fetched again afterwards. */
export function useCreateVehicle(missionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: VehicleCreate) => createVehicle(missionId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: vehiclesQueryOptions(missionId).queryKey }),
  });
}
