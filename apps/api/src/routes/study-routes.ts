import { Router } from 'express';
import type { RouteContext } from './route-context';

/** Trade studies: define, run (one job per case), progress, cancel, results, CSV. Expects `requireUser` in front. */
export function studyRoutes(_ctx: RouteContext): Router {
  const router = Router();
  return router;
}
