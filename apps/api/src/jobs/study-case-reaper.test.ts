import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import type PgBoss from 'pg-boss';
import halyardScenario from '@photon-ledger/fixtures/scenarios/halyard-1-spiral.scenario.json' with { type: 'json' };
import type { VehicleSpec } from '@photon-ledger/shared';
import { startApi, type ApiHarness } from '../../test/api-harness';
import { createScenarioRows, missionIdBySlug } from './run-test-support';
import { openQueue } from './queue';
import { reapStaleStudyCases } from './study-case-reaper';

/** An ideal flat sail: cheap cases. */
const idealSail = { kind: 'sail', name: 'Reaper test sail', massKg: 10, centreOfMassM: [0, 0, 0], areaM2: 100, normal: [0, 0, 1], centroidM: [0, 0, 0], optics: 'ideal' } as VehicleSpec;

describe('study cases of a worker that stopped reporting', () => {
  let api: ApiHarness;
  let boss: PgBoss;
  let missionId = '';
  let studyId = '';
  const count = async (sql: string, bind: unknown[]) => Number((await api.sequelize.query<{ n: string }>(sql, { bind, type: QueryTypes.SELECT }))[0]!.n);

  beforeAll(async () => {
    // No worker: the cases stay where this test puts them.
    api = await startApi();
    boss = await openQueue(api.config.PL_DATABASE_URL, { maxConnections: 2, maintenance: false });
    missionId = await missionIdBySlug('corvina-2');
    // Without the file's name: createScenarioRows then makes a unique one (other files use this scenario too).
    const { requirements: _r, vehicle: _v, name: _n, ...spiral } = structuredClone(halyardScenario) as Record<string, unknown>;
    const rows = await createScenarioRows(api.sequelize, missionId, { ...spiral, spanDays: 1, outputStepS: 21_600, forces: { planets: [], srp: true } }, idealSail);
    const engineer = await api.signedIn('engineer');
    const res = await engineer
      .post(`/api/missions/${missionId}/studies`)
      .send({ name: 'Reaper test', scenarioId: rows.scenarioId, design: { kind: 'grid', parameters: [{ path: 'vehicle.massKg', values: [5, 10, 20] }] }, lines: ['sail.loading'] });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    studyId = res.body.id as string;
  }, 120_000);
  afterAll(async () => {
    await boss?.stop({ graceful: false, wait: true });
    await api?.close();
  });

  it('queues a stale running case again with a new job, once, and leaves fresh ones alone', async () => {
    const [stale, fresh] = await api.sequelize.query<{ id: string }>('SELECT id FROM study_cases WHERE study_id = $1 ORDER BY id LIMIT 2', { bind: [studyId], type: QueryTypes.SELECT });
    await api.sequelize.query(`UPDATE study_cases SET status = 'running', worker_id = 'dead-host:1:0', heartbeat_at = now() - interval '1 hour' WHERE id = $1`, { bind: [stale!.id] });
    await api.sequelize.query(`UPDATE study_cases SET status = 'running', worker_id = 'live-host:1:0', heartbeat_at = now() WHERE id = $1`, { bind: [fresh!.id] });
    const jobsBefore = await count(`SELECT count(*) AS n FROM pgboss.job WHERE name = 'study-case' AND data->>'caseId' = $1`, [stale!.id]);

    // Two reapers at once: the case goes back exactly once.
    const [a, b] = await Promise.all([reapStaleStudyCases(api.sequelize, boss, 30), reapStaleStudyCases(api.sequelize, boss, 30)]);
    expect([...a, ...b]).toEqual([stale!.id]);
    const status = async (id: string) => (await api.sequelize.query<{ status: string }>('SELECT status FROM study_cases WHERE id = $1', { bind: [id], type: QueryTypes.SELECT }))[0]!.status;
    expect(await status(stale!.id)).toBe('queued');
    expect(await status(fresh!.id)).toBe('running');
    expect(await count(`SELECT count(*) AS n FROM pgboss.job WHERE name = 'study-case' AND data->>'caseId' = $1`, [stale!.id])).toBe(jobsBefore + 1);
  });

  it('cancels instead of queuing when the study was cancelled', async () => {
    const [row] = await api.sequelize.query<{ id: string }>(`SELECT id FROM study_cases WHERE study_id = $1 AND status = 'running'`, { bind: [studyId], type: QueryTypes.SELECT });
    await api.sequelize.query(`UPDATE study_cases SET heartbeat_at = now() - interval '1 hour' WHERE id = $1`, { bind: [row!.id] });
    await api.sequelize.query('UPDATE trade_studies SET cancel_requested = true WHERE id = $1', { bind: [studyId] });
    expect(await reapStaleStudyCases(api.sequelize, boss, 30)).toEqual([]);
    const [after] = await api.sequelize.query<{ status: string }>('SELECT status FROM study_cases WHERE id = $1', { bind: [row!.id], type: QueryTypes.SELECT });
    expect(after!.status).toBe('cancelled');
  });
});
