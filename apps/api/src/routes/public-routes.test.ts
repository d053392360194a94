import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { healthSchema, publicConfigSchema } from '@photon-ledger/shared';
import { startApi, type ApiHarness } from '../../test/api-harness';

describe('public routes', () => {
  let api: ApiHarness;
  beforeAll(async () => {
    api = await startApi();
  });
  afterAll(() => api.close());

  it('health reports the database up', async () => {
    const res = await request(api.baseUrl).get('/api/health');
    expect(res.status).toBe(200);
    expect(healthSchema.parse(res.body)).toMatchObject({ status: 'ok', database: 'up' });
  });

  it('health answers 503 when the database is unreachable', async () => {
    const down = await startApi();
    await down.sequelize.close();
    try {
      const res = await request(down.baseUrl).get('/api/health');
      expect(res.status).toBe(503);
      expect(healthSchema.parse(res.body).database).toBe('down');
    } finally {
      await new Promise<void>((resolve) => down.server.close(() => resolve()));
    }
  });

  it('demo mode lists one demo account per role; without it, none', async () => {
    const demo = publicConfigSchema.parse((await request(api.baseUrl).get('/api/public-config')).body);
    expect(demo.demoMode).toBe(true);
    expect(demo.demoAccounts.map((a) => a.role).sort()).toEqual(['admin', 'engineer', 'lead', 'reviewer']);
    const prod = await startApi({ PL_DEMO_MODE: '0' });
    try {
      const body = publicConfigSchema.parse((await request(prod.baseUrl).get('/api/public-config')).body);
      expect(body).toEqual({ demoMode: false, demoAccounts: [] });
    } finally {
      await prod.close();
    }
  });
});
