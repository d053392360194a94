import { Router } from 'express';
import type { RouteContext } from './route-context';

/** Runs: create (queues a job), read progress, cancel, re-run. Expects `requireUser` in front. */
export function runRoutes(_ctx: RouteContext): Router {
  const router = Router();
  return router;
}
