import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiErrorSchema } from '@photon-ledger/shared';
import { ApiRequestError } from '../../../lib/api-client';
import { parseMeshGeometry, type MeshGeometry } from '../lib/mesh-geometry';
import { meshApiPath } from './mesh-paths';

/**
 * `GET /api/missions/:missionId/meshes/:meshId/geometry`: the triangles in the body frame (binary,
 * little-endian float32 positions then uint32 group indices; see `MESH_GEOMETRY_CONTENT_TYPE`).
 */
export async function getMeshGeometry(missionId: string, meshId: string, signal?: AbortSignal): Promise<MeshGeometry> {
  const path = `${meshApiPath(missionId, meshId)}/geometry`;
  let response: Response;
  try {
    response = await fetch(path, { credentials: 'include', signal: signal ?? null, headers: { Accept: 'application/octet-stream, application/json' } });
  } catch (cause) {
    if (signal?.aborted) throw cause;
    throw new ApiRequestError({ status: 0, code: 'network_error', message: 'Could not reach the Photon Ledger server. Check your connection and try again.', cause });
  }
  if (!response.ok) {
    const parsed = apiErrorSchema.safeParse(await response.json().catch(() => undefined));
    if (parsed.success) {
      const { code, message, fields } = parsed.data.error;
      throw new ApiRequestError({ status: response.status, code, message, fields });
    }
    throw new ApiRequestError({ status: response.status, code: 'unexpected_response', message: `The server answered ${response.status} for the mesh geometry.` });
  }
  const header = response.headers.get('X-Triangle-Count');
  const buffer = await response.arrayBuffer();
  try {
    return parseMeshGeometry(buffer, header === null ? undefined : Number(header));
  } catch (cause) {
    throw new ApiRequestError({
      status: response.status,
      code: 'unexpected_response',
      message: `The mesh geometry was not understood: ${cause instanceof Error ? cause.message : String(cause)}`,
      cause,
    });
  }
}

/** Query options of a mesh's geometry (never changes); the only place its key is written. */
export function meshGeometryQueryOptions(missionId: string, meshId: string) {
  return queryOptions({
    queryKey: ['missions', missionId, 'meshes', 'geometry', meshId] as const,
    queryFn: ({ signal }) => getMeshGeometry(missionId, meshId, signal),
    staleTime: Infinity,
    gcTime: 5 * 60_000,
  });
}

/** A mesh's triangles, for the 3D view and the lit fractions. */
export function useMeshGeometry(missionId: string, meshId: string) {
  return useQuery(meshGeometryQueryOptions(missionId, meshId));
}
