import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { apiErrorSchema, runListSchema, runSchema, scenarioSchema, type Run, type Scenario } from '@photon-ledger/shared';
import { parseAttitudeCsv } from '@photon-ledger/srp-core';
import { startApi, type ApiHarness } from '../../test/api-harness';
import { AuditEntryModel, RunModel, RunResultModel, ScenarioModel, UserModel } from '../models';
import { computeRunOutcome, type RunOutcome } from '../services/run-outcome';
import { readSampleChunks } from '../services/sample-store';
import { createAttitudeUpload, createScenarioRows, isFinished, missionIdBySlug, pollRun, readRun, type ScenarioRows } from '../jobs/run-test-support';

// Half a day of the demo GEO scenario at a 600 s output step: 73 samples, well under a second.
const SHORT = { spanDays: 0.5, outputStepS: 600 };
// Steps held to 1 s make three days take several seconds (about 5 s measured on the 2-core test
// machine), long enough to watch progress and to cancel mid-run.
const SLOW = { spanDays: 3, outputStepS: 600, tolerances: { relTol: 1e-10, absTol: 1e-9, maxStepS: 1 } };

/** An attitude profile turning about EQJ +z once a day, a row every 600 s over half a day. */
function spinProfileCsv(): string {
  const rows = ['t_s,q_w,q_x,q_y,q_z'];
  for (let t = 0; t <= 43_200; t += 600) {
    const half = (Math.PI * t) / 86_400;
    rows.push(`${t},${Math.cos(half)},0,0,${Math.sin(half)}`);
  }
  return rows.join('\n');
}

/** A run's stored result and samples (decoded chunks, concatenated). */
async function storedOutcome(api: ApiHarness, runId: string) {
  const result = await RunResultModel.findByPk(runId);
  const chunks: Float64Array[] = [];
  for await (const chunk of readSampleChunks(api.sequelize, runId)) chunks.push(chunk.rows);
  const samples = new Float64Array(chunks.reduce((n, c) => n + c.length, 0));
  let at = 0;
  for (const c of chunks) {
    samples.set(c, at);
    at += c.length;
  }
  return { result, samples, chunkCount: chunks.length };
}

/** Asserts that a stored result holds exactly the numbers of a direct computation (wall time aside). */
async function expectStoredEquals(api: ApiHarness, runId: string, direct: RunOutcome) {
  const { result, samples, chunkCount } = await storedOutcome(api, runId);
  expect(result).not.toBeNull();
  const { integrator: storedIntegrator, ...storedSummary } = result!.summary as RunOutcome['summary'];
  const { integrator: directIntegrator, ...directSummary } = direct.summary;
  expect(storedSummary).toEqual(directSummary);
  expect({ ...storedIntegrator, wallMs: 0 }).toEqual({ ...directIntegrator, wallMs: 0 });
  expect(result!.events).toEqual(direct.events);
  expect(result!.budget).toEqual(JSON.parse(JSON.stringify(direct.budget)));
  expect(result!.layout).toEqual(direct.layout);
  expect(result!.sampleCount).toBe(direct.sampleCount);
  expect(chunkCount).toBe(Math.ceil(direct.sampleCount / 1024));
  // Same code, same inputs, same engine: the numbers are identical, not merely close.
  expect(samples).toEqual(direct.samples);
}

/** The run's snapshot as stored, parsed as the worker parses it. */
async function snapshotOf(runId: string): Promise<Scenario> {
  const run = await RunModel.findByPk(runId, { attributes: ['scenarioSpec'] });
  return scenarioSchema.parse(run!.scenarioSpec);
}

async function auditActions(runId: string): Promise<{ action: string; userId: string | null; detail: Record<string, unknown> }[]> {
  const rows = await AuditEntryModel.findAll({ where: { entityType: 'run', entityId: runId }, order: [['id', 'ASC']] });
  return rows.map((r) => ({ action: r.action, userId: r.userId, detail: r.detail }));
}

describe('analysis runs through the queue (API with one in-process worker)', () => {
  let api: ApiHarness;
  let engineer: Awaited<ReturnType<ApiHarness['signedIn']>>;
  let corvina: string;
  let halyard: string;
  let short: ScenarioRows;
  let firstRunId: string;

  const runsPath = (missionId = corvina) => `/api/missions/${missionId}/runs`;
  const post = async (scenarioId: string): Promise<Run> => {
    const res = await engineer.post(runsPath()).send({ scenarioId });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return runSchema.parse(res.body);
  };

  beforeAll(async () => {
    api = await startApi({ PL_WORKERS_IN_PROCESS: '1' });
    engineer = await api.signedIn('engineer');
    corvina = await missionIdBySlug('corvina-2');
    halyard = await missionIdBySlug('halyard-1');
    short = await createScenarioRows(api.sequelize, corvina, SHORT);
  });
  afterAll(async () => {
    await api?.close();
  });

  it('a short scenario runs through the queue and stores exactly what computeRunOutcome computes', async () => {
    const queued = await post(short.scenarioId);
    firstRunId = queued.id;
    expect(queued).toMatchObject({
      status: 'queued',
      attempts: 0,
      progress: 0,
      scenarioId: short.scenarioId,
      scenarioName: short.scenario.name,
      vehicleRevisionId: short.vehicleRevisionId,
      rerunOf: null,
    });
    const engineerId = (await UserModel.findOne({ where: { role: 'engineer' } }))!.id;
    expect(queued.createdBy).toBe(engineerId);
    // The job went in with the run (same transaction).
    const [jobs] = await api.sequelize.query<{ n: number }>(`SELECT count(*)::int AS n FROM pgboss.job WHERE name = 'propagation' AND data->>'runId' = :id`, {
      replacements: { id: queued.id },
      type: QueryTypes.SELECT,
    });
    expect(jobs!.n).toBe(1);

    const done = await pollRun(engineer, corvina, queued.id, isFinished);
    expect(done).toMatchObject({ status: 'succeeded', progress: 1, attempts: 1, errorMessage: null, cancelRequested: false });
    expect(api.worker!.slotIds).toContain(done.workerId);
    expect(done.startedAt).not.toBeNull();
    expect(Date.parse(done.finishedAt!)).toBeGreaterThanOrEqual(Date.parse(done.startedAt!));

    const snapshot = await snapshotOf(queued.id);
    expect(snapshot).toEqual(scenarioSchema.parse(short.scenario));
    const direct = computeRunOutcome({ scenario: snapshot, vehicle: short.vehicle, vehicleRevisionId: short.vehicleRevisionId })!;
    expect(direct.sampleCount).toBe(73); // 0.5 day / 600 s + 1
    await expectStoredEquals(api, queued.id, direct);

    const actions = await auditActions(queued.id);
    expect(actions.map((a) => a.action)).toEqual(['run-created', 'run-succeeded']);
    expect(actions[0]!.userId).toBe(engineerId);
    expect(actions[1]!.detail).toMatchObject({ workerId: done.workerId, sampleCount: 73 });
  });

  it('a tabulated attitude naming an uploaded profile is read from the upload and gives the direct computation\'s numbers', async () => {
    const csv = spinProfileCsv();
    const profileId = await createAttitudeUpload(corvina, csv);
    const rows = await createScenarioRows(api.sequelize, corvina, { ...SHORT, attitude: { law: 'tabulated', profileId } });
    const run = await pollRun(engineer, corvina, (await post(rows.scenarioId)).id, isFinished);
    expect(run.status, run.errorMessage ?? '').toBe('succeeded');

    const scenario = await snapshotOf(run.id);
    const attitudeProfile = parseAttitudeCsv(csv, { epochUtc: scenario.orbit.epochUtc, field: 'attitude.profileId' });
    const direct = computeRunOutcome({ scenario, vehicle: rows.vehicle, vehicleRevisionId: rows.vehicleRevisionId, attitudeProfile })!;
    await expectStoredEquals(api, run.id, direct);
    // The profile matters: the same orbit in LVLH attitude gives other SRP accelerations.
    const { samples: lvlhSamples } = await storedOutcome(api, firstRunId);
    expect(lvlhSamples).not.toEqual(direct.samples);
  });

  it('a running run reports progress at least every second and ends at 1', async () => {
    const slow = await createScenarioRows(api.sequelize, corvina, SLOW);
    const whileRunning = new Set<number>();
    const run = await pollRun(engineer, corvina, (await post(slow.scenarioId)).id, isFinished, {
      timeoutMs: 120_000,
      seen: (r) => {
        if (r.status === 'running') whileRunning.add(r.progress);
      },
    });
    expect(run.status).toBe('succeeded');
    expect(run.progress).toBe(1);
    const between = [...whileRunning].filter((p) => p > 0 && p < 1);
    expect(between.length, `progress seen while running: ${[...whileRunning].join(', ')}`).toBeGreaterThanOrEqual(2);
  });

  it('cancelling a queued run ends it at once; cancelling a running one stops its computation', async () => {
    const slow = await createScenarioRows(api.sequelize, corvina, SLOW);
    const running = await post(slow.scenarioId);
    await pollRun(engineer, corvina, running.id, (r) => r.status === 'running' && r.progress > 0);
    // The one worker slot is busy: this run waits in the queue.
    const waiting = await post(short.scenarioId);

    const cancelledAtOnce = await engineer.post(`${runsPath()}/${waiting.id}/cancel`);
    expect(cancelledAtOnce.status).toBe(200);
    expect(runSchema.parse(cancelledAtOnce.body)).toMatchObject({ status: 'cancelled', cancelRequested: true, attempts: 0 });

    const asked = await engineer.post(`${runsPath()}/${running.id}/cancel`);
    expect(asked.status).toBe(200);
    expect(runSchema.parse(asked.body)).toMatchObject({ status: 'running', cancelRequested: true });

    const stopped = await pollRun(engineer, corvina, running.id, isFinished);
    expect(stopped.status).toBe('cancelled');
    expect(stopped.progress).toBeLessThan(1);
    expect(stopped.finishedAt).not.toBeNull();
    expect(await RunResultModel.count({ where: { runId: running.id } })).toBe(0);
    expect((await auditActions(running.id)).map((a) => a.action)).toEqual(['run-created', 'run-cancel-requested', 'run-cancelled']);

    // The queued run's job is taken off the queue by the now idle worker, which leaves the run alone.
    const deadline = Date.now() + 30_000;
    for (;;) {
      const [job] = await api.sequelize.query<{ state: string }>(`SELECT state FROM pgboss.job WHERE data->>'runId' = :id`, {
        replacements: { id: waiting.id },
        type: QueryTypes.SELECT,
      });
      if (job?.state === 'completed') break;
      if (Date.now() > deadline) throw new Error(`the cancelled run's job is still ${job?.state}`);
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    expect(await readRun(engineer, corvina, waiting.id)).toMatchObject({ status: 'cancelled', attempts: 0, startedAt: null, workerId: null });

    const again = await engineer.post(`${runsPath()}/${stopped.id}/cancel`);
    expect(again.status).toBe(409);
    expect(apiErrorSchema.parse(again.body).error.code).toBe('conflict');
  });

  it('a run the computation refuses fails with a message naming the field', async () => {
    const broken = 't_s,q_w,q_x,q_y,q_z\n0,1,0,0,0\n600,1,0,0,not-a-number\n';
    const profileId = await createAttitudeUpload(corvina, broken);
    const rows = await createScenarioRows(api.sequelize, corvina, { ...SHORT, attitude: { law: 'tabulated', profileId } });
    const run = await pollRun(engineer, corvina, (await post(rows.scenarioId)).id, isFinished);
    expect(run.status).toBe('failed');
    expect(run.errorMessage).toContain('attitude.profileId row 3, column q_z');
    expect(run.finishedAt).not.toBeNull();
    expect(await RunResultModel.count({ where: { runId: run.id } })).toBe(0);
    expect((await auditActions(run.id)).map((a) => a.action)).toEqual(['run-created', 'run-failed']);
  });

  it('a re-run computes the same snapshot even after the scenario was edited', async () => {
    const scenarioRow = (await ScenarioModel.findByPk(short.scenarioId))!;
    await scenarioRow.update({ spec: { ...scenarioRow.spec, spanDays: 0.25 } });

    const res = await engineer.post(`${runsPath()}/${firstRunId}/rerun`);
    expect(res.status).toBe(201);
    const rerun = runSchema.parse(res.body);
    expect(rerun).toMatchObject({ rerunOf: firstRunId, status: 'queued', scenarioId: short.scenarioId, vehicleRevisionId: short.vehicleRevisionId });
    expect(rerun.id).not.toBe(firstRunId);
    expect(await snapshotOf(rerun.id)).toEqual(await snapshotOf(firstRunId));
    expect((await pollRun(engineer, corvina, rerun.id, isFinished)).status).toBe('succeeded');
    const [first, second] = [await storedOutcome(api, firstRunId), await storedOutcome(api, rerun.id)];
    expect(second.samples).toEqual(first.samples);

    // A new run of the edited scenario takes the new snapshot: a quarter day is 37 samples.
    const edited = await pollRun(engineer, corvina, (await post(short.scenarioId)).id, isFinished);
    expect((await storedOutcome(api, edited.id)).result!.sampleCount).toBe(37);
    expect((await auditActions(rerun.id))[0]).toMatchObject({ action: 'run-rerun', detail: { rerunOf: firstRunId } });
  });

  it('the list is newest first and filters by scenario, status and limit; bad filters name the field', async () => {
    const all = runListSchema.parse((await engineer.get(`${runsPath()}?scenarioId=${short.scenarioId}`)).body).runs;
    expect(all.length).toBeGreaterThanOrEqual(4);
    expect(all.every((r) => r.scenarioId === short.scenarioId)).toBe(true);
    const queuedTimes = all.map((r) => Date.parse(r.queuedAt));
    expect(queuedTimes).toEqual([...queuedTimes].sort((a, b) => b - a));

    const cancelled = runListSchema.parse((await engineer.get(`${runsPath()}?scenarioId=${short.scenarioId}&status=cancelled`)).body).runs;
    expect(cancelled.map((r) => r.status)).toEqual(['cancelled']);
    const one = runListSchema.parse((await engineer.get(`${runsPath()}?limit=1`)).body).runs;
    expect(one).toHaveLength(1);

    const badStatus = await engineer.get(`${runsPath()}?status=done`);
    expect(badStatus.status).toBe(400);
    expect(apiErrorSchema.parse(badStatus.body).error.fields).toHaveProperty('status');
    const badLimit = await engineer.get(`${runsPath()}?limit=0`);
    expect(apiErrorSchema.parse(badLimit.body).error.fields).toHaveProperty('limit');
  });

  it('a scenario of another mission, or no scenario id, is refused with 400 naming scenarioId and nothing is queued', async () => {
    const foreign = await createScenarioRows(api.sequelize, halyard, SHORT);
    const before = await RunModel.count();
    for (const body of [{ scenarioId: foreign.scenarioId }, { scenarioId: 'not-a-uuid' }, {}]) {
      const res = await engineer.post(runsPath()).send(body);
      expect(res.status).toBe(400);
      expect(apiErrorSchema.parse(res.body).error.fields).toHaveProperty('scenarioId');
    }
    expect(await RunModel.count()).toBe(before);
  });

  it('a reviewer reads runs but may not start, cancel or re-run them (403); outside their missions everything is 404', async () => {
    const reviewer = await api.signedIn('reviewer');
    const admin = await api.signedIn('admin');
    const before = await RunModel.count();

    expect((await reviewer.get(runsPath())).status).toBe(200);
    expect((await reviewer.get(`${runsPath()}/${firstRunId}`)).status).toBe(200);
    for (const agent of [reviewer, admin]) {
      const writes = [
        await agent.post(runsPath()).send({ scenarioId: short.scenarioId }),
        await agent.post(`${runsPath()}/${firstRunId}/cancel`),
        await agent.post(`${runsPath()}/${firstRunId}/rerun`),
      ];
      for (const res of writes) {
        expect(res.status).toBe(403);
        expect(apiErrorSchema.parse(res.body).error.code).toBe('forbidden');
      }
    }

    // halyard-1: the reviewer is not a member.
    expect((await reviewer.get(runsPath(halyard))).status).toBe(404);
    expect((await reviewer.post(runsPath(halyard)).send({ scenarioId: short.scenarioId })).status).toBe(404);
    expect((await reviewer.post(`${runsPath(halyard)}/${firstRunId}/cancel`)).status).toBe(404);
    expect(await RunModel.count()).toBe(before);
  });

  it('an unknown run, or one of another mission, answers 404; a malformed run id 400 naming runId', async () => {
    const unknown = '00000000-0000-4000-8000-000000000000';
    expect((await engineer.get(`${runsPath()}/${unknown}`)).status).toBe(404);
    expect((await engineer.post(`${runsPath()}/${unknown}/cancel`)).status).toBe(404);
    expect((await engineer.post(`${runsPath()}/${unknown}/rerun`)).status).toBe(404);
    expect((await engineer.get(`${runsPath(halyard)}/${firstRunId}`)).status).toBe(404);
    const malformed = await engineer.get(`${runsPath()}/nope`);
    expect(malformed.status).toBe(400);
    expect(apiErrorSchema.parse(malformed.body).error.fields).toHaveProperty('runId');
  });
});
