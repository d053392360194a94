import { readFileSync } from 'node:fs';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import type PgBoss from 'pg-boss';
import { startApi, type ApiHarness } from '../../test/api-harness';
import { claimChunk, reapStaleTableChunks } from './coefficient-table-job';
import { openQueue } from './queue';
import { missionIdBySlug } from './run-test-support';

const boxWingObj = readFileSync(new URL('../../../../fixtures/meshes/corvina-2-box-wing.obj', import.meta.url));

describe('coefficient-table chunks of a worker that stopped reporting', () => {
  let api: ApiHarness;
  let boss: PgBoss;
  let engineer: Awaited<ReturnType<ApiHarness['signedIn']>>;
  let missionId = '';
  let meshId = '';

  const one = async <T extends object>(sql: string, bind: unknown[]) => (await api.sequelize.query<T>(sql, { bind, type: QueryTypes.SELECT }))[0]!;
  const jobCount = async (chunkId: string) =>
    Number((await one<{ n: string }>(`SELECT count(*) AS n FROM pgboss.job WHERE name = 'coefficient-table-chunk' AND data->>'chunkId' = $1`, [chunkId])).n);
  const makeStale = (chunkId: string) => api.sequelize.query(`UPDATE coefficient_table_chunks SET heartbeat_at = now() - interval '1 hour' WHERE id = $1`, { bind: [chunkId] });

  /** A new queued table (no worker runs here) and its chunk ids in order. */
  async function newTable(): Promise<{ tableId: string; chunkIds: string[]; body: object }> {
    const absorbed = Math.round(Math.random() * 1e6) / 1e7;
    const body = { optics: { default: { front: { absorbed, specular: 0.2, diffuse: 0.8 - absorbed } } }, table: { stepDeg: 15, samplesPerFacet: 1 } };
    const res = await engineer.post(`/api/missions/${missionId}/meshes/${meshId}/tables`).send(body);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const chunks = await api.sequelize.query<{ id: string }>('SELECT id FROM coefficient_table_chunks WHERE table_id = $1 ORDER BY chunk_index', {
      bind: [res.body.id],
      type: QueryTypes.SELECT,
    });
    return { tableId: res.body.id as string, chunkIds: chunks.map((c) => c.id), body };
  }

  beforeAll(async () => {
    api = await startApi();
    boss = await openQueue(api.config.PL_DATABASE_URL, { maxConnections: 2, maintenance: false });
    missionId = await missionIdBySlug('corvina-2');
    engineer = await api.signedIn('engineer');
    const res = await engineer
      .post(`/api/missions/${missionId}/meshes`)
      .field('units', 'm')
      .field('name', `Reaper mesh ${randomUUID().slice(0, 8)}`)
      .attach('file', boxWingObj, 'box-wing.obj');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    meshId = res.body.id as string;
  }, 60_000);
  afterAll(async () => {
    await boss?.stop({ graceful: false, wait: true });
    await api?.close();
  });

  it('queues a stale chunk again with a new job once, then fails it and its table', async () => {
    const { tableId, chunkIds, body } = await newTable();
    const [stale, fresh] = chunkIds;
    expect(await claimChunk(api.sequelize, stale!, 'dead-host:1:table-0', 30)).not.toBeNull();
    expect(await claimChunk(api.sequelize, fresh!, 'live-host:1:table-0', 30)).not.toBeNull();
    // A chunk held by a live worker cannot be claimed by another.
    expect(await claimChunk(api.sequelize, fresh!, 'other-host:1:table-0', 30)).toBeNull();
    expect((await one<{ status: string }>('SELECT status FROM coefficient_tables WHERE id = $1', [tableId])).status).toBe('running');
    await makeStale(stale!);
    const jobsBefore = await jobCount(stale!);

    // Two reapers at once: the chunk goes back exactly once.
    const [a, b] = await Promise.all([reapStaleTableChunks(api.sequelize, boss, 30), reapStaleTableChunks(api.sequelize, boss, 30)]);
    expect([...a, ...b]).toEqual([stale!]);
    expect(await one('SELECT status, attempts, worker_id FROM coefficient_table_chunks WHERE id = $1', [stale!])).toEqual({ status: 'queued', attempts: 1, worker_id: null });
    expect((await one<{ status: string }>('SELECT status FROM coefficient_table_chunks WHERE id = $1', [fresh!])).status).toBe('running');
    expect(await jobCount(stale!)).toBe(jobsBefore + 1);

    // Its second worker dies too: no third attempt; the table fails and its queued chunks are cancelled.
    expect(await claimChunk(api.sequelize, stale!, 'dead-host:2:table-0', 30)).not.toBeNull();
    await makeStale(stale!);
    expect(await reapStaleTableChunks(api.sequelize, boss, 30)).toEqual([]);
    expect(await one('SELECT status, attempts FROM coefficient_table_chunks WHERE id = $1', [stale!])).toEqual({ status: 'failed', attempts: 2 });
    const table = await one<{ status: string; error: string }>('SELECT status, error FROM coefficient_tables WHERE id = $1', [tableId]);
    expect(table.status).toBe('failed');
    expect(table.error).toMatch(/^chunk 0: its worker stopped reporting 2 times/);
    const left = await api.sequelize.query<{ status: string }>(`SELECT DISTINCT status FROM coefficient_table_chunks WHERE table_id = $1 AND id NOT IN ($2, $3)`, {
      bind: [tableId, stale!, fresh!],
      type: QueryTypes.SELECT,
    });
    expect(left.map((r) => r.status)).toEqual(['cancelled']);
    // Nothing of a failed table can be claimed any more.
    expect(await claimChunk(api.sequelize, chunkIds[2]!, 'live-host:1:table-0', 30)).toBeNull();

    // Asking for the same table again starts a new attempt (a failed table is not reused).
    const again = await engineer.post(`/api/missions/${missionId}/meshes/${meshId}/tables`).send(body);
    expect(again.status).toBe(201);
    expect(again.body).toMatchObject({ status: 'queued', cacheKey: (await one<{ cache_key: string }>('SELECT cache_key FROM coefficient_tables WHERE id = $1', [tableId])).cache_key });
    expect(again.body.id).not.toBe(tableId);
  });

  it('cancels a stale chunk of a cancelled table instead of queuing it', async () => {
    const { tableId, chunkIds } = await newTable();
    expect(await claimChunk(api.sequelize, chunkIds[0]!, 'dead-host:3:table-0', 30)).not.toBeNull();
    expect((await engineer.post(`/api/missions/${missionId}/coefficient-tables/${tableId}/cancel`)).status).toBe(200);
    const statuses = await api.sequelize.query<{ status: string }>('SELECT status FROM coefficient_table_chunks WHERE table_id = $1 ORDER BY chunk_index', { bind: [tableId], type: QueryTypes.SELECT });
    // The running chunk is left to its worker's heartbeat; the queued ones are cancelled at once.
    expect(statuses.map((s) => s.status)).toEqual(['running', ...chunkIds.slice(1).map(() => 'cancelled')]);
    await makeStale(chunkIds[0]!);
    expect(await reapStaleTableChunks(api.sequelize, boss, 30)).toEqual([]);
    expect((await one<{ status: string }>('SELECT status FROM coefficient_table_chunks WHERE id = $1', [chunkIds[0]!])).status).toBe('cancelled');
  });
});
