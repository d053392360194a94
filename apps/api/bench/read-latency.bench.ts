/**
 * Bench: read latency of GET /api/missions/:missionId/runs/:runId/summary under load: autocannon,
 * 50 concurrent connections on loopback for about 10 s, signed in with a session cookie.
 * Prints p50 / p95 / p99 latency and requests/s (target p95 < 50 ms); nothing asserted. For scale it
 * then loads GET /api/me, which pays only the session check every route pays.
 *
 * The API runs in a child process (this file with --serve) so that autocannon's own work does not
 * run on the server's event loop; the database (PostgreSQL) shares the same machine.
 *
 *   cd apps/api && npx tsx bench/read-latency.bench.ts [--seconds=10] [--connections=50] [--profile]
 * Database: a throwaway cluster from bench-database.ts, or the scratch cluster in PL_TEST_ADMIN_URL.
 */
import { fork, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';
import { loadDemoData } from '@photon-ledger/fixtures';
import { configSchema } from '../src/config';
import { createDatabase } from '../src/db';
import { createApp } from '../src/app';
import { MissionModel } from '../src/models';
import { storeRun } from '../test/stored-run';
import { openBenchDatabase } from './bench-database';

async function serve(): Promise<void> {
  const config = configSchema.parse({
    PL_DATABASE_URL: process.env.PL_BENCH_DATABASE_URL,
    PL_JWT_SECRET: process.env.PL_BENCH_JWT_SECRET,
    PL_PORT: '0',
    PL_LOGIN_LIMIT: '1000',
  });
  const sequelize = createDatabase(config.PL_DATABASE_URL);
  const server = createApp(config, sequelize).listen(0, '127.0.0.1');
  await new Promise<void>((resolve) => server.once('listening', () => resolve()));
  process.on('message', (message: string) => {
    // Requests autocannon left in flight may still reach the pool: exit without closing it under them.
    if (message === 'stop') {
      server.close(() => process.exit(0));
      server.closeAllConnections();
    }
  });
  process.send!({ kind: 'listening', port: (server.address() as AddressInfo).port });
}

function argument(name: string, fallback: number): number {
  const hit = process.argv.find((a) => a.startsWith(`--${name}=`));
  return hit ? Number(hit.slice(name.length + 3)) : fallback;
}

async function signIn(baseUrl: string, role: 'engineer' | 'lead' | 'reviewer'): Promise<string> {
  const user = loadDemoData().users.find((u) => u.role === role)!;
  const res = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: user.email, password: user.password }),
  });
  const cookie = res.headers.get('set-cookie')?.split(';')[0];
  if (res.status !== 200 || !cookie) throw new Error(`sign-in failed: ${res.status}`);
  return cookie;
}

async function main(): Promise<void> {
  const seconds = argument('seconds', 10);
  const connections = argument('connections', 50);
  const database = await openBenchDatabase();
  console.log(`database: ${process.env.PL_TEST_ADMIN_URL ? 'scratch cluster from PL_TEST_ADMIN_URL' : 'throwaway cluster (bench-database.ts)'}`);
  let child: ChildProcess | null = null;
  try {
    const sequelize = createDatabase(database.databaseUrl);
    const mission = await MissionModel.findOne({ where: { slug: 'corvina-2' } });
    if (!mission) throw new Error('the demo mission corvina-2 is missing');
    const { runId } = await storeRun(sequelize, { missionId: mission.id, spanDays: 1, outputStepS: 300 });
    await sequelize.close();

    child = fork(fileURLToPath(import.meta.url), ['--serve'], {
      // --profile writes the server's CPU profile to ./bench-profiles (open it in Chrome DevTools).
      execArgv: ['--import', 'tsx', ...(process.argv.includes('--profile') ? ['--cpu-prof', '--cpu-prof-dir=bench-profiles'] : [])],
      env: { ...process.env, PL_BENCH_DATABASE_URL: database.databaseUrl, PL_BENCH_JWT_SECRET: randomBytes(32).toString('hex') },
    });
    const port = await new Promise<number>((resolve) => child!.once('message', (m: { port: number }) => resolve(m.port)));
    const baseUrl = `http://127.0.0.1:${port}`;
    const cookie = await signIn(baseUrl, 'reviewer');
    const url = `${baseUrl}/api/missions/${mission.id}/runs/${runId}/summary`;
    const check = await fetch(url, { headers: { cookie } });
    if (check.status !== 200) throw new Error(`GET summary answered ${check.status}`);

    const load = async (target: string, duration: number) => {
      const options = { url: target, connections, headers: { cookie } };
      await autocannon({ ...options, duration: 2 }); // warm-up: JIT, pool, PostgreSQL caches
      // Every response time, for exact percentiles (autocannon's summary has p97.5 but no p95).
      const times: number[] = [];
      const result = await new Promise<autocannon.Result>((resolve, reject) => {
        const instance = autocannon({ ...options, duration }, (err, done) => (err ? reject(err) : resolve(done)));
        instance.on('response', (_client, _status, _bytes, responseTime) => times.push(responseTime));
      });
      times.sort((a, b) => a - b);
      const percentile = (p: number) => times[Math.min(times.length - 1, Math.ceil((p / 100) * times.length) - 1)]!.toFixed(1);
      const errors = result.errors + result.timeouts + result.non2xx;
      return (
        `${connections} connections, ${duration} s: ${result.requests.total} requests, ${result.requests.average.toFixed(0)} req/s; ` +
        `latency p50 ${percentile(50)} ms, p95 ${percentile(95)} ms, p99 ${percentile(99)} ms, max ${result.latency.max} ms; ` +
        `errors, timeouts or non-2xx ${errors}`
      );
    };
    console.log(`GET summary, ${await load(url, seconds)}`);
    // For scale: the session check alone (requireUser: token and user row), which every route pays.
    console.log(`reference GET /api/me, ${await load(`${baseUrl}/api/me`, Math.max(3, Math.round(seconds / 2)))}`);
  } finally {
    if (child) await new Promise((resolve) => child!.once('exit', resolve).send('stop'));
    await database.close();
  }
}

if (process.argv.includes('--serve')) {
  void serve();
} else {
  main().catch((err: unknown) => {
    console.error(err);
    process.exitCode = 1;
  });
}
