/**
 * The `coefficient-table-chunk` job: compute one band of polar rows of a mesh's SRP coefficient
 * table. Same lease pattern as runs and study cases: the slot claims the chunk row with a guarded
 * UPDATE (only while its table is queued or running), computes in its own thread
 * (coefficient-table-thread.ts) with a heartbeat every second that also writes the table's
 * progress and notices a cancelled table, and stores the band only while it still holds the chunk.
 * The chunk that completes the table (under a transaction-scoped advisory lock on the table)
 * assembles the values with srp-core's assembleCoefficientTable and marks the table succeeded.
 * A chunk whose worker died is queued again once by the reaper (reapStaleTableChunks).
 */
import type PgBoss from 'pg-boss';
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { assembleCoefficientTable, computeCoefficientTableRows, createMeshScene, type MeshOpticsInput, type MeshScene, type TriangleMesh } from '@photon-ledger/srp-core';
import { coefficientTableChunkJobSchema } from '@photon-ledger/shared';
import { audit } from '../models';
import { decodeFloat64, encodeFloat64, TABLE_CHUNK_QUEUE, type ResolvedMeshOptics } from '../services/coefficient-table-service';
import { loadTriangleMesh } from '../services/mesh-service';
import type { StoredTableSettings } from '../models';
import { failureMessage, LeasedSlot } from './leased-slot';
import { sendJob } from './queue';
import type { TableBandInput, TableBandResult } from './coefficient-table-thread-protocol';
import type { JobContext } from './index';

/** Claims of one chunk before the reaper gives up on it (the first claim and one retry). */
export const CHUNK_MAX_ATTEMPTS = 2;

interface ClaimedChunk {
  id: string;
  tableId: string;
  missionId: string;
  chunkIndex: number;
  firstPolarRow: number;
  endPolarRow: number;
  meshId: string;
  cacheKey: string;
  settings: StoredTableSettings;
  optics: ResolvedMeshOptics;
}

/** Takes a queued chunk (or a running one whose holder went silent) of a table still queued or running. */
export async function claimChunk(sequelize: Sequelize, chunkId: string, workerId: string, staleSeconds: number): Promise<ClaimedChunk | null> {
  const [row] = await sequelize.query<{
    id: string;
    table_id: string;
    mission_id: string;
    chunk_index: number;
    first_polar_row: number;
    end_polar_row: number;
    mesh_id: string;
    cache_key: string;
    settings: StoredTableSettings;
    resolved_optics: ResolvedMeshOptics;
  }>(
    `UPDATE coefficient_table_chunks k
        SET status = 'running', worker_id = :workerId, attempts = k.attempts + 1, error = NULL, rows_done = 0,
            started_at = now(), heartbeat_at = now(), updated_at = now()
       FROM coefficient_tables t
      WHERE k.id = :chunkId AND t.id = k.table_id AND t.status IN ('queued','running')
        AND (k.status = 'queued' OR (k.status = 'running' AND k.heartbeat_at < now() - make_interval(secs => :staleSeconds)))
      RETURNING k.id, k.table_id, t.mission_id, k.chunk_index, k.first_polar_row, k.end_polar_row, t.mesh_id, t.cache_key, t.settings, t.resolved_optics`,
    { replacements: { chunkId, workerId, staleSeconds }, type: QueryTypes.SELECT },
  );
  if (!row) return null;
  await sequelize.query(`UPDATE coefficient_tables SET status = 'running', updated_at = now() WHERE id = :tableId AND status = 'queued'`, {
    replacements: { tableId: row.table_id },
  });
  return {
    id: row.id,
    tableId: row.table_id,
    missionId: row.mission_id,
    chunkIndex: row.chunk_index,
    firstPolarRow: row.first_polar_row,
    endPolarRow: row.end_polar_row,
    meshId: row.mesh_id,
    cacheKey: row.cache_key,
    settings: row.settings,
    optics: row.resolved_optics,
  };
}

/** Sets the table's progress from its chunks' rows done (only while it runs); false when the table no longer runs. */
async function writeTableProgress(sequelize: Sequelize, tableId: string, transaction?: Transaction): Promise<boolean> {
  const [row] = await sequelize.query<{ id: string }>(
    `UPDATE coefficient_tables t
        SET progress = LEAST(1, (SELECT COALESCE(sum(rows_done), 0) FROM coefficient_table_chunks WHERE table_id = t.id)::float8 / t.polar_count),
            updated_at = now()
      WHERE t.id = :tableId AND t.status = 'running'
      RETURNING t.id`,
    { replacements: { tableId }, type: QueryTypes.SELECT, ...(transaction ? { transaction } : {}) },
  );
  return Boolean(row);
}

/** Proves the worker alive and records rows done; `cancel` when the table stopped running (cancelled or failed). */
async function chunkHeartbeat(sequelize: Sequelize, chunk: ClaimedChunk, workerId: string, rowsDone: number): Promise<{ held: boolean; cancel: boolean }> {
  const [row] = await sequelize.query<{ id: string }>(
    `UPDATE coefficient_table_chunks SET heartbeat_at = now(), rows_done = :rowsDone, updated_at = now()
      WHERE id = :chunkId AND worker_id = :workerId AND status = 'running' RETURNING id`,
    { replacements: { chunkId: chunk.id, workerId, rowsDone }, type: QueryTypes.SELECT },
  );
  if (!row) return { held: false, cancel: false };
  return { held: true, cancel: !(await writeTableProgress(sequelize, chunk.tableId)) };
}

/** Ends a held chunk without values; false when it was no longer this worker's. */
async function endChunk(
  sequelize: Sequelize,
  chunkId: string,
  workerId: string,
  status: 'failed' | 'cancelled',
  error: string | null,
  transaction?: Transaction,
): Promise<boolean> {
  const [row] = await sequelize.query<{ id: string }>(
    `UPDATE coefficient_table_chunks SET status = :status, error = :error, finished_at = now(), heartbeat_at = now(), updated_at = now()
      WHERE id = :chunkId AND worker_id = :workerId AND status = 'running' RETURNING id`,
    { replacements: { chunkId, workerId, status, error }, type: QueryTypes.SELECT, ...(transaction ? { transaction } : {}) },
  );
  return Boolean(row);
}

/** Fails a table (and cancels its queued chunks) with `error`, inside `transaction`; false when it was no longer queued or running. */
export async function failTable(sequelize: Sequelize, tableId: string, error: string, transaction: Transaction): Promise<boolean> {
  const [row] = await sequelize.query<{ id: string; mission_id: string }>(
    `UPDATE coefficient_tables SET status = 'failed', error = :error, finished_at = now(), updated_at = now()
      WHERE id = :tableId AND status IN ('queued','running') RETURNING id, mission_id`,
    { replacements: { tableId, error }, type: QueryTypes.SELECT, transaction },
  );
  if (!row) return false;
  await sequelize.query(
    `UPDATE coefficient_table_chunks SET status = 'cancelled', finished_at = now(), updated_at = now() WHERE table_id = :tableId AND status = 'queued'`,
    { replacements: { tableId }, transaction },
  );
  await audit({ userId: null, missionId: row.mission_id, action: 'coefficient-table-failed', entityType: 'coefficient-table', entityId: tableId, detail: { error } }, transaction);
  return true;
}

/**
 * Stores a band's values and, when it was the table's last band, assembles the table: one
 * transaction, the table locked (advisory, transaction-scoped) so that two last bands finishing
 * at once assemble it exactly once. False when the chunk was no longer this worker's.
 */
export async function finishChunk(
  sequelize: Sequelize,
  chunk: ClaimedChunk,
  workerId: string,
  values: Float64Array,
  rays: number,
  computeMs: number,
): Promise<boolean> {
  return sequelize.transaction(async (transaction) => {
    const [held] = await sequelize.query<{ id: string }>(
      `UPDATE coefficient_table_chunks
          SET status = 'succeeded', data = :data, rays = :rays, compute_ms = :computeMs, rows_done = end_polar_row - first_polar_row,
              finished_at = now(), heartbeat_at = now(), updated_at = now()
        WHERE id = :chunkId AND worker_id = :workerId AND status = 'running' RETURNING id`,
      { replacements: { chunkId: chunk.id, workerId, data: encodeFloat64(values), rays, computeMs }, type: QueryTypes.SELECT, transaction },
    );
    if (!held) return false;
    await sequelize.query('SELECT pg_advisory_xact_lock(hashtextextended(:lockKey, 0))', { replacements: { lockKey: `coefficient-table-assemble:${chunk.tableId}` }, transaction });
    const [table] = await sequelize.query<{ status: string; chunk_count: number; done: string; rays: number | null; compute_ms: number | null }>(
      `SELECT t.status, t.chunk_count,
              (SELECT count(*) FROM coefficient_table_chunks k WHERE k.table_id = t.id AND k.status = 'succeeded') AS done,
              (SELECT sum(rays) FROM coefficient_table_chunks k WHERE k.table_id = t.id AND k.status = 'succeeded') AS rays,
              (SELECT sum(compute_ms) FROM coefficient_table_chunks k WHERE k.table_id = t.id AND k.status = 'succeeded') AS compute_ms
         FROM coefficient_tables t WHERE t.id = :tableId`,
      { replacements: { tableId: chunk.tableId }, type: QueryTypes.SELECT, transaction },
    );
    if (!table || table.status !== 'running') return true;
    const done = Number(table.done);
    await sequelize.query(`UPDATE coefficient_tables SET chunks_done = :done, updated_at = now() WHERE id = :tableId`, {
      replacements: { tableId: chunk.tableId, done },
      transaction,
    });
    await writeTableProgress(sequelize, chunk.tableId, transaction);
    if (done < table.chunk_count) return true;

    const bands = await sequelize.query<{ data: Buffer }>(
      `SELECT data FROM coefficient_table_chunks WHERE table_id = :tableId AND status = 'succeeded' ORDER BY first_polar_row`,
      { replacements: { tableId: chunk.tableId }, type: QueryTypes.SELECT, transaction },
    );
    const assembled = assembleCoefficientTable(chunk.settings.stepDeg, bands.map((b) => decodeFloat64(b.data)));
    const totalRays = Number(table.rays ?? 0);
    const totalMs = Number(table.compute_ms ?? 0);
    const stats = { rays: totalRays, raysPerSecond: totalMs > 0 ? totalRays / (totalMs / 1000) : 0, computeMs: totalMs };
    await sequelize.query(
      `UPDATE coefficient_tables SET status = 'succeeded', progress = 1, data = :data, stats = CAST(:stats AS jsonb), finished_at = now(), updated_at = now()
        WHERE id = :tableId`,
      { replacements: { tableId: chunk.tableId, data: encodeFloat64(assembled.values), stats: JSON.stringify(stats) }, transaction },
    );
    // The band values are in the table now.
    await sequelize.query(`UPDATE coefficient_table_chunks SET data = NULL WHERE table_id = :tableId`, { replacements: { tableId: chunk.tableId }, transaction });
    await audit(
      {
        userId: null,
        missionId: chunk.missionId,
        action: 'coefficient-table-succeeded',
        entityType: 'coefficient-table',
        entityId: chunk.tableId,
        detail: { chunkCount: table.chunk_count, ...stats },
      },
      transaction,
    );
    return true;
  });
}

/**
 * Takes back every running chunk whose worker has not reported for `staleSeconds`: queued again
 * with a new job when it has been claimed fewer than CHUNK_MAX_ATTEMPTS times, else failed (and
 * its table with it); cancelled when its table stopped running. One transaction; the guarded
 * UPDATE gives each chunk to exactly one of several reapers. Returns the ids queued again.
 */
export async function reapStaleTableChunks(sequelize: Sequelize, boss: PgBoss, staleSeconds: number): Promise<string[]> {
  return sequelize.transaction(async (transaction) => {
    const rows = await sequelize.query<{ id: string; status: string; table_id: string; chunk_index: number; attempts: number }>(
      `UPDATE coefficient_table_chunks k
          SET status = CASE WHEN t.status NOT IN ('queued','running') THEN 'cancelled'
                            WHEN k.attempts >= :maxAttempts THEN 'failed' ELSE 'queued' END,
              error = CASE WHEN t.status IN ('queued','running') AND k.attempts >= :maxAttempts
                           THEN 'its worker stopped reporting ' || k.attempts || ' times' ELSE NULL END,
              finished_at = CASE WHEN t.status NOT IN ('queued','running') OR k.attempts >= :maxAttempts THEN now() ELSE NULL END,
              worker_id = NULL, heartbeat_at = NULL, rows_done = 0, updated_at = now()
         FROM coefficient_tables t
        WHERE t.id = k.table_id AND k.status = 'running'
          AND (k.heartbeat_at IS NULL OR k.heartbeat_at < now() - make_interval(secs => :staleSeconds))
        RETURNING k.id, k.status, k.table_id, k.chunk_index, k.attempts`,
      { replacements: { staleSeconds, maxAttempts: CHUNK_MAX_ATTEMPTS }, type: QueryTypes.SELECT, transaction },
    );
    for (const row of rows.filter((r) => r.status === 'failed')) {
      await failTable(sequelize, row.table_id, `chunk ${row.chunk_index}: its worker stopped reporting ${row.attempts} times`, transaction);
    }
    const queued = rows.filter((r) => r.status === 'queued').map((r) => r.id);
    for (const chunkId of queued) await sendJob(boss, TABLE_CHUNK_QUEUE, { chunkId }, { inTransaction: { sequelize, transaction } });
    return queued;
  });
}

/**
 * Computes every queued chunk of a table on this thread, through the same claim and finish as the
 * job (so the same assembly), for callers with no queue: the demo seeding, which runs before any
 * worker exists. Blocks the event loop for the whole table: only for small tables (the demo's
 * 880 triangles at 10° take about a second). Returns the table's final status.
 */
export async function computeTableHere(sequelize: Sequelize, tableId: string, workerId: string): Promise<string> {
  const chunks = await sequelize.query<{ id: string }>(
    `SELECT id FROM coefficient_table_chunks WHERE table_id = :tableId AND status = 'queued' ORDER BY chunk_index`,
    { replacements: { tableId }, type: QueryTypes.SELECT },
  );
  let scene: MeshScene | null = null;
  for (const { id } of chunks) {
    const chunk = await claimChunk(sequelize, id, workerId, 30);
    if (!chunk) continue;
    const started = performance.now();
    if (!scene) {
      const mesh = await loadTriangleMesh(chunk.meshId);
      if (!mesh) throw new Error(`table ${tableId}: its mesh no longer exists`);
      scene = createMeshScene(mesh, chunk.optics as MeshOpticsInput);
    }
    const rows = computeCoefficientTableRows(scene, chunk.settings, chunk.firstPolarRow, chunk.endPolarRow);
    await finishChunk(sequelize, chunk, workerId, rows.values, rows.rays, performance.now() - started);
  }
  const [row] = await sequelize.query<{ status: string }>('SELECT status FROM coefficient_tables WHERE id = :tableId', {
    replacements: { tableId },
    type: QueryTypes.SELECT,
  });
  return row?.status ?? 'missing';
}

// ---------------------------------------------------------------------------------------------
// The slot

let slotsInProcess = 0;

/** How long a slot keeps fetching chunks itself before it returns to pg-boss's work loop (ms). */
const DRAIN_MS = 30_000;

const tableThreadEntry = new URL('./coefficient-table-thread.ts', import.meta.url);

/** One unit of a worker's concurrency on the table-chunk queue, with its own computation thread; drains the queue like study cases. */
export class TableChunkSlot extends LeasedSlot<TableBandInput, TableBandResult> {
  /** The last mesh loaded (bands of one table follow each other). */
  private meshCache: { meshId: string; mesh: TriangleMesh } | null = null;

  constructor(context: JobContext, hostName: string) {
    super(context, `${hostName}:${process.pid}:table-${slotsInProcess++}`, tableThreadEntry, { queue: TABLE_CHUNK_QUEUE, ms: DRAIN_MS });
  }

  protected async runJob(job: PgBoss.Job<unknown>): Promise<void> {
    const payload = coefficientTableChunkJobSchema.safeParse(job.data);
    if (!payload.success) {
      console.error(`[worker] job ${job.id} on ${job.name} ignored: bad payload`);
      return;
    }
    await this.runChunk(payload.data.chunkId);
  }

  private async meshOf(meshId: string): Promise<TriangleMesh | null> {
    if (this.meshCache?.meshId === meshId) return this.meshCache.mesh;
    const mesh = await loadTriangleMesh(meshId);
    this.meshCache = mesh ? { meshId, mesh } : null;
    return mesh;
  }

  private async runChunk(chunkId: string): Promise<void> {
    const { sequelize, staleSeconds } = this.context;
    const chunk = await claimChunk(sequelize, chunkId, this.workerId, staleSeconds);
    if (!chunk) return;
    if (this.releasing) return this.giveBack(chunkId);
    const mesh = await this.meshOf(chunk.meshId);
    if (!mesh) {
      await sequelize.transaction(async (transaction) => {
        if (await endChunk(sequelize, chunkId, this.workerId, 'failed', 'the mesh no longer exists', transaction)) {
          await failTable(sequelize, chunk.tableId, 'the mesh no longer exists', transaction);
        }
      });
      return;
    }

    let rowsDone = 0;
    const input: TableBandInput = {
      sceneKey: chunk.cacheKey,
      positions: mesh.positions,
      groupOfTriangle: mesh.groupOfTriangle,
      groupNames: [...mesh.groupNames],
      optics: chunk.optics as MeshOpticsInput,
      settings: chunk.settings,
      firstPolarRow: chunk.firstPolarRow,
      endPolarRow: chunk.endPolarRow,
    };
    const { result, lost } = await this.computeHeld(
      input,
      (rows) => {
        rowsDone = rows;
      },
      () => chunkHeartbeat(sequelize, chunk, this.workerId, rowsDone),
      `table chunk ${chunkId}`,
    );
    switch (result.kind) {
      case 'succeeded': {
        const band = result.result;
        if (!(await finishChunk(sequelize, chunk, this.workerId, band.values, band.rays, band.computeMs))) {
          console.warn(`[worker] table chunk ${chunkId} was taken from ${this.workerId} before it finished; its rows are discarded`);
        }
        return;
      }
      case 'cancelled':
        await endChunk(sequelize, chunkId, this.workerId, 'cancelled', null);
        return;
      case 'failed': {
        const message = `chunk ${chunk.chunkIndex} (polar rows ${chunk.firstPolarRow}–${chunk.endPolarRow - 1}): ${failureMessage(result.error)}`;
        await sequelize.transaction(async (transaction) => {
          if (await endChunk(sequelize, chunkId, this.workerId, 'failed', failureMessage(result.error), transaction)) await failTable(sequelize, chunk.tableId, message, transaction);
        });
        return;
      }
      case 'aborted':
        if (this.releasing && !lost) await this.giveBack(chunkId);
    }
  }

  /** The worker is stopping: the chunk goes back to queued with a new job, in one transaction. */
  private async giveBack(chunkId: string): Promise<void> {
    const { sequelize, boss } = this.context;
    await sequelize.transaction(async (transaction) => {
      const [row] = await sequelize.query<{ id: string }>(
        `UPDATE coefficient_table_chunks SET status = 'queued', worker_id = NULL, heartbeat_at = NULL, rows_done = 0,
                attempts = GREATEST(attempts - 1, 0), updated_at = now()
          WHERE id = :chunkId AND worker_id = :workerId AND status = 'running' RETURNING id`,
        { replacements: { chunkId, workerId: this.workerId }, type: QueryTypes.SELECT, transaction },
      );
      if (row) await sendJob(boss, TABLE_CHUNK_QUEUE, { chunkId }, { inTransaction: { sequelize, transaction } });
    });
  }
}
