import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meshSummarySchema, type MeshImportForm, type MeshSummary } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { meshesQueryOptions } from './list-meshes';
import { meshesApiPath } from './mesh-paths';

/**
 * `POST /api/missions/:missionId/meshes` (multipart: the file in `file`, then `name`, `units`, and
 * `rotationDeg` / `translationM` as JSON [x, y, z]): the imported mesh. A refused file is a 400
 * whose `fields.file` says why ('line 12: ...'); a too large one names the limit.
 */
export async function importMesh(missionId: string, file: File, form: MeshImportForm): Promise<MeshSummary> {
  const body = new FormData();
  if (form.name) body.set('name', form.name);
  body.set('units', form.units);
  body.set('rotationDeg', JSON.stringify(form.rotationDeg));
  body.set('translationM', JSON.stringify(form.translationM));
  body.set('file', file, file.name);
  return apiRequest(meshesApiPath(missionId), meshSummarySchema, { method: 'POST', body });
}

/** Imports a mesh; the mission's mesh list is fetched again afterwards. */
export function useImportMesh(missionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, form }: { file: File; form: MeshImportForm }) => importMesh(missionId, file, form),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: meshesQueryOptions(missionId).queryKey }),
  });
}
