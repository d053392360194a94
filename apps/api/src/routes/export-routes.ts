import { Router } from 'express';
import type { RouteContext } from './route-context';

/** Streamed exports: CSV ephemeris, CCSDS OEM, budget CSV. Expects `requireUser` in front. */
export function exportRoutes(_ctx: RouteContext): Router {
  const router = Router();
  return router;
}
