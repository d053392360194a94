import { Router } from 'express';
import type { RouteContext } from './route-context';

/** The mission's audit log. Expects `requireUser` in front. */
export function auditRoutes(_ctx: RouteContext): Router {
  const router = Router();
  return router;
}
