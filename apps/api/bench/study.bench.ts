/**
 * Throughput of a trade study: a 1000-case grid (an ideal sail over one heliocentric day, output
 * every 6 h) computed by two workers started in this process (one study slot each, each with its
 * own computation thread), fed by the API. Prints the definition time (1000 cases checked, rows
 * and jobs written in one transaction), the cases per second, and how the cases split between the
 * workers. Asserts nothing. Database: see bench-database.ts.
 */
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { QueryTypes } from 'sequelize';
import halyardScenario from '@photon-ledger/fixtures/scenarios/halyard-1-spiral.scenario.json' with { type: 'json' };
import { loadDemoData } from '@photon-ledger/fixtures';
import { studySchema, type VehicleSpec } from '@photon-ledger/shared';
import { configSchema } from '../src/config';
import { createApp } from '../src/app';
import { createDatabase } from '../src/db';
import { createJobSender } from '../src/jobs/pg-boss-sender';
import { createScenarioRows, missionIdBySlug } from '../src/jobs/run-test-support';
import { startWorker } from '../src/worker';
import { openBenchDatabase } from './bench-database';

const idealSail = {
  kind: 'sail',
  name: 'Bench ideal sail',
  massKg: 10,
  centreOfMassM: [0, 0, 0],
  areaM2: 100,
  normal: [0, 0, 1],
  centroidM: [0, 0, 0],
  optics: 'ideal',
} as VehicleSpec;

async function main(): Promise<void> {
  const db = await openBenchDatabase();
  const { databaseUrl } = db;
  const config = configSchema.parse({
    PL_DATABASE_URL: databaseUrl,
    PL_JWT_SECRET: 'bench-secret-that-is-long-enough-for-hs256-0123456789',
    PL_PORT: '0',
    PL_LOGIN_LIMIT: '1000',
  });
  const sequelize = createDatabase(databaseUrl);
  const workerOptions = { databaseUrl, concurrency: 1, staleSeconds: config.PL_RUN_STALE_SECONDS, pollSeconds: config.PL_WORKER_POLL_SECONDS, sequelize };
  const workers = [await startWorker(workerOptions), await startWorker(workerOptions)];
  const jobs = createJobSender(databaseUrl, { onQueued: () => workers.forEach((w) => w.wake()) });
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
    const { requirements: _r, vehicle: _v, ...spiral } = structuredClone(halyardScenario) as Record<string, unknown>;
    const { scenarioId } = await createScenarioRows(
      sequelize,
      missionId,
      { ...spiral, spanDays: 1, outputStepS: 21_600, forces: { planets: [], srp: true }, tolerances: { relTol: 1e-8, absTol: 1e-6 } },
      idealSail,
    );

    const started = performance.now();
    const posted = await fetch(`${base}/missions/${missionId}/studies`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', cookie },
      body: JSON.stringify({
        name: 'Bench grid',
        scenarioId,
        design: { kind: 'grid', parameters: [{ path: 'vehicle.areaM2', from: 50, to: 200, steps: 40 }, { path: 'vehicle.massKg', from: 5, to: 20, steps: 25 }] },
        lines: ['sail.characteristicAccel', 'sail.loading'],
      }),
    });
    if (posted.status !== 201) throw new Error(`POST study answered ${posted.status}: ${await posted.text()}`);
    const study = studySchema.parse(await posted.json());
    const postMs = performance.now() - started;
    let last = study;
    for (;;) {
      const res = await fetch(`${base}/missions/${missionId}/studies/${study.id}`, { headers: { cookie } });
      last = studySchema.parse(await res.json());
      if (last.status === 'finished') break;
      await new Promise((r) => setTimeout(r, 100));
    }
    const totalMs = performance.now() - started;
    const computeMs = totalMs - postMs;
    const split = await sequelize.query<{ worker_id: string; n: string }>(
      `SELECT worker_id, count(*) AS n FROM study_cases WHERE study_id = :id GROUP BY worker_id ORDER BY worker_id`,
      { replacements: { id: study.id }, type: QueryTypes.SELECT },
    );
    console.log(`study of ${study.progress.total} cases (ideal sail, 1 day, 6 h output), 2 workers × 1 study slot`);
    console.log(`  definition (POST: checks, ${study.progress.total} rows and jobs in one transaction): ${postMs.toFixed(0)} ms`);
    console.log(`  succeeded ${last.progress.succeeded}, failed ${last.progress.failed}`);
    console.log(`  computing: ${(computeMs / 1000).toFixed(1)} s → ${((study.progress.total * 1000) / computeMs).toFixed(1)} cases/s (POST included: ${((study.progress.total * 1000) / totalMs).toFixed(1)} cases/s)`);
    console.log(`  cases per worker slot: ${split.map((s) => `${s.worker_id}=${s.n}`).join(', ')}`);
  } finally {
    await new Promise<void>((resolve) => server.close(() => resolve()));
    for (const w of workers) await w.stop();
    await jobs.close();
    await sequelize.close();
    await db.close();
  }
}

await main();
