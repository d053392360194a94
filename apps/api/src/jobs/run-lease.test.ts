import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type PgBoss from 'pg-boss';
import { Op, QueryTypes, type Sequelize } from 'sequelize';
import { inject } from 'vitest';
import { scenarioSchema } from '@photon-ledger/shared';
import { createDatabase } from '../db';
import { AuditEntryModel, RunModel, RunResultModel, RunSampleChunkModel } from '../models';
import { computeRunOutcome, type RunOutcome } from '../services/run-outcome';
import { openQueue, PROPAGATION_QUEUE, sendJob } from './queue';
import { claimRun, finishSucceeded, finishWithoutResult, heartbeat, MAX_RUN_ATTEMPTS } from './run-lease';
import { reapStaleRuns } from './run-reaper';
import { createScenarioRows, missionIdBySlug, type ScenarioRows } from './run-test-support';

const STALE_S = 30;

describe('a worker\'s hold on a run (guarded updates on the run row)', () => {
  let sequelize: Sequelize;
  let boss: PgBoss;
  let rows: ScenarioRows;
  let missionId: string;
  let outcome: RunOutcome;
  const made: string[] = [];

  /** A queued run row of the test scenario (no job: these tests drive the lease by hand). */
  const queuedRun = async (): Promise<string> => {
    const run = await RunModel.create({
      missionId,
      scenarioId: rows.scenarioId,
      vehicleRevisionId: rows.vehicleRevisionId,
      scenarioSpec: rows.scenario,
      createdBy: null,
    });
    made.push(run.id);
    return run.id;
  };
  /** Makes the run's last heartbeat an hour old, as if its worker had died. */
  const goStale = (runId: string) =>
    sequelize.query(`UPDATE runs SET heartbeat_at = now() - interval '1 hour' WHERE id = :runId`, { replacements: { runId } });
  const jobCount = async (runId: string) => {
    const [row] = await sequelize.query<{ n: number }>(`SELECT count(*)::int AS n FROM pgboss.job WHERE name = :queue AND data->>'runId' = :runId`, {
      replacements: { queue: PROPAGATION_QUEUE, runId },
      type: QueryTypes.SELECT,
    });
    return row!.n;
  };
  const mine = <T extends { id: string }>(runs: T[], runId: string) => runs.filter((r) => r.id === runId);

  beforeAll(async () => {
    sequelize = createDatabase(inject('databaseUrl'));
    boss = await openQueue(inject('databaseUrl'), { maintenance: false });
    missionId = await missionIdBySlug('corvina-2');
    rows = await createScenarioRows(sequelize, missionId, { spanDays: 0.1, outputStepS: 600 });
    outcome = computeRunOutcome({ scenario: scenarioSchema.parse(rows.scenario), vehicle: rows.vehicle, vehicleRevisionId: rows.vehicleRevisionId })!;
  });
  afterAll(async () => {
    // Jobs these tests queued must not start work in later test files.
    if (made.length > 0) await RunModel.update({ status: 'cancelled' }, { where: { id: { [Op.in]: made }, status: 'queued' } });
    await boss?.stop({ graceful: false, wait: true });
    await sequelize?.close();
  });

  it('a job sent inside a transaction exists only if the transaction commits', async () => {
    const rolledBack = await queuedRun();
    await sequelize
      .transaction(async (transaction) => {
        await sendJob(boss, PROPAGATION_QUEUE, { runId: rolledBack }, { inTransaction: { sequelize, transaction } });
        expect(await jobCount(rolledBack)).toBe(0); // not visible outside the transaction yet
        throw new Error('roll back');
      })
      .catch(() => {});
    expect(await jobCount(rolledBack)).toBe(0);

    const committed = await queuedRun();
    await sequelize.transaction((transaction) => sendJob(boss, PROPAGATION_QUEUE, { runId: committed }, { inTransaction: { sequelize, transaction } }));
    expect(await jobCount(committed)).toBe(1);
  });

  it('a held run cannot be claimed twice; once stale it is taken back once, and its first worker can no longer finish it', async () => {
    const runId = await queuedRun();
    expect(await claimRun(sequelize, runId, 'host:1:0', STALE_S)).toMatchObject({ id: runId, attempts: 1 });
    // A duplicated job, while the holder is alive: nothing to do.
    expect(await claimRun(sequelize, runId, 'host:2:0', STALE_S)).toBeNull();
    expect(await heartbeat(sequelize, runId, 'host:1:0', 0.4)).toEqual({ held: true, cancelRequested: false });

    await goStale(runId);
    const [first, second] = await Promise.all([reapStaleRuns(sequelize, boss, STALE_S), reapStaleRuns(sequelize, boss, STALE_S)]);
    // Two reapers at once: the guarded UPDATE gives the run to exactly one of them, with one new job.
    expect([...mine(first, runId), ...mine(second, runId)]).toEqual([{ id: runId, missionId, status: 'queued', workerId: 'host:1:0' }]);
    expect(await jobCount(runId)).toBe(1);
    expect(await RunModel.findByPk(runId)).toMatchObject({ status: 'queued', progress: 0 });

    expect(await claimRun(sequelize, runId, 'host:2:0', STALE_S)).toMatchObject({ attempts: 2 });
    // The first worker wakes up: its heartbeat and its result are refused, nothing is written.
    expect(await heartbeat(sequelize, runId, 'host:1:0', 0.9)).toEqual({ held: false, cancelRequested: false });
    expect(await finishSucceeded(sequelize, runId, 'host:1:0', outcome)).toBe(false);
    expect(await RunResultModel.count({ where: { runId } })).toBe(0);

    expect(await finishSucceeded(sequelize, runId, 'host:2:0', outcome)).toBe(true);
    expect(await RunModel.findByPk(runId)).toMatchObject({ status: 'succeeded', progress: 1, workerId: 'host:2:0', attempts: 2 });
    expect(await RunResultModel.count({ where: { runId } })).toBe(1);
    expect(await RunSampleChunkModel.count({ where: { runId } })).toBe(1);
    // A late duplicate of the job finds the run finished.
    expect(await claimRun(sequelize, runId, 'host:3:0', STALE_S)).toBeNull();
    expect(await finishWithoutResult(sequelize, runId, 'host:2:0', 'failed', 'late')).toBe(false);
    const actions = (await AuditEntryModel.findAll({ where: { entityId: runId }, order: [['id', 'ASC']] })).map((a) => a.action);
    expect(actions).toEqual(['run-requeued', 'run-succeeded']);
  });

  it('a stale run with a pending cancel is cancelled rather than queued again', async () => {
    const runId = await queuedRun();
    await claimRun(sequelize, runId, 'host:1:0', STALE_S);
    await RunModel.update({ cancelRequested: true }, { where: { id: runId } });
    expect(await heartbeat(sequelize, runId, 'host:1:0', 0.2)).toEqual({ held: true, cancelRequested: true });
    await goStale(runId);
    expect(mine(await reapStaleRuns(sequelize, boss, STALE_S), runId)).toMatchObject([{ status: 'cancelled' }]);
    expect(await jobCount(runId)).toBe(0);
    expect(await RunModel.findByPk(runId)).toMatchObject({ status: 'cancelled' });
  });

  it(`a run whose workers disappeared ${MAX_RUN_ATTEMPTS} times is failed with a message instead of queued again`, async () => {
    const runId = await queuedRun();
    await claimRun(sequelize, runId, 'host:1:0', STALE_S);
    await RunModel.update({ attempts: MAX_RUN_ATTEMPTS }, { where: { id: runId } });
    await goStale(runId);
    expect(mine(await reapStaleRuns(sequelize, boss, STALE_S), runId)).toMatchObject([{ status: 'failed' }]);
    const run = await RunModel.findByPk(runId);
    expect(run).toMatchObject({ status: 'failed' });
    expect(run!.errorMessage).toContain(`started ${MAX_RUN_ATTEMPTS} times`);
  });

  it('a run with a fresh heartbeat is left alone by the reaper', async () => {
    const runId = await queuedRun();
    await claimRun(sequelize, runId, 'host:1:0', STALE_S);
    expect(mine(await reapStaleRuns(sequelize, boss, STALE_S), runId)).toEqual([]);
    expect(await RunModel.findByPk(runId)).toMatchObject({ status: 'running', workerId: 'host:1:0' });
    await finishWithoutResult(sequelize, runId, 'host:1:0', 'cancelled');
  });
});
