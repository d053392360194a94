import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { runSchema } from '@photon-ledger/shared';
import { startApi, type ApiHarness } from '../../test/api-harness';
import { AuditEntryModel, RunResultModel } from '../models';
import { startWorker, type Worker } from '../worker';
import { createScenarioRows, isFinished, missionIdBySlug, pollRun, readRun } from './run-test-support';

// Two days with 1 s steps: a few seconds of computation, so the worker is stopped mid-run.
const SLOW = { spanDays: 2, outputStepS: 600, tolerances: { relTol: 1e-10, absTol: 1e-9, maxStepS: 1 } };

describe('a worker stopped in an orderly way', () => {
  let api: ApiHarness;
  let replacement: Worker | null = null;

  beforeAll(async () => {
    api = await startApi({ PL_WORKERS_IN_PROCESS: '1' });
  });
  afterAll(async () => {
    await replacement?.stop();
    await api?.close();
  });

  it('gives its run back to the queue at once, and the next worker computes it', async () => {
    const engineer = await api.signedIn('engineer');
    const corvina = await missionIdBySlug('corvina-2');
    const rows = await createScenarioRows(api.sequelize, corvina, SLOW);
    const res = await engineer.post(`/api/missions/${corvina}/runs`).send({ scenarioId: rows.scenarioId });
    const runId = runSchema.parse(res.body).id;
    const running = await pollRun(engineer, corvina, runId, (r) => r.status === 'running' && r.progress > 0);

    await api.worker!.stop();
    const given = await readRun(engineer, corvina, runId);
    expect(given).toMatchObject({ status: 'queued', progress: 0, attempts: 1, workerId: running.workerId, finishedAt: null });
    const [jobs] = await api.sequelize.query<{ n: number }>(`SELECT count(*)::int AS n FROM pgboss.job WHERE data->>'runId' = :runId`, {
      replacements: { runId },
      type: QueryTypes.SELECT,
    });
    expect(jobs!.n).toBe(2); // the first, and the one queued when the run was given back
    const requeued = await AuditEntryModel.findOne({ where: { entityId: runId, action: 'run-requeued' } });
    expect(requeued?.detail).toMatchObject({ reason: 'its worker was stopped', previousWorkerId: running.workerId });

    replacement = await startWorker({ databaseUrl: api.config.PL_DATABASE_URL, concurrency: 1, staleSeconds: 30, pollSeconds: 0.5, sequelize: api.sequelize });
    const done = await pollRun(engineer, corvina, runId, isFinished, { timeoutMs: 120_000 });
    expect(done).toMatchObject({ status: 'succeeded', attempts: 2, workerId: replacement.slotIds[0] });
    expect(await RunResultModel.count({ where: { runId } })).toBe(1);
  });
});
