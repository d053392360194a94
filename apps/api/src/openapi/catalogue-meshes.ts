/** Catalogue entries for meshes and their SRP coefficient tables. */
import {
  MESH_GEOMETRY_CONTENT_TYPE,
  coefficientTableDataSchema,
  coefficientTableRequestSchema,
  coefficientTableRouteParamsSchema,
  coefficientTableSummarySchema,
  meshImportFormSchema,
  meshListSchema,
  meshRouteParamsSchema,
  meshSummarySchema,
  missionParamsSchema,
} from '@photon-ledger/shared';
import type { RouteDoc } from './route-catalogue';

const meshes = '/missions/:missionId/meshes';
const mesh = `${meshes}/:meshId`;
const table = '/missions/:missionId/coefficient-tables/:tableId';

export const meshRouteDocs: RouteDoc[] = [
  {
    method: 'post',
    path: meshes,
    summary: 'Import an OBJ or STL mesh (units, rotation, translation into the body frame); a bad file is refused with its line number, nothing stored',
    tag: 'meshes',
    access: 'edit',
    params: missionParamsSchema,
    multipart: meshImportFormSchema,
    response: { status: 201, schema: meshSummarySchema },
  },
  { method: 'get', path: meshes, summary: 'Meshes of the mission, newest first', tag: 'meshes', access: 'read', params: missionParamsSchema, response: { status: 200, schema: meshListSchema } },
  { method: 'get', path: mesh, summary: 'A mesh: triangles, groups, area, bounds, geometry checksum', tag: 'meshes', access: 'read', params: meshRouteParamsSchema, response: { status: 200, schema: meshSummarySchema } },
  {
    method: 'get',
    path: `${mesh}/geometry`,
    summary: 'The triangles: float32 coordinates (9 per triangle, body frame, m) then uint32 group indices, little-endian; X-Triangle-Count header',
    tag: 'meshes',
    access: 'read',
    params: meshRouteParamsSchema,
    response: { status: 200, contentType: MESH_GEOMETRY_CONTENT_TYPE },
  },
  {
    method: 'post',
    path: `${mesh}/tables`,
    summary: 'Request the SRP coefficient table of these optics and settings: 201 with a new table and its queued jobs, 200 with the cached one of the same key',
    tag: 'meshes',
    access: 'edit',
    params: meshRouteParamsSchema,
    body: coefficientTableRequestSchema,
    response: { status: 201, schema: coefficientTableSummarySchema },
  },
  { method: 'get', path: table, summary: 'A coefficient table: status, progress, chunks, cost', tag: 'meshes', access: 'read', params: coefficientTableRouteParamsSchema, response: { status: 200, schema: coefficientTableSummarySchema } },
  {
    method: 'get',
    path: `${table}/data`,
    summary: 'The table values (force and torque about the origin per unit pressure at each grid node); 409 until it has succeeded',
    tag: 'meshes',
    access: 'read',
    params: coefficientTableRouteParamsSchema,
    response: { status: 200, schema: coefficientTableDataSchema },
  },
  {
    method: 'post',
    path: `${table}/cancel`,
    summary: 'Cancel a queued or running table (409 when it has finished)',
    tag: 'meshes',
    access: 'edit',
    params: coefficientTableRouteParamsSchema,
    response: { status: 200, schema: coefficientTableSummarySchema },
  },
];
