import { Router } from 'express';
import {
  missionParamsSchema,
  vehicleCompareQuerySchema,
  vehicleCreateSchema,
  vehicleRevisionCreateSchema,
  vehicleRevisionRouteParamsSchema,
  vehicleRouteParamsSchema,
  type VehicleList,
} from '@photon-ledger/shared';
import { currentUser } from '../middleware/auth';
import { parseInput } from '../middleware/validate';
import { missionFor } from '../services/mission-access';
import {
  compareRevisions,
  createRevision,
  createVehicle,
  getVehicleDetail,
  getVehicleRevision,
  listVehicles,
} from '../services/vehicle-service';
import type { RouteContext } from './route-context';

/**
 * Vehicles and their immutable revisions. Expects `requireUser` in front. There is no route that
 * changes or deletes a revision: an edit is a new revision.
 */
export function vehicleRoutes(ctx: RouteContext): Router {
  const router = Router();

  router.get('/missions/:missionId/vehicles', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    await missionFor(currentUser(res), missionId, 'read');
    res.json({ vehicles: await listVehicles(missionId) } satisfies VehicleList);
  });

  router.post('/missions/:missionId/vehicles', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    const user = currentUser(res);
    await missionFor(user, missionId, 'edit');
    const input = parseInput(vehicleCreateSchema, req.body, 'body');
    res.status(201).json(await createVehicle(user, missionId, input, ctx.jobs));
  });

  router.get('/missions/:missionId/vehicles/:vehicleId', async (req, res) => {
    const { missionId, vehicleId } = parseInput(vehicleRouteParamsSchema, req.params, 'path');
    await missionFor(currentUser(res), missionId, 'read');
    res.json(await getVehicleDetail(missionId, vehicleId));
  });

  router.post('/missions/:missionId/vehicles/:vehicleId/revisions', async (req, res) => {
    const { missionId, vehicleId } = parseInput(vehicleRouteParamsSchema, req.params, 'path');
    const user = currentUser(res);
    await missionFor(user, missionId, 'edit');
    const input = parseInput(vehicleRevisionCreateSchema, req.body, 'body');
    res.status(201).json(await createRevision(user, missionId, vehicleId, input, ctx.jobs));
  });

  router.get('/missions/:missionId/vehicles/:vehicleId/revisions/:revision', async (req, res) => {
    const { missionId, vehicleId, revision } = parseInput(vehicleRevisionRouteParamsSchema, req.params, 'path');
    await missionFor(currentUser(res), missionId, 'read');
    res.json(await getVehicleRevision(missionId, vehicleId, revision));
  });

  router.get('/missions/:missionId/vehicles/:vehicleId/compare', async (req, res) => {
    const { missionId, vehicleId } = parseInput(vehicleRouteParamsSchema, req.params, 'path');
    await missionFor(currentUser(res), missionId, 'read');
    const { from, to } = parseInput(vehicleCompareQuerySchema, req.query, 'query');
    res.json(await compareRevisions(missionId, vehicleId, from, to));
  });

  return router;
}
