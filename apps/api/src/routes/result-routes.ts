import { Router } from 'express';
import type { RouteContext } from './route-context';

/** Results of a run: summary, events, ephemeris pages, decimated series, budget. Expects `requireUser` in front. */
export function resultRoutes(_ctx: RouteContext): Router {
  const router = Router();
  return router;
}
