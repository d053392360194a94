import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import request from 'supertest';
import type { Sequelize } from 'sequelize';
import { inject } from 'vitest';
import { loadDemoData } from '@photon-ledger/fixtures';
import type { Role } from '@photon-ledger/shared';
import { configSchema, type Config } from '../src/config';
import { createDatabase } from '../src/db';
import { createApp } from '../src/app';

/** The real app on port 0 against the test database. */
export interface ApiHarness {
  server: Server;
  baseUrl: string;
  sequelize: Sequelize;
  config: Config;
  /** A supertest agent signed in as the demo user of that role (cookie kept). */
  signedIn: (role: Role) => Promise<ReturnType<typeof request.agent>>;
  close: () => Promise<void>;
}

/** Demo credentials by role, from the fixtures. */
export function demoUser(role: Role): { email: string; password: string } {
  const u = loadDemoData().users.find((x) => x.role === role);
  if (!u) throw new Error(`no demo user with role ${role}`);
  return u;
}

/** Starts the app; `env` overrides configuration (e.g. a low sign-in limit). */
export async function startApi(env: Record<string, string> = {}): Promise<ApiHarness> {
  const config = configSchema.parse({
    PL_DATABASE_URL: inject('databaseUrl'),
    PL_JWT_SECRET: 'test-secret-that-is-long-enough-for-hs256-0123456789',
    PL_PORT: '0',
    PL_LOGIN_LIMIT: '1000',
    PL_DEMO_MODE: '1',
    ...env,
  });
  const sequelize = createDatabase(config.PL_DATABASE_URL);
  const app = createApp(config, sequelize);
  const server = await new Promise<Server>((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return {
    server,
    baseUrl,
    sequelize,
    config,
    signedIn: async (role) => {
      const agent = request.agent(baseUrl);
      const res = await agent.post('/api/auth/login').send(demoUser(role));
      if (res.status !== 200) throw new Error(`sign-in as ${role} failed: ${res.status} ${JSON.stringify(res.body)}`);
      return agent;
    },
    close: async () => {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await sequelize.close();
    },
  };
}
