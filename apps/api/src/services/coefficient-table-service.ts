/**
 * SRP coefficient tables of meshes as the API sees them: resolve a request's optics against the
 * mesh's groups, find the cached table of the same key or create one with its chunk jobs (in the
 * caller's transaction), read its state and values, cancel it, and hand a succeeded table to the
 * jobs that propagate mesh vehicles. Computing the chunks is the worker's business
 * (jobs/coefficient-table-job.ts).
 */
import { createHash } from 'node:crypto';
import { QueryTypes, type Transaction } from 'sequelize';
import { resolvePlateOptics, SrpError, type SrpCoefficientTable, type SurfaceOptics } from '@photon-ledger/srp-core';
import type { CoefficientTableData, CoefficientTableSummary, MeshGroupOptics, MeshTableSettings, User, VehicleSpec } from '@photon-ledger/shared';
import { AppError, notFound } from '../errors/app-error';
import type { JobSender } from '../jobs/job-sender';
import { audit, CoefficientTableChunkModel, CoefficientTableModel, MeshModel, type StoredTableSettings } from '../models';

/** Queue of table chunks: one job per band of polar rows, payload `{ chunkId }`. */
export const TABLE_CHUNK_QUEUE = 'coefficient-table-chunk';

/**
 * Work of one chunk, in facet samples × Sun directions (one shadow ray each, before bounces). About
 * 0.5–1 s on one core of the 2-core test machine; see DEVELOPERS.md for the measured figures.
 */
export const CHUNK_TARGET_SAMPLE_RAYS = 6_000_000;
/** A table is split into at least this many chunks (when it has that many polar rows), so that two or more workers share it. */
export const MIN_TABLE_CHUNKS = 8;

/** One side's optics after presets are resolved (what the scene is built from). */
type ResolvedSide = SurfaceOptics;
/** One group's resolved optics. */
export interface ResolvedGroupOptics {
  front: ResolvedSide;
  back?: ResolvedSide;
}
/** Optics of every group of a mesh, presets resolved: the cache key's second part. */
export interface ResolvedMeshOptics {
  default: ResolvedGroupOptics;
  groups: Record<string, ResolvedGroupOptics>;
}

/** The optics of a request or a mesh vehicle spec. */
export interface MeshOpticsRequest {
  default: MeshGroupOptics;
  groups?: Record<string, MeshGroupOptics> | undefined;
}

function resolveGroup(optics: MeshGroupOptics, field: string): ResolvedGroupOptics {
  const resolved = resolvePlateOptics(optics.front, optics.back, field);
  return { front: { ...resolved.front }, ...(resolved.back ? { back: { ...resolved.back } } : {}) };
}

/**
 * The optics of every group of the mesh with presets resolved to fractions. Every named group must
 * exist in the mesh: 400 naming `<prefix>.groups.<name>`; optics srp-core refuses are a 400 naming
 * the field under `prefix`.
 */
export function resolveMeshOptics(groupNames: readonly string[], optics: MeshOpticsRequest, prefix: string): ResolvedMeshOptics {
  const known = new Set(groupNames);
  for (const name of Object.keys(optics.groups ?? {})) {
    if (!known.has(name)) {
      const message = `the mesh has no group "${name}"; its groups are ${groupNames.map((g) => `"${g}"`).join(', ')}`;
      throw new AppError('validation_failed', `${prefix}.groups.${name}: ${message}`, { fields: { [`${prefix}.groups.${name}`]: message } });
    }
  }
  try {
    const groups: Record<string, ResolvedGroupOptics> = {};
    const fallback = resolveGroup(optics.default, `${prefix}.default`);
    for (const name of groupNames) {
      const own = optics.groups?.[name];
      groups[name] = own ? resolveGroup(own, `${prefix}.groups.${name}`) : fallback;
    }
    return { default: fallback, groups };
  } catch (err) {
    if (!(err instanceof SrpError)) throw err;
    const field = err.details.field ?? prefix;
    throw new AppError('validation_failed', err.message, { fields: { [field]: err.message }, cause: err });
  }
}

/** JSON with object keys sorted at every level: the same value always gives the same text. */
export function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

/** The settings as stored and keyed (exactly the three fields). */
export function tableSettings(settings: MeshTableSettings): StoredTableSettings {
  return { stepDeg: settings.stepDeg, samplesPerFacet: settings.samplesPerFacet, specularBounce: settings.specularBounce };
}

/** SHA-256 over the geometry's SHA-256, the resolved optics and the settings (canonical JSON). */
export function tableCacheKey(geometrySha256: string, optics: ResolvedMeshOptics, settings: StoredTableSettings): string {
  return createHash('sha256').update(`${geometrySha256}\n${canonicalJson(optics)}\n${canonicalJson(settings)}`).digest('hex');
}

/** Grid size of a step (the node layout of mesh-types.ts): poles included, azimuth wrapping. */
export function gridShape(stepDeg: number): { polarCount: number; azimuthCount: number } {
  return { polarCount: Math.round(180 / stepDeg) + 1, azimuthCount: Math.round(360 / stepDeg) };
}

/**
 * Bands of polar rows [first, end): about CHUNK_TARGET_SAMPLE_RAYS of work each, and at least
 * MIN_TABLE_CHUNKS bands when there are that many rows.
 */
export function chunkBands(polarCount: number, azimuthCount: number, triangleCount: number, samplesPerFacet: number): [number, number][] {
  const rowWork = Math.max(1, triangleCount * samplesPerFacet * azimuthCount);
  const byWork = Math.max(1, Math.floor(CHUNK_TARGET_SAMPLE_RAYS / rowWork));
  const bySpread = Math.max(1, Math.ceil(polarCount / MIN_TABLE_CHUNKS));
  const rowsPerChunk = Math.min(byWork, bySpread);
  const bands: [number, number][] = [];
  for (let first = 0; first < polarCount; first += rowsPerChunk) bands.push([first, Math.min(polarCount, first + rowsPerChunk)]);
  return bands;
}

/** A table row as the shared summary. */
export function toTableSummary(row: CoefficientTableModel): CoefficientTableSummary {
  return {
    id: row.id,
    missionId: row.missionId,
    meshId: row.meshId,
    cacheKey: row.cacheKey,
    settings: { stepDeg: row.settings.stepDeg, samplesPerFacet: row.settings.samplesPerFacet, specularBounce: row.settings.specularBounce },
    status: row.status,
    progress: row.progress,
    chunkCount: row.chunkCount,
    chunksDone: row.chunksDone,
    error: row.error,
    stats: row.stats,
    createdAt: row.createdAt.toISOString(),
    finishedAt: row.finishedAt ? row.finishedAt.toISOString() : null,
  };
}

/** The mesh columns a table needs. */
type MeshForTable = Pick<MeshModel, 'id' | 'missionId' | 'triangleCount' | 'geometrySha256'>;

/**
 * The live table of this mesh, optics and settings, or a new one with its chunk jobs queued, all in
 * the caller's transaction (a transaction-scoped advisory lock on the key makes two requests at
 * once agree on one table). A failed or cancelled table of the same key is not reused.
 */
export async function ensureTable(
  transaction: Transaction,
  jobs: JobSender,
  user: User,
  mesh: MeshForTable,
  optics: ResolvedMeshOptics,
  settingsInput: MeshTableSettings,
): Promise<{ table: CoefficientTableModel; created: boolean }> {
  const sequelize = CoefficientTableModel.sequelize!;
  const settings = tableSettings(settingsInput);
  const cacheKey = tableCacheKey(mesh.geometrySha256, optics, settings);
  await sequelize.query('SELECT pg_advisory_xact_lock(hashtextextended(:lockKey, 0))', {
    replacements: { lockKey: `coefficient-table:${mesh.missionId}:${cacheKey}` },
    transaction,
  });
  const live = await findLiveTable(mesh.missionId, cacheKey, transaction);
  if (live) return { table: live, created: false };

  const { polarCount, azimuthCount } = gridShape(settings.stepDeg);
  const bands = chunkBands(polarCount, azimuthCount, mesh.triangleCount, settings.samplesPerFacet);
  const table = await CoefficientTableModel.create(
    {
      missionId: mesh.missionId,
      meshId: mesh.id,
      cacheKey,
      settings,
      resolvedOptics: optics as unknown as Record<string, unknown>,
      polarCount,
      azimuthCount,
      chunkCount: bands.length,
      createdBy: user.id,
    },
    { transaction },
  );
  const chunks = await CoefficientTableChunkModel.bulkCreate(
    bands.map(([firstPolarRow, endPolarRow], chunkIndex) => ({ tableId: table.id, chunkIndex, firstPolarRow, endPolarRow })),
    { transaction, returning: ['id'] },
  );
  for (const chunk of chunks) await jobs.send(TABLE_CHUNK_QUEUE, { chunkId: chunk.id }, { inTransaction: { sequelize, transaction } });
  await audit(
    {
      userId: user.id,
      missionId: mesh.missionId,
      action: 'coefficient-table-requested',
      entityType: 'coefficient-table',
      entityId: table.id,
      detail: { meshId: mesh.id, cacheKey, ...settings, chunkCount: bands.length },
    },
    transaction,
  );
  return { table, created: true };
}

async function findLiveTable(missionId: string, cacheKey: string, transaction?: Transaction): Promise<CoefficientTableModel | null> {
  return CoefficientTableModel.findOne({
    where: { missionId, cacheKey, status: ['queued', 'running', 'succeeded'] },
    ...(transaction ? { transaction } : {}),
  });
}

/** A mesh of the mission with the columns a table needs; null when there is none. */
export async function missionMeshForTable(missionId: string, meshId: string, transaction?: Transaction): Promise<MeshModel | null> {
  return MeshModel.findOne({
    where: { id: meshId, missionId },
    attributes: ['id', 'missionId', 'name', 'triangleCount', 'geometrySha256', 'groups', 'totalAreaM2'],
    ...(transaction ? { transaction } : {}),
  });
}

/** `POST .../meshes/:meshId/tables`: the cached table (created false) or a new one. */
export async function requestTable(
  jobs: JobSender,
  user: User,
  missionId: string,
  meshId: string,
  input: { optics: MeshOpticsRequest; table: MeshTableSettings },
): Promise<{ summary: CoefficientTableSummary; created: boolean }> {
  const mesh = await missionMeshForTable(missionId, meshId);
  if (!mesh) throw notFound('mesh');
  const optics = resolveMeshOptics(mesh.groups.map((g) => g.name), input.optics, 'optics');
  const sequelize = CoefficientTableModel.sequelize!;
  const { table, created } = await sequelize.transaction((transaction) => ensureTable(transaction, jobs, user, mesh, optics, input.table));
  return { summary: toTableSummary(table), created };
}

/** A table of the mission; 404 when there is none. */
export async function getTable(missionId: string, tableId: string): Promise<CoefficientTableSummary> {
  const row = await CoefficientTableModel.findOne({ where: { id: tableId, missionId } });
  if (!row) throw notFound('coefficient table');
  return toTableSummary(row);
}

/** Decodes stored little-endian float64 values. */
export function decodeFloat64(buffer: Buffer): Float64Array {
  const values = new Float64Array(buffer.length / 8);
  for (let i = 0; i < values.length; i++) values[i] = buffer.readDoubleLE(i * 8);
  return values;
}

/** Encodes values as little-endian float64. */
export function encodeFloat64(values: Float64Array): Buffer {
  const buffer = Buffer.allocUnsafe(values.length * 8);
  for (let i = 0; i < values.length; i++) buffer.writeDoubleLE(values[i]!, i * 8);
  return buffer;
}

function tableFromRow(row: CoefficientTableModel): SrpCoefficientTable {
  return { stepDeg: row.settings.stepDeg, polarCount: row.polarCount, azimuthCount: row.azimuthCount, values: decodeFloat64(row.data!) };
}

/** Why a table is not usable yet, in words (status and progress). */
export function tableNotReadyMessage(row: Pick<CoefficientTableModel, 'status' | 'progress' | 'error'>): string {
  const percent = Math.floor(row.progress * 100);
  switch (row.status) {
    case 'queued':
      return 'its coefficient table is queued (0 % done)';
    case 'running':
      return `its coefficient table is running (${percent} % done)`;
    case 'failed':
      return `its coefficient table failed (${row.error ?? 'no reason recorded'}); save the vehicle again or request the table again to retry`;
    case 'cancelled':
      return 'its coefficient table was cancelled; save the vehicle again or request the table again to compute it';
    default:
      return `its coefficient table is ${row.status}`;
  }
}

/** `GET .../coefficient-tables/:tableId/data`: 409 until the table has succeeded. */
export async function getTableData(missionId: string, tableId: string): Promise<CoefficientTableData> {
  const row = await CoefficientTableModel.unscoped().findOne({ where: { id: tableId, missionId } });
  if (!row) throw notFound('coefficient table');
  if (row.status !== 'succeeded' || !row.data) {
    throw new AppError('conflict', `the table has no values yet: ${tableNotReadyMessage(row).replace(/^its coefficient table /, 'it ')}`);
  }
  const table = tableFromRow(row);
  return { id: row.id, stepDeg: table.stepDeg, polarCount: table.polarCount, azimuthCount: table.azimuthCount, values: Array.from(table.values) };
}

/**
 * Cancels a queued or running table: its queued chunks are cancelled at once, running ones stop
 * at their next heartbeat. 409 when the table has already finished.
 */
export async function cancelTable(user: User, missionId: string, tableId: string): Promise<CoefficientTableSummary> {
  const sequelize = CoefficientTableModel.sequelize!;
  return sequelize.transaction(async (transaction) => {
    const [row] = await sequelize.query<{ id: string }>(
      `UPDATE coefficient_tables SET status = 'cancelled', finished_at = now(), updated_at = now()
        WHERE id = :tableId AND mission_id = :missionId AND status IN ('queued','running') RETURNING id`,
      { replacements: { tableId, missionId }, type: QueryTypes.SELECT, transaction },
    );
    if (!row) {
      const existing = await CoefficientTableModel.findOne({ where: { id: tableId, missionId }, transaction });
      if (!existing) throw notFound('coefficient table');
      throw new AppError('conflict', `the table has already ${existing.status === 'cancelled' ? 'been cancelled' : existing.status}: only queued or running tables can be cancelled`);
    }
    await sequelize.query(
      `UPDATE coefficient_table_chunks SET status = 'cancelled', finished_at = now(), updated_at = now() WHERE table_id = :tableId AND status = 'queued'`,
      { replacements: { tableId }, transaction },
    );
    await audit({ userId: user.id, missionId, action: 'coefficient-table-cancelled', entityType: 'coefficient-table', entityId: tableId, detail: {} }, transaction);
    return toTableSummary((await CoefficientTableModel.findByPk(tableId, { transaction }))!);
  });
}

type MeshVehicleSpec = Extract<VehicleSpec, { kind: 'mesh' }>;

/**
 * The table a mesh vehicle spec uses: the live one of its key, else the latest attempt (failed or
 * cancelled); null when none was ever made (or the mesh is gone).
 */
export async function findVehicleTable(spec: MeshVehicleSpec, transaction?: Transaction): Promise<CoefficientTableModel | null> {
  const mesh = await MeshModel.findByPk(spec.meshId, { attributes: ['id', 'missionId', 'geometrySha256', 'groups'], ...(transaction ? { transaction } : {}) });
  if (!mesh) return null;
  let optics: ResolvedMeshOptics;
  try {
    optics = resolveMeshOptics(mesh.groups.map((g) => g.name), spec.optics, 'optics');
  } catch {
    return null;
  }
  const cacheKey = tableCacheKey(mesh.geometrySha256, optics, tableSettings(spec.table));
  const live = await findLiveTable(mesh.missionId, cacheKey, transaction);
  if (live) return live;
  return CoefficientTableModel.findOne({ where: { missionId: mesh.missionId, cacheKey }, order: [['createdAt', 'DESC']], ...(transaction ? { transaction } : {}) });
}

/** Summary of a mesh vehicle's table (null when none exists). */
export async function vehicleTableSummary(spec: MeshVehicleSpec): Promise<CoefficientTableSummary | null> {
  const row = await findVehicleTable(spec);
  return row ? toTableSummary(row) : null;
}

/** A mesh vehicle's table cannot be used (none, or not succeeded): the message says why. */
export class VehicleTableError extends Error {}

/**
 * The values of a mesh vehicle's table, for propagation.
 * @throws VehicleTableError with the reason (status and progress) when it has not succeeded
 */
export async function loadVehicleTable(spec: MeshVehicleSpec): Promise<SrpCoefficientTable> {
  const row = await findVehicleTable(spec);
  if (!row) throw new VehicleTableError(`vehicle.meshId: mesh ${spec.meshId} has no coefficient table for these optics and settings`);
  if (row.status !== 'succeeded') throw new VehicleTableError(`vehicle: ${tableNotReadyMessage(row)}`);
  const full = await CoefficientTableModel.unscoped().findByPk(row.id);
  return tableFromRow(full!);
}

/**
 * A mesh vehicle can be computed only once its table has succeeded: 409 saying the table's status
 * and progress otherwise (`what` names what was asked for, e.g. `the run`). Other kinds pass.
 */
export async function assertVehicleTableReady(spec: VehicleSpec, what: string): Promise<void> {
  if (spec.kind !== 'mesh') return;
  const row = await findVehicleTable(spec);
  if (!row) {
    throw new AppError('conflict', `${what} cannot start: the mesh vehicle "${spec.name}" has no coefficient table; save the vehicle again to queue it`);
  }
  if (row.status !== 'succeeded') {
    throw new AppError('conflict', `${what} cannot start yet: the mesh vehicle "${spec.name}" is not ready, ${tableNotReadyMessage(row)}`);
  }
}
