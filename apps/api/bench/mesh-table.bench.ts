/**
 * A mesh's SRP coefficient table through the queue (issue 8 item 6): the ~10 000-triangle box-wing
 * craft (fixtures/meshes/make-box-wing.ts at BENCH_DETAIL, 9 880 triangles) uploaded through the
 * API, its 5° table at 4 samples per facet requested, and computed by separate worker processes
 * (`tsx src/worker.ts`, one job slot each): first one worker, then two (a second request with
 * other optics of the same cost, so the cache does not answer it). Prints the wall time from the
 * request to `succeeded` (each worker's table thread starts on its first chunk, about a second
 * under tsx, inside that time), the chunks each worker took, rays and rays per second of compute,
 * and the speed-up. Asserts nothing. Database: see bench-database.ts.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import os from 'node:os';
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { QueryTypes } from 'sequelize';
import { loadDemoData } from '@photon-ledger/fixtures';
import { coefficientTableSummarySchema, meshSummarySchema, type CoefficientTableSummary } from '@photon-ledger/shared';
import { configSchema } from '../src/config';
import { createApp } from '../src/app';
import { createDatabase } from '../src/db';
import { createJobSender } from '../src/jobs/pg-boss-sender';
import { missionIdBySlug } from '../src/jobs/run-test-support';
import { openBenchDatabase } from './bench-database';

/** The fixture's mesh builder (a .ts file of the fixtures package: loaded by tsx, typed here by hand). */
interface BoxWingBuilder {
  BENCH_DETAIL: object;
  boxWingObj: (detail: object) => { text: string; triangleCount: number };
}
const fixtureBuilder = '@photon-ledger/fixtures/meshes/make-box-wing';
const { BENCH_DETAIL, boxWingObj } = (await import(fixtureBuilder)) as BoxWingBuilder;

const apiDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

/** Starts `tsx src/worker.ts` and resolves once it says it is ready. */
function startWorkerProcess(databaseUrl: string, label: string): Promise<ChildProcess> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'src/worker.ts'], {
      cwd: apiDir,
      env: { ...process.env, PL_DATABASE_URL: databaseUrl, PL_WORKER_CONCURRENCY: '1', PL_WORKER_POLL_SECONDS: '0.5' },
      stdio: ['ignore', 'pipe', 'inherit'],
    });
    let seen = '';
    child.stdout!.on('data', (chunk: Buffer) => {
      seen += chunk.toString();
      if (seen.includes('worker ready')) {
        console.log(`  ${label}: ${seen.trim().split('\n').find((l) => l.includes('worker ready'))}`);
        seen = '';
        resolve(child);
      }
    });
    child.once('exit', (code) => reject(new Error(`${label} exited with ${code} before it was ready`)));
  });
}

function stopWorkerProcess(child: ChildProcess): Promise<void> {
  return new Promise((resolve) => {
    if (child.exitCode !== null) return resolve();
    child.once('exit', () => resolve());
    // Twice: the second signal gives jobs in hand back at once instead of a grace period.
    child.kill('SIGTERM');
    setTimeout(() => child.kill('SIGTERM'), 200).unref();
  });
}

async function main(): Promise<void> {
  const db = await openBenchDatabase();
  const { databaseUrl } = db;
  const config = configSchema.parse({
    PL_DATABASE_URL: databaseUrl,
    PL_JWT_SECRET: 'bench-secret-that-is-long-enough-for-hs256-0123456789',
    PL_PORT: '0',
    PL_LOGIN_LIMIT: '1000',
    PL_WORKERS_IN_PROCESS: '0',
  });
  const sequelize = createDatabase(databaseUrl);
  const jobs = createJobSender(databaseUrl);
  const app = createApp(config, sequelize, jobs);
  const server = await new Promise<Server>((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}/api`;
  const workers: ChildProcess[] = [];
  try {
    const engineer = loadDemoData().users.find((u) => u.role === 'engineer')!;
    const login = await fetch(`${base}/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: engineer.email, password: engineer.password }),
    });
    const cookie = login.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
    const missionId = await missionIdBySlug('corvina-2');

    const obj = boxWingObj(BENCH_DETAIL);
    const form = new FormData();
    form.set('units', 'm');
    form.set('name', 'Bench box-wing');
    form.set('file', new Blob([obj.text]), 'bench-box-wing.obj');
    const t0 = performance.now();
    const uploaded = await fetch(`${base}/missions/${missionId}/meshes`, { method: 'POST', headers: { cookie }, body: form });
    if (uploaded.status !== 201) throw new Error(`mesh upload answered ${uploaded.status}: ${await uploaded.text()}`);
    const mesh = meshSummarySchema.parse(await uploaded.json());
    console.log(`mesh: ${mesh.triangleCount} triangles, ${(obj.text.length / 1e6).toFixed(2)} MB OBJ, imported in ${(performance.now() - t0).toFixed(0)} ms`);

    const requestTable = async (busFront: string): Promise<CoefficientTableSummary> => {
      const res = await fetch(`${base}/missions/${missionId}/meshes/${mesh.id}/tables`, {
        method: 'POST',
        headers: { cookie, 'content-type': 'application/json' },
        body: JSON.stringify({
          optics: {
            default: { front: busFront },
            groups: {
              'wing-north': { front: 'solar-cell', back: 'solar-array-back' },
              'wing-south': { front: 'solar-cell', back: 'solar-array-back' },
              dish: { front: 'white-paint', back: 'white-paint' },
            },
          },
          table: { stepDeg: 5, samplesPerFacet: 4, specularBounce: false },
        }),
      });
      if (res.status !== 201) throw new Error(`table request answered ${res.status}: ${await res.text()}`);
      return coefficientTableSummarySchema.parse(await res.json());
    };
    const waitFor = async (tableId: string): Promise<CoefficientTableSummary> => {
      for (;;) {
        const res = await fetch(`${base}/missions/${missionId}/coefficient-tables/${tableId}`, { headers: { cookie } });
        const table = coefficientTableSummarySchema.parse(await res.json());
        if (table.status !== 'queued' && table.status !== 'running') return table;
        await new Promise((resolve) => setTimeout(resolve, 100));
      }
    };
    const split = async (tableId: string): Promise<string> => {
      const rows = await sequelize.query<{ worker_id: string; n: number; ms: number }>(
        `SELECT worker_id, count(*)::int AS n, sum(compute_ms)::float8 AS ms FROM coefficient_table_chunks WHERE table_id = :tableId GROUP BY worker_id ORDER BY worker_id`,
        { replacements: { tableId }, type: QueryTypes.SELECT },
      );
      return rows.map((r) => `${r.worker_id}: ${r.n} chunks, ${(r.ms / 1000).toFixed(1)} s compute`).join('; ');
    };

    const timed = async (label: string, busFront: string): Promise<number> => {
      const started = performance.now();
      const queued = await requestTable(busFront);
      const done = await waitFor(queued.id);
      const wallMs = performance.now() - started;
      if (done.status !== 'succeeded') throw new Error(`${label}: the table ended ${done.status}: ${done.error}`);
      const stats = done.stats!;
      console.log(
        `${label}: 5° table (37 × 72 nodes), 4 samples per facet, ${done.chunkCount} chunks: ${(wallMs / 1000).toFixed(2)} s wall; ` +
          `${(stats.rays / 1e6).toFixed(1)} M rays, ${(stats.raysPerSecond / 1e6).toFixed(2)} M rays/s of compute, ${(stats.computeMs / 1000).toFixed(1)} s compute summed`,
      );
      console.log(`  ${await split(queued.id)}`);
      return wallMs;
    };

    console.log(`load average before: ${os.loadavg().map((l) => l.toFixed(1)).join(', ')} (${os.cpus().length} cores)`);
    console.log('one worker process:');
    workers.push(await startWorkerProcess(databaseUrl, 'worker 1'));
    const oneMs = await timed('1 worker ', 'mli-kapton');
    console.log('two worker processes:');
    workers.push(await startWorkerProcess(databaseUrl, 'worker 2'));
    const twoMs = await timed('2 workers', 'white-paint');
    console.log(`speed-up with two workers: ${(oneMs / twoMs).toFixed(2)}× (${os.cpus().length} cores; load average now ${os.loadavg().map((l) => l.toFixed(1)).join(', ')}: other processes share the cores)`);
  } finally {
    await Promise.all(workers.map(stopWorkerProcess));
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await jobs.close();
    await sequelize.close();
    await db.close();
  }
}

await main();
