import { Router } from 'express';
import type { RouteContext } from './route-context';

/** Scenarios of a mission. Expects `requireUser` in front. */
export function scenarioRoutes(_ctx: RouteContext): Router {
  const router = Router();
  return router;
}
