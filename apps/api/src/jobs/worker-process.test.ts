import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { inject } from 'vitest';
import { startApi, type ApiHarness } from '../../test/api-harness';
import { AuditEntryModel, RunResultModel, RunSampleChunkModel } from '../models';
import { SAMPLE_CHUNK_ROWS } from '../services/sample-store';
import { createScenarioRows, isFinished, missionIdBySlug, pollRun } from './run-test-support';

const apiDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const STALE_S = 3;
// Three days of the demo GEO scenario with 1 s steps: about 5 s of computation on the 2-core test
// machine (measured), so a worker can be killed well inside the run. 433 samples at 600 s.
const KILL_SCENARIO = { spanDays: 3, outputStepS: 600, tolerances: { relTol: 1e-10, absTol: 1e-9, maxStepS: 1 } };

/** A worker process (`node --import tsx src/worker.ts`) on the test database. */
interface WorkerProcess {
  child: ChildProcess;
  /** Its one slot's id, as runs' worker_id names it. */
  slotId: string;
  output: () => string;
}

const children: ChildProcess[] = [];

async function startWorkerProcess(): Promise<WorkerProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'src/worker.ts'], {
    cwd: apiDir,
    // Only what the worker needs: the test runner's own variables stay out.
    env: {
      PATH: process.env.PATH,
      HOME: process.env.HOME,
      PL_DATABASE_URL: inject('databaseUrl'),
      PL_WORKER_CONCURRENCY: '1',
      PL_RUN_STALE_SECONDS: String(STALE_S),
      PL_WORKER_POLL_SECONDS: '0.5',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  children.push(child);
  let output = '';
  child.stdout!.on('data', (chunk: Buffer) => (output += chunk.toString()));
  child.stderr!.on('data', (chunk: Buffer) => (output += chunk.toString()));
  const slotId = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`worker did not start:\n${output}`)), 60_000);
    child.stdout!.on('data', () => {
      // The first id is the propagation slot's (other job types' slots follow, comma-separated).
      const ready = /worker ready: ([^\s,]+)[, ]/.exec(output);
      if (ready) {
        clearTimeout(timer);
        resolve(ready[1]!);
      }
    });
    child.once('exit', (code) => reject(new Error(`worker exited with ${code}:\n${output}`)));
  });
  return { child, slotId, output: () => output };
}

const exited = (child: ChildProcess) =>
  child.exitCode !== null || child.signalCode !== null ? Promise.resolve() : new Promise<void>((resolve) => child.once('exit', () => resolve()));

describe('a worker process killed mid-run', () => {
  let api: ApiHarness;

  beforeAll(async () => {
    // No worker in the test process: only the spawned processes take jobs.
    api = await startApi({ PL_WORKERS_IN_PROCESS: '0' });
  });
  afterAll(async () => {
    for (const child of children) {
      if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
      await exited(child);
    }
    await api?.close();
  });

  it('is replaced by another worker, which completes the run once: one result, attempts 2', async () => {
    const engineer = await api.signedIn('engineer');
    const corvina = await missionIdBySlug('corvina-2');
    const rows = await createScenarioRows(api.sequelize, corvina, KILL_SCENARIO);

    const first = await startWorkerProcess();
    const res = await engineer.post(`/api/missions/${corvina}/runs`).send({ scenarioId: rows.scenarioId });
    expect(res.status).toBe(201);
    const runId = (res.body as { id: string }).id;
    const midRun = await pollRun(engineer, corvina, runId, (r) => r.status === 'running' && r.progress > 0 && r.workerId === first.slotId, {
      timeoutMs: 60_000,
    });
    expect(midRun.progress).toBeLessThan(1);

    first.child.kill('SIGKILL');
    await exited(first.child);
    const killedAt = Date.now();
    const second = await startWorkerProcess();
    const done = await pollRun(engineer, corvina, runId, isFinished, { timeoutMs: 120_000, everyMs: 200 });
    const recoveredMs = Date.now() - killedAt;

    expect(done.status, second.output()).toBe('succeeded');
    expect(done.attempts).toBe(2);
    expect(done.workerId).toBe(second.slotId);
    expect(await RunResultModel.count({ where: { runId } })).toBe(1);
    const result = await RunResultModel.findByPk(runId);
    expect(result!.sampleCount).toBe(3 * 86_400 / 600 + 1);
    const chunks = await RunSampleChunkModel.findAll({ where: { runId }, attributes: ['chunkIndex', 'rowCount'], order: [['chunkIndex', 'ASC']] });
    expect(chunks.map((c) => c.chunkIndex)).toEqual([...Array(Math.ceil(result!.sampleCount / SAMPLE_CHUNK_ROWS)).keys()]);
    expect(chunks.reduce((n, c) => n + c.rowCount, 0)).toBe(result!.sampleCount);

    const requeued = await AuditEntryModel.findAll({ where: { entityId: runId, action: 'run-requeued' } });
    expect(requeued.map((a) => a.detail.previousWorkerId)).toEqual([first.slotId]);

    // Figures for the report (not asserted): the second attempt's own run time and the recovery.
    const computeMs = Date.parse(done.finishedAt!) - Date.parse(done.startedAt!);
    console.log(`kill test: run of ${KILL_SCENARIO.spanDays} d computed in ${computeMs} ms by the second worker; ${recoveredMs} ms from the kill to success (stale after ${STALE_S} s)`);

    second.child.kill('SIGTERM');
    await exited(second.child);
    expect(second.child.exitCode).toBe(0);
  });
});
