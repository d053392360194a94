import { useMutation, useQueryClient } from '@tanstack/react-query';
import { plateSetUploadResultSchema, type PlateSetUploadResult } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { vehicleQueryOptions } from './get-vehicle';
import { vehiclesQueryOptions } from './list-vehicles';

/** Where the plates of an uploaded CSV go: a new revision of a vehicle, or a new vehicle. */
export type PlateSetTarget =
  | { target: 'existing'; vehicleId: string; basedOnRevision: number; note?: string }
  | { target: 'new'; name: string; massKg: number; centreOfMassM: readonly [number, number, number]; description?: string; note?: string };

/**
 * `POST /api/missions/:missionId/uploads/plate-set` (multipart, the file in `file`): a revision made
 * from the CSV. A refused file is a 400 whose `fields` are keyed `row N, column NAME` (or `file`).
 */
export async function uploadPlateSet(missionId: string, file: File, target: PlateSetTarget): Promise<PlateSetUploadResult> {
  const form = new FormData();
  if (target.target === 'existing') {
    form.set('vehicleId', target.vehicleId);
    form.set('basedOnRevision', String(target.basedOnRevision));
  } else {
    form.set('name', target.name);
    form.set('massKg', String(target.massKg));
    form.set('comX', String(target.centreOfMassM[0]));
    form.set('comY', String(target.centreOfMassM[1]));
    form.set('comZ', String(target.centreOfMassM[2]));
    if (target.description) form.set('description', target.description);
  }
  if (target.note) form.set('note', target.note);
  form.set('file', file, file.name);

  return apiRequest(`/api/missions/${encodeURIComponent(missionId)}/uploads/plate-set`, plateSetUploadResultSchema, { method: 'POST', body: form });
}

/** Uploads a plate-set CSV; the vehicle (if any) and the mission's list are fetched again afterwards. */
export function useUploadPlateSet(missionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, target }: { file: File; target: PlateSetTarget }) => uploadPlateSet(missionId, file, target),
    onSuccess: (result) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: vehicleQueryOptions(missionId, result.vehicle.id).queryKey }),
        queryClient.invalidateQueries({ queryKey: vehiclesQueryOptions(missionId).queryKey }),
      ]),
  });
}
