import { Router } from 'express';
import { resultRunParamsSchema } from '@photon-ledger/shared';
import { currentUser } from '../middleware/auth';
import { parseInput } from '../middleware/validate';
import { budgetCsvExport, ephemerisCsvExport, ephemerisOemExport, streamExport } from '../services/export-service';
import type { RouteContext } from './route-context';

/** Streamed exports: CSV ephemeris, CCSDS OEM, budget CSV. Expects `requireUser` in front. */
export function exportRoutes(ctx: RouteContext): Router {
  const router = Router();
  const base = '/missions/:missionId/runs/:runId/export';

  router.get(`${base}/ephemeris.csv`, async (req, res) => {
    const { missionId, runId } = parseInput(resultRunParamsSchema, req.params, 'path');
    await streamExport(res, await ephemerisCsvExport(ctx.sequelize, currentUser(res), missionId, runId));
  });

  router.get(`${base}/ephemeris.oem`, async (req, res) => {
    const { missionId, runId } = parseInput(resultRunParamsSchema, req.params, 'path');
    await streamExport(res, await ephemerisOemExport(ctx.sequelize, currentUser(res), missionId, runId));
  });

  router.get(`${base}/budget.csv`, async (req, res) => {
    const { missionId, runId } = parseInput(resultRunParamsSchema, req.params, 'path');
    await streamExport(res, await budgetCsvExport(ctx.sequelize, currentUser(res), missionId, runId));
  });

  return router;
}
