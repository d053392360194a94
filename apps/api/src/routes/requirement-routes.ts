import { Router } from 'express';
import type { RouteContext } from './route-context';

/** Mission requirements on budget lines (leads set them). Expects `requireUser` in front. */
export function requirementRoutes(_ctx: RouteContext): Router {
  const router = Router();
  return router;
}
