import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import type { Health, PublicConfig } from '@photon-ledger/shared';
import type { Config } from '../config';
import { loadDemoData } from '@photon-ledger/fixtures';

/** Unauthenticated routes: health (checks the database) and what the sign-in page may know. */
export function publicRoutes(config: Config, sequelize: Sequelize, version: string): Router {
  const router = Router();

  router.get('/health', async (_req, res) => {
    let database: Health['database'] = 'up';
    try {
      await sequelize.query('SELECT 1');
    } catch {
      database = 'down';
    }
    const body: Health = { status: database === 'up' ? 'ok' : 'degraded', database, version };
    res.status(database === 'up' ? 200 : 503).json(body);
  });

  const demoAccounts = config.PL_DEMO_MODE
    ? loadDemoData().users.map(({ email, password, role, displayName }) => ({ email, password, role, displayName }))
    : [];
  router.get('/public-config', (_req, res) => {
    res.json({ demoMode: config.PL_DEMO_MODE, demoAccounts } satisfies PublicConfig);
  });

  return router;
}
