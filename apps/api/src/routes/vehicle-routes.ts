import { Router } from 'express';
import type { RouteContext } from './route-context';

/** Vehicles and their immutable revisions. Expects `requireUser` in front. */
export function vehicleRoutes(_ctx: RouteContext): Router {
  const router = Router();
  return router;
}
