import { Router } from 'express';
import type { RouteContext } from './route-context';

/** Reviews and approvals of studies and run budgets. Expects `requireUser` in front. */
export function reviewRoutes(_ctx: RouteContext): Router {
  const router = Router();
  return router;
}
