import { Router } from 'express';
import { missionParamsSchema, requirementParamsSchema, requirementUpsertSchema } from '@photon-ledger/shared';
import { currentUser } from '../middleware/auth';
import { parseInput } from '../middleware/validate';
import { deleteRequirement, listRequirements, upsertRequirement } from '../services/requirement-service';
import type { RouteContext } from './route-context';

/** Mission requirements on budget lines (leads set them). Expects `requireUser` in front. */
export function requirementRoutes(_ctx: RouteContext): Router {
  const router = Router();

  router.get('/missions/:missionId/requirements', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    res.json(await listRequirements(currentUser(res), missionId));
  });

  router.put('/missions/:missionId/requirements/:line', async (req, res) => {
    const { missionId, line } = parseInput(requirementParamsSchema, req.params, 'path');
    // The line comes from the path; the body gives { comparator, value, unit?, minMarginPercent?, note? }.
    const body: unknown = req.body;
    const fields = typeof body === 'object' && body !== null && !Array.isArray(body) ? body : {};
    const input = parseInput(requirementUpsertSchema, { ...fields, line }, 'body');
    const { requirement, created } = await upsertRequirement(currentUser(res), missionId, input);
    res.status(created ? 201 : 200).json(requirement);
  });

  router.delete('/missions/:missionId/requirements/:line', async (req, res) => {
    const { missionId, line } = parseInput(requirementParamsSchema, req.params, 'path');
    await deleteRequirement(currentUser(res), missionId, line);
    res.status(204).end();
  });

  return router;
}
