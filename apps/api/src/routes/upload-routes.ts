import { Router } from 'express';
import type { RouteContext } from './route-context';

/** Uploaded files (plate-set CSV, attitude-profile CSV). Expects `requireUser` in front. */
export function uploadRoutes(_ctx: RouteContext): Router {
  const router = Router();
  return router;
}
