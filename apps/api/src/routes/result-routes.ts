import { Router } from 'express';
import { resultRunParamsSchema, samplePageQuerySchema, seriesQuerySchema } from '@photon-ledger/shared';
import { currentUser } from '../middleware/auth';
import { parseInput } from '../middleware/validate';
import { budgetReport, runEvents, runSummaryJson, samplePage } from '../services/result-service';
import { runSeries } from '../services/series-service';
import type { RouteContext } from './route-context';

/** Results of a run: summary, events, ephemeris pages, decimated series, budget. Expects `requireUser` in front. */
export function resultRoutes(ctx: RouteContext): Router {
  const router = Router();
  const base = '/missions/:missionId/runs/:runId';

  router.get(`${base}/summary`, async (req, res) => {
    const { missionId, runId } = parseInput(resultRunParamsSchema, req.params, 'path');
    // The stored JSON as it is (runSummarySchema): no parse and re-serialisation on the hot path.
    res.type('application/json').send(await runSummaryJson(ctx.sequelize, currentUser(res), missionId, runId));
  });

  router.get(`${base}/events`, async (req, res) => {
    const { missionId, runId } = parseInput(resultRunParamsSchema, req.params, 'path');
    res.json(await runEvents(ctx.sequelize, currentUser(res), missionId, runId));
  });

  router.get(`${base}/samples`, async (req, res) => {
    const { missionId, runId } = parseInput(resultRunParamsSchema, req.params, 'path');
    const query = parseInput(samplePageQuerySchema, req.query, 'query');
    res.json(await samplePage(ctx.sequelize, currentUser(res), missionId, runId, query));
  });

  router.get(`${base}/series`, async (req, res) => {
    const { missionId, runId } = parseInput(resultRunParamsSchema, req.params, 'path');
    const query = parseInput(seriesQuerySchema, req.query, 'query');
    res.json(await runSeries(ctx.sequelize, currentUser(res), missionId, runId, query));
  });

  router.get(`${base}/budget`, async (req, res) => {
    const { missionId, runId } = parseInput(resultRunParamsSchema, req.params, 'path');
    res.json(await budgetReport(ctx.sequelize, currentUser(res), missionId, runId));
  });

  return router;
}
