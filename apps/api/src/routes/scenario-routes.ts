import { Router } from 'express';
import { missionParamsSchema, scenarioBodySchema, scenarioRouteParamsSchema, type ScenarioList } from '@photon-ledger/shared';
import { currentUser } from '../middleware/auth';
import { parseInput } from '../middleware/validate';
import { missionFor } from '../services/mission-access';
import { createScenario, deleteScenario, getScenario, listScenarios, updateScenario } from '../services/scenario-service';
import type { RouteContext } from './route-context';

/** Scenarios of a mission. Expects `requireUser` in front. */
export function scenarioRoutes(_ctx: RouteContext): Router {
  const router = Router();

  router.get('/missions/:missionId/scenarios', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    await missionFor(currentUser(res), missionId, 'read');
    res.json({ scenarios: await listScenarios(missionId) } satisfies ScenarioList);
  });

  router.post('/missions/:missionId/scenarios', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    const user = currentUser(res);
    const mission = await missionFor(user, missionId, 'edit');
    const body = parseInput(scenarioBodySchema, req.body, 'body');
    res.status(201).json(await createScenario(user, missionId, mission.regime, body));
  });

  router.get('/missions/:missionId/scenarios/:scenarioId', async (req, res) => {
    const { missionId, scenarioId } = parseInput(scenarioRouteParamsSchema, req.params, 'path');
    await missionFor(currentUser(res), missionId, 'read');
    res.json(await getScenario(missionId, scenarioId));
  });

  router.put('/missions/:missionId/scenarios/:scenarioId', async (req, res) => {
    const { missionId, scenarioId } = parseInput(scenarioRouteParamsSchema, req.params, 'path');
    const user = currentUser(res);
    const mission = await missionFor(user, missionId, 'edit');
    const body = parseInput(scenarioBodySchema, req.body, 'body');
    res.json(await updateScenario(user, missionId, mission.regime, scenarioId, body));
  });

  router.delete('/missions/:missionId/scenarios/:scenarioId', async (req, res) => {
    const { missionId, scenarioId } = parseInput(scenarioRouteParamsSchema, req.params, 'path');
    const user = currentUser(res);
    await missionFor(user, missionId, 'edit');
    await deleteScenario(user, missionId, scenarioId);
    res.status(204).end();
  });

  return router;
}
