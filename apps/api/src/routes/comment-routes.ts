import { Router } from 'express';
import type { RouteContext } from './route-context';

/** Threaded comments on studies, cases and budget lines. Expects `requireUser` in front. */
export function commentRoutes(_ctx: RouteContext): Router {
  const router = Router();
  return router;
}
