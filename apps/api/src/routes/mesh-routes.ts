import { Router } from 'express';
import {
  MESH_GEOMETRY_CONTENT_TYPE,
  MESH_MAX_BYTES,
  coefficientTableRequestSchema,
  coefficientTableRouteParamsSchema,
  meshImportFormSchema,
  meshRouteParamsSchema,
  missionParamsSchema,
  type CoefficientTableData,
  type CoefficientTableSummary,
  type MeshList,
  type MeshSummary,
} from '@photon-ledger/shared';
import { currentUser } from '../middleware/auth';
import { receiveFile } from '../middleware/upload';
import { parseInput } from '../middleware/validate';
import { missionFor } from '../services/mission-access';
import { getMesh, importMesh, listMeshes, meshGeometry } from '../services/mesh-service';
import { cancelTable, getTable, getTableData, requestTable } from '../services/coefficient-table-service';
import type { RouteContext } from './route-context';

/**
 * Meshes (import from OBJ/STL, read, geometry) and their SRP coefficient tables (request or find
 * the cached one, progress, values, cancel). Expects `requireUser` in front. The caller's right to
 * edit is checked before an uploaded file is read.
 */
export function meshRoutes(ctx: RouteContext): Router {
  const router = Router();

  router.post('/missions/:missionId/meshes', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    const user = currentUser(res);
    await missionFor(user, missionId, 'edit');
    const file = await receiveFile(req, res, MESH_MAX_BYTES);
    const form = parseInput(meshImportFormSchema, file.fields, 'body');
    res.status(201).json((await importMesh(user, missionId, file, form)) satisfies MeshSummary);
  });

  router.get('/missions/:missionId/meshes', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    await missionFor(currentUser(res), missionId, 'read');
    res.json({ meshes: await listMeshes(missionId) } satisfies MeshList);
  });

  router.get('/missions/:missionId/meshes/:meshId', async (req, res) => {
    const { missionId, meshId } = parseInput(meshRouteParamsSchema, req.params, 'path');
    await missionFor(currentUser(res), missionId, 'read');
    res.json((await getMesh(missionId, meshId)) satisfies MeshSummary);
  });

  router.get('/missions/:missionId/meshes/:meshId/geometry', async (req, res) => {
    const { missionId, meshId } = parseInput(meshRouteParamsSchema, req.params, 'path');
    await missionFor(currentUser(res), missionId, 'read');
    const { triangleCount, body } = await meshGeometry(missionId, meshId);
    res.setHeader('Content-Type', MESH_GEOMETRY_CONTENT_TYPE);
    res.setHeader('X-Triangle-Count', String(triangleCount));
    res.setHeader('X-Content-Type-Options', 'nosniff');
    res.send(body);
  });

  router.post('/missions/:missionId/meshes/:meshId/tables', async (req, res) => {
    const { missionId, meshId } = parseInput(meshRouteParamsSchema, req.params, 'path');
    const user = currentUser(res);
    await missionFor(user, missionId, 'edit');
    const input = parseInput(coefficientTableRequestSchema, req.body, 'body');
    const { summary, created } = await requestTable(ctx.jobs, user, missionId, meshId, input);
    res.status(created ? 201 : 200).json(summary satisfies CoefficientTableSummary);
  });

  router.get('/missions/:missionId/coefficient-tables/:tableId', async (req, res) => {
    const { missionId, tableId } = parseInput(coefficientTableRouteParamsSchema, req.params, 'path');
    await missionFor(currentUser(res), missionId, 'read');
    res.json((await getTable(missionId, tableId)) satisfies CoefficientTableSummary);
  });

  router.get('/missions/:missionId/coefficient-tables/:tableId/data', async (req, res) => {
    const { missionId, tableId } = parseInput(coefficientTableRouteParamsSchema, req.params, 'path');
    await missionFor(currentUser(res), missionId, 'read');
    res.json((await getTableData(missionId, tableId)) satisfies CoefficientTableData);
  });

  router.post('/missions/:missionId/coefficient-tables/:tableId/cancel', async (req, res) => {
    const { missionId, tableId } = parseInput(coefficientTableRouteParamsSchema, req.params, 'path');
    const user = currentUser(res);
    await missionFor(user, missionId, 'edit');
    res.json((await cancelTable(user, missionId, tableId)) satisfies CoefficientTableSummary);
  });

  return router;
}
