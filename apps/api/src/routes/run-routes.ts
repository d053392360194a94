import { Router } from 'express';
import { missionParamsSchema, runCreateSchema, runListQuerySchema, runParamsSchema, type Run, type RunList } from '@photon-ledger/shared';
import { parseInput } from '../middleware/validate';
import { currentUser } from '../middleware/auth';
import { missionFor } from '../services/mission-access';
import { cancelRun, createRun, getRun, listRuns, rerunRun } from '../services/run-service';
import type { RouteContext } from './route-context';

/**
 * Runs: create (queues a job), read progress, cancel, re-run. Expects `requireUser` in front.
 * Reading needs membership; writes need the role engineer or lead in the mission.
 */
export function runRoutes(ctx: RouteContext): Router {
  const router = Router();
  const deps = { sequelize: ctx.sequelize, jobs: ctx.jobs };

  router.post('/missions/:missionId/runs', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    const user = currentUser(res);
    const mission = await missionFor(user, missionId, 'edit');
    const input = parseInput(runCreateSchema, req.body, 'body');
    res.status(201).json((await createRun(deps, user, mission, input)) satisfies Run);
  });

  router.get('/missions/:missionId/runs', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    const mission = await missionFor(currentUser(res), missionId, 'read');
    const query = parseInput(runListQuerySchema, req.query, 'query');
    res.json({ runs: await listRuns(ctx.sequelize, mission, query) } satisfies RunList);
  });

  router.get('/missions/:missionId/runs/:runId', async (req, res) => {
    const { missionId, runId } = parseInput(runParamsSchema, req.params, 'path');
    const mission = await missionFor(currentUser(res), missionId, 'read');
    res.json((await getRun(ctx.sequelize, mission, runId)) satisfies Run);
  });

  router.post('/missions/:missionId/runs/:runId/cancel', async (req, res) => {
    const { missionId, runId } = parseInput(runParamsSchema, req.params, 'path');
    const user = currentUser(res);
    const mission = await missionFor(user, missionId, 'edit');
    res.json((await cancelRun(deps, user, mission, runId)) satisfies Run);
  });

  router.post('/missions/:missionId/runs/:runId/rerun', async (req, res) => {
    const { missionId, runId } = parseInput(runParamsSchema, req.params, 'path');
    const user = currentUser(res);
    const mission = await missionFor(user, missionId, 'edit');
    res.status(201).json((await rerunRun(deps, user, mission, runId)) satisfies Run);
  });

  return router;
}
