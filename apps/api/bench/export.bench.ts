/**
 * Bench: the CSV ephemeris export of a real propagation of about a million samples, through HTTP.
 * Prints (nothing asserted):
 * - the time to propagate and to store the samples (storeRunOutcome, one transaction);
 * - download rows/s and MB/s (target ≥ 200 000 rows/s);
 * - the serving process's peak RSS, heap and off-heap growth while streaming, for a run of
 *   about 100 000 samples and one of about 1 000 000: streaming should not grow with the run.
 *
 * The API runs in a child process (this file with --serve), so its memory is not mixed with the
 * million samples this process computes, and the client's work does not run on its event loop.
 *
 *   cd apps/api && npx tsx bench/export.bench.ts [--days=30] [--step=2.6] [--profile]
 * Database: a throwaway cluster from bench-database.ts, or the scratch cluster in PL_TEST_ADMIN_URL.
 */
import { fork, type ChildProcess } from 'node:child_process';
import { request } from 'node:http';
import type { AddressInfo } from 'node:net';
import { randomBytes } from 'node:crypto';
import { fileURLToPath } from 'node:url';
import { loadDemoData } from '@photon-ledger/fixtures';
import { configSchema } from '../src/config';
import { createDatabase } from '../src/db';
import { createApp } from '../src/app';
import { MissionModel, RunModel } from '../src/models';
import { computeRunOutcome, storeRunOutcome } from '../src/services/run-outcome';
import { storeRun } from '../test/stored-run';
import { openBenchDatabase } from './bench-database';

const MB = 1024 * 1024;

/** Memory figures the server child reports (bytes). */
interface MemoryReport {
  baseline: NodeJS.MemoryUsage;
  peak: { rss: number; heapUsed: number; external: number; arrayBuffers: number };
}

// ---------------------------------------------------------------- server child

async function serve(): Promise<void> {
  const config = configSchema.parse({
    PL_DATABASE_URL: process.env.PL_BENCH_DATABASE_URL,
    PL_JWT_SECRET: process.env.PL_BENCH_JWT_SECRET,
    PL_PORT: '0',
    PL_LOGIN_LIMIT: '1000',
  });
  const sequelize = createDatabase(config.PL_DATABASE_URL);
  const app = createApp(config, sequelize);
  const server = app.listen(0, '127.0.0.1');
  await new Promise<void>((resolve) => server.once('listening', () => resolve()));
  const gc = (globalThis as { gc?: () => void }).gc;
  let baseline = process.memoryUsage();
  const peak = { rss: 0, heapUsed: 0, external: 0, arrayBuffers: 0 };
  const sample = () => {
    const m = process.memoryUsage();
    peak.rss = Math.max(peak.rss, m.rss);
    peak.heapUsed = Math.max(peak.heapUsed, m.heapUsed);
    peak.external = Math.max(peak.external, m.external);
    peak.arrayBuffers = Math.max(peak.arrayBuffers, m.arrayBuffers);
  };
  setInterval(sample, 10).unref();
  process.on('message', (message: string) => {
    if (message === 'reset') {
      gc?.();
      baseline = process.memoryUsage();
      Object.assign(peak, { rss: baseline.rss, heapUsed: baseline.heapUsed, external: baseline.external, arrayBuffers: baseline.arrayBuffers });
      process.send!({ kind: 'reset' });
    } else if (message === 'report') {
      sample();
      process.send!({ kind: 'report', report: { baseline, peak: { ...peak } } satisfies MemoryReport });
    } else if (message === 'now') {
      process.send!({ kind: 'now', memory: process.memoryUsage() });
    } else if (message === 'stop') {
      server.close(() => void sequelize.close().then(() => process.exit(0)));
    }
  });
  process.send!({ kind: 'listening', port: (server.address() as AddressInfo).port });
}

// ---------------------------------------------------------------- driver

function ask<T>(child: ChildProcess, message: string, kind: string): Promise<T> {
  return new Promise((resolve) => {
    const onMessage = (m: { kind: string }) => {
      if (m.kind !== kind) return;
      child.off('message', onMessage);
      resolve(m as T);
    };
    child.on('message', onMessage);
    child.send(message);
  });
}

async function signIn(port: number): Promise<string> {
  const lead = loadDemoData().users.find((u) => u.role === 'lead')!;
  const body = JSON.stringify({ email: lead.email, password: lead.password });
  return new Promise((resolve, reject) => {
    const req = request(
      { host: '127.0.0.1', port, path: '/api/auth/login', method: 'POST', headers: { 'content-type': 'application/json', 'content-length': Buffer.byteLength(body) } },
      (res) => {
        res.resume();
        const cookie = res.headers['set-cookie']?.[0]?.split(';')[0];
        if (res.statusCode !== 200 || !cookie) reject(new Error(`sign-in failed: ${res.statusCode}`));
        else resolve(cookie);
      },
    );
    req.on('error', reject);
    req.end(body);
  });
}

/** Downloads a path, counting bytes and lines; returns them with the seconds to the last byte. */
function download(port: number, path: string, cookie: string): Promise<{ bytes: number; lines: number; seconds: number; status: number }> {
  return new Promise((resolve, reject) => {
    const started = performance.now();
    const req = request({ host: '127.0.0.1', port, path, headers: { cookie } }, (res) => {
      let bytes = 0;
      let lines = 0;
      res.on('data', (piece: Buffer) => {
        bytes += piece.length;
        for (let i = piece.indexOf(10); i >= 0; i = piece.indexOf(10, i + 1)) lines += 1;
      });
      res.on('end', () => resolve({ bytes, lines, seconds: (performance.now() - started) / 1000, status: res.statusCode ?? 0 }));
      res.on('error', reject);
    });
    req.on('error', reject);
    req.end();
  });
}

function argument(name: string, fallback: number): number {
  const hit = process.argv.find((a) => a.startsWith(`--${name}=`));
  return hit ? Number(hit.slice(name.length + 3)) : fallback;
}

async function storeBenchRun(databaseUrl: string, missionId: string, days: number, step: number) {
  const sequelize = createDatabase(databaseUrl);
  try {
    const { runId, scenario, vehicle, vehicleRevisionId } = await storeRun(sequelize, {
      missionId,
      spanDays: days,
      outputStepS: step,
      status: 'running',
      scenarioName: `Corvina-2 — export bench ${days} d at ${step} s ${randomBytes(3).toString('hex')}`,
    });
    let started = performance.now();
    const outcome = computeRunOutcome({ scenario, vehicle, vehicleRevisionId })!;
    const computeSeconds = (performance.now() - started) / 1000;
    started = performance.now();
    await sequelize.transaction(async (transaction) => {
      await storeRunOutcome(runId, outcome, transaction);
      await RunModel.update({ status: 'succeeded', progress: 1, finishedAt: new Date() }, { where: { id: runId }, transaction });
    });
    const storeSeconds = (performance.now() - started) / 1000;
    return { runId, sampleCount: outcome.sampleCount, computeSeconds, storeSeconds };
  } finally {
    await sequelize.close();
  }
}

async function main(): Promise<void> {
  const days = argument('days', 30);
  const step = argument('step', 2.6);
  const database = await openBenchDatabase();
  console.log(`database: ${process.env.PL_TEST_ADMIN_URL ? 'scratch cluster from PL_TEST_ADMIN_URL' : 'throwaway cluster (bench-database.ts)'}`);
  let child: ChildProcess | null = null;
  try {
    const sequelize = createDatabase(database.databaseUrl);
    const mission = await MissionModel.findOne({ where: { slug: 'corvina-2' } });
    await sequelize.close();
    if (!mission) throw new Error('the demo mission corvina-2 is missing');

    const runs = [];
    for (const [d, label] of [
      [days / 10, 'small'],
      [days, 'large'],
    ] as const) {
      const stored = await storeBenchRun(database.databaseUrl, mission.id, d, step);
      console.log(
        `${label}: corvina-2 ${d} days at ${step} s = ${stored.sampleCount} samples; propagate + budget ${stored.computeSeconds.toFixed(1)} s; ` +
          `store ${stored.storeSeconds.toFixed(1)} s (${Math.round(stored.sampleCount / stored.storeSeconds)} rows/s)`,
      );
      runs.push({ ...stored, label });
    }

    child = fork(fileURLToPath(import.meta.url), ['--serve'], {
      // --profile writes the server's CPU profile to ./bench-profiles (open it in Chrome DevTools).
      execArgv: ['--import', 'tsx', '--expose-gc', ...(process.argv.includes('--profile') ? ['--cpu-prof', '--cpu-prof-dir=bench-profiles'] : [])],
      env: { ...process.env, PL_BENCH_DATABASE_URL: database.databaseUrl, PL_BENCH_JWT_SECRET: randomBytes(32).toString('hex') },
    });
    const { port } = await ask<{ port: number }>(child, '', 'listening');
    const cookie = await signIn(port);

    for (const run of runs) {
      const path = `/api/missions/${mission.id}/runs/${run.runId}/export/ephemeris.csv`;
      await download(port, path, cookie); // warm-up: JIT, connection pool, PostgreSQL cache
      await ask(child, 'reset', 'reset');
      // RSS every half second while streaming: flat if memory does not grow with the rows sent.
      const rssTrace: number[] = [];
      const tracer = setInterval(() => void ask<{ memory: NodeJS.MemoryUsage }>(child!, 'now', 'now').then((m) => rssTrace.push(m.memory.rss)), 500);
      const result = await download(port, path, cookie).finally(() => clearInterval(tracer));
      const { report } = await ask<{ report: MemoryReport }>(child, 'report', 'report');
      const rows = result.lines - 8; // 7 comment lines and the column line
      if (result.status !== 200 || rows !== run.sampleCount) throw new Error(`download of ${run.label} gave status ${result.status}, ${rows} rows`);
      const growth = (k: keyof MemoryReport['peak']) => ((report.peak[k] - report.baseline[k]) / MB).toFixed(1);
      console.log(
        `${run.label}: ${rows} rows, ${(result.bytes / 1e6).toFixed(1)} MB in ${result.seconds.toFixed(2)} s = ` +
          `${Math.round(rows / result.seconds)} rows/s, ${(result.bytes / 1e6 / result.seconds).toFixed(1)} MB/s; ` +
          `server growth while streaming: RSS +${growth('rss')} MB (from ${(report.baseline.rss / MB).toFixed(0)} MB), ` +
          `heap +${growth('heapUsed')} MB, external +${growth('external')} MB, array buffers +${growth('arrayBuffers')} MB`,
      );
      if (rssTrace.length > 0) console.log(`${run.label}: server RSS every 0.5 s while streaming (MB): ${rssTrace.map((b) => (b / MB).toFixed(0)).join(' ')}`);
    }
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
