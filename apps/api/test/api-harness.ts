import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import request from 'supertest';
import type { Sequelize } from 'sequelize';
import { inject } from 'vitest';
import { loadDemoData } from '@photon-ledger/fixtures';
import { missionListSchema, type Role } from '@photon-ledger/shared';
import { configSchema, type Config } from '../src/config';
import { createDatabase } from '../src/db';
import { createApp } from '../src/app';
import { createJobSender } from '../src/jobs/pg-boss-sender';
import { startWorker, type Worker } from '../src/worker';

/** The real app on port 0 against the test database. */
export interface ApiHarness {
  server: Server;
  baseUrl: string;
  sequelize: Sequelize;
  config: Config;
  /** The in-process worker, when `PL_WORKERS_IN_PROCESS` was set above 0 (tests default to none). */
  worker: Worker | null;
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

/**
 * Starts the app; `env` overrides configuration (e.g. a low sign-in limit). Unlike the server, no
 * worker runs in the process unless `PL_WORKERS_IN_PROCESS` asks for one.
 */
export async function startApi(env: Record<string, string> = {}): Promise<ApiHarness> {
  const config = configSchema.parse({
    PL_DATABASE_URL: inject('databaseUrl'),
    PL_JWT_SECRET: 'test-secret-that-is-long-enough-for-hs256-0123456789',
    PL_PORT: '0',
    PL_LOGIN_LIMIT: '1000',
    PL_DEMO_MODE: '1',
    PL_WORKERS_IN_PROCESS: '0',
    ...env,
  });
  const sequelize = createDatabase(config.PL_DATABASE_URL);
  const worker =
    config.PL_WORKERS_IN_PROCESS > 0
      ? await startWorker({
          databaseUrl: config.PL_DATABASE_URL,
          concurrency: config.PL_WORKERS_IN_PROCESS,
          staleSeconds: config.PL_RUN_STALE_SECONDS,
          pollSeconds: config.PL_WORKER_POLL_SECONDS,
          sequelize,
        })
      : null;
  const jobs = createJobSender(config.PL_DATABASE_URL, { onQueued: () => worker?.wake() });
  const app = createApp(config, sequelize, jobs);
  const server = await new Promise<Server>((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return {
    server,
    baseUrl,
    sequelize,
    config,
    worker,
    signedIn: async (role) => {
      const agent = request.agent(baseUrl);
      const res = await agent.post('/api/auth/login').send(demoUser(role));
      if (res.status !== 200) throw new Error(`sign-in as ${role} failed: ${res.status} ${JSON.stringify(res.body)}`);
      return agent;
    },
    close: async () => {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      // Runs in hand go back to the queue at once (a later worker takes them).
      await worker?.stop();
      await jobs.close();
      await sequelize.close();
    },
  };
}

/** Ids of the two demo missions (read as the admin, who sees every mission). */
export async function demoMissionIds(api: ApiHarness): Promise<{ corvina: string; halyard: string }> {
  const { missions } = missionListSchema.parse((await (await api.signedIn('admin')).get('/api/missions')).body);
  const id = (slug: string) => {
    const m = missions.find((x) => x.slug === slug);
    if (!m) throw new Error(`no demo mission ${slug}`);
    return m.id;
  };
  return { corvina: id('corvina-2'), halyard: id('halyard-1') };
}
