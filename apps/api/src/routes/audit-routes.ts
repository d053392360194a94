import { Router } from 'express';
import { auditQuerySchema, missionParamsSchema } from '@photon-ledger/shared';
import { currentUser } from '../middleware/auth';
import { parseInput } from '../middleware/validate';
import { missionFor } from '../services/mission-access';
import { listAuditEntries } from '../services/audit-service';
import type { RouteContext } from './route-context';

/** The mission's audit log, newest first, paged by entry id. Expects `requireUser` in front. */
export function auditRoutes(_ctx: RouteContext): Router {
  const router = Router();

  router.get('/missions/:missionId/audit', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    await missionFor(currentUser(res), missionId, 'read');
    const query = parseInput(auditQuerySchema, req.query, 'query');
    res.json(await listAuditEntries(missionId, query));
  });

  return router;
}
