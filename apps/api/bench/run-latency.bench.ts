/**
 * Submission-to-result latency of an analysis run: from `POST /api/missions/:id/runs` to the run
 * reading `succeeded`, for the one-day demo GEO scenario, with the API and one in-process worker
 * as `npm start` runs them (the worker woken by the API when a run is queued), then with the
 * worker left to find jobs by polling (as a separate worker process does). Prints figures; asserts
 * nothing. Database: a throwaway cluster (or PL_TEST_ADMIN_URL's), see bench-database.ts.
 */
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { QueryTypes, type Sequelize } from 'sequelize';
import { loadDemoData } from '@photon-ledger/fixtures';
import { runSchema } from '@photon-ledger/shared';
import { configSchema } from '../src/config';
import { createApp } from '../src/app';
import { createDatabase } from '../src/db';
import { createJobSender } from '../src/jobs/pg-boss-sender';
import { createScenarioRows, missionIdBySlug } from '../src/jobs/run-test-support';
import { startWorker } from '../src/worker';
import { openBenchDatabase } from './bench-database';

const RUNS = 7;
const POLL_MS = 5;
const ONE_DAY = { spanDays: 1, outputStepS: 600 };

const median = (values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
};

interface Timing {
  /** POST sent to the first read showing succeeded (ms), as a client sees it. */
  clientMs: number;
  /** The POST alone (ms): checks, snapshot, run row, audit line and job in one transaction. */
  postMs: number;
  /** queued_at to started_at (ms): waiting for a worker. */
  waitMs: number;
  /**
   * started_at to finished_at (ms): loading and computing in the thread (both are transaction
   * start times, so storing the outcome comes after finished_at).
   */
  workMs: number;
}

async function measureConfiguration(label: string, databaseUrl: string, wake: boolean): Promise<void> {
  const config = configSchema.parse({
    PL_DATABASE_URL: databaseUrl,
    PL_JWT_SECRET: 'bench-secret-that-is-long-enough-for-hs256-0123456789',
    PL_PORT: '0',
    PL_LOGIN_LIMIT: '1000',
  });
  const sequelize: Sequelize = createDatabase(databaseUrl);
  const worker = await startWorker({
    databaseUrl,
    concurrency: 1,
    staleSeconds: config.PL_RUN_STALE_SECONDS,
    pollSeconds: config.PL_WORKER_POLL_SECONDS,
    sequelize,
  });
  const jobs = createJobSender(databaseUrl, wake ? { onQueued: () => worker.wake() } : {});
  const app = createApp(config, sequelize, jobs);
  const server = await new Promise<Server>((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}/api`;
  try {
    const engineer = loadDemoData().users.find((u) => u.role === 'engineer')!;
    const login = await fetch(`${base}/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: engineer.email, password: engineer.password }),
    });
    const cookie = login.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
    const missionId = await missionIdBySlug('corvina-2');
    const { scenarioId } = await createScenarioRows(sequelize, missionId, ONE_DAY);

    const timings: Timing[] = [];
    for (let i = 0; i <= RUNS; i += 1) {
      const started = performance.now();
      const posted = await fetch(`${base}/missions/${missionId}/runs`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', cookie },
        body: JSON.stringify({ scenarioId }),
      });
      const { id } = runSchema.parse(await posted.json());
      const postMs = performance.now() - started;
      for (;;) {
        const run = runSchema.parse(await (await fetch(`${base}/missions/${missionId}/runs/${id}`, { headers: { cookie } })).json());
        if (run.status === 'succeeded') break;
        if (run.status !== 'queued' && run.status !== 'running') throw new Error(`run ${id} ended ${run.status}: ${run.errorMessage}`);
        await new Promise((resolve) => setTimeout(resolve, POLL_MS));
      }
      const clientMs = performance.now() - started;
      const [row] = await sequelize.query<{ wait_ms: number; work_ms: number }>(
        `SELECT extract(epoch FROM started_at - queued_at) * 1000 AS wait_ms, extract(epoch FROM finished_at - started_at) * 1000 AS work_ms
           FROM runs WHERE id = :id`,
        { replacements: { id }, type: QueryTypes.SELECT },
      );
      // The first run warms the JIT in the computation thread: reported apart, left out of the median.
      if (i === 0) console.log(`${label}: first run ${clientMs.toFixed(0)} ms (warm-up, not in the median)`);
      else timings.push({ clientMs, postMs, waitMs: Number(row!.wait_ms), workMs: Number(row!.work_ms) });
    }
    const fmt = (key: keyof Timing) => `${median(timings.map((t) => t[key])).toFixed(0)} ms`;
    const range = `${Math.min(...timings.map((t) => t.clientMs)).toFixed(0)}-${Math.max(...timings.map((t) => t.clientMs)).toFixed(0)} ms`;
    console.log(
      `${label}: POST to succeeded, median of ${RUNS}: ${fmt('clientMs')} (range ${range}); ` +
        `medians of the parts: POST answered ${fmt('postMs')}, in the queue ${fmt('waitMs')}, ` +
        `worker from claim to result (load, compute in the thread) ${fmt('workMs')}; the rest is storing and the client's polling`,
    );
  } finally {
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await worker.stop();
    await jobs.close();
    await sequelize.close();
  }
}

const database = await openBenchDatabase();
try {
  console.log(`one-day demo GEO scenario (corvina-2, 145 samples at 600 s), API + 1 in-process worker, client polls every ${POLL_MS} ms`);
  await measureConfiguration('woken by the API (npm start)', database.databaseUrl, true);
  await measureConfiguration('polling only (PL_WORKER_POLL_SECONDS=1, as a separate worker)', database.databaseUrl, false);
} finally {
  await database.close();
}
