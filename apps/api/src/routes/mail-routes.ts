import { Router } from 'express';
import type { RouteContext } from './route-context';

/** Captured outgoing e-mail (administrators). Expects `requireUser` in front. */
export function mailRoutes(_ctx: RouteContext): Router {
  const router = Router();
  return router;
}
