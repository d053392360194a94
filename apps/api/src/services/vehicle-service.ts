import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import type {
  User,
  VehicleChange,
  VehicleCompare,
  VehicleCreate,
  VehicleDetail,
  VehicleListItem,
  VehicleRevision,
  VehicleRevisionCreate,
  VehicleRevisionSummary,
  VehicleSaved,
  VehicleSpec,
} from '@photon-ledger/shared';
import { AppError, notFound } from '../errors/app-error';
import type { JobSender } from '../jobs/job-sender';
import { VehicleModel, VehicleRevisionModel, audit } from '../models';
import { authorOf, authorsById } from './audit-service';
import { ensureTable, missionMeshForTable, resolveMeshOptics, vehicleTableSummary } from './coefficient-table-service';

/** Most changed paths written into one audit line (the compare route gives them all). */
const AUDIT_PATHS_LIMIT = 20;

/** What a mesh vehicle's listing columns come from: its mesh's triangles and area. */
export interface MeshListing {
  triangleCount: number;
  totalAreaM2: number;
}

/**
 * Columns kept beside each revision's spec so that lists never read the spec. A mesh vehicle
 * lists its mesh's triangle count and area (`mesh` is required for that kind).
 */
export function listingColumnsOf(spec: VehicleSpec, mesh?: MeshListing): Pick<VehicleRevisionSummary, 'kind' | 'massKg' | 'surfaceCount' | 'totalAreaM2'> {
  if (spec.kind === 'plates') {
    return { kind: spec.kind, massKg: spec.massKg, surfaceCount: spec.plates.length, totalAreaM2: spec.plates.reduce((sum, p) => sum + p.areaM2, 0) };
  }
  if (spec.kind === 'mesh') {
    if (!mesh) throw new Error('listingColumnsOf: a mesh vehicle needs its mesh');
    return { kind: spec.kind, massKg: spec.massKg, surfaceCount: mesh.triangleCount, totalAreaM2: mesh.totalAreaM2 };
  }
  return { kind: spec.kind, massKg: spec.massKg, surfaceCount: 1, totalAreaM2: spec.areaM2 };
}

/**
 * For a mesh vehicle: checks that `spec.meshId` is a mesh of the mission and that the optics name
 * only its groups (400 naming `spec.meshId` / `spec.optics.groups.<name>`), and makes sure its
 * coefficient table exists or is queued, in the caller's transaction. Returns the mesh's listing
 * columns; undefined for the other kinds.
 */
async function prepareMeshVehicle(
  transaction: Transaction,
  jobs: JobSender | undefined,
  user: User,
  missionId: string,
  spec: VehicleSpec,
): Promise<MeshListing | undefined> {
  if (spec.kind !== 'mesh') return undefined;
  const mesh = await missionMeshForTable(missionId, spec.meshId, transaction);
  if (!mesh) {
    const message = 'meshId must be the id of a mesh imported into this mission (POST /api/missions/:missionId/meshes)';
    throw new AppError('validation_failed', `spec.meshId: ${message}`, { fields: { 'spec.meshId': message } });
  }
  const optics = resolveMeshOptics(mesh.groups.map((g) => g.name), spec.optics, 'spec.optics');
  if (!jobs) throw new Error('a mesh vehicle is saved only where jobs can be queued (its coefficient table)');
  await ensureTable(transaction, jobs, user, mesh, optics, spec.table);
  return { triangleCount: mesh.triangleCount, totalAreaM2: mesh.totalAreaM2 };
}

function toRevisionSummary(row: VehicleRevisionModel, authors: Awaited<ReturnType<typeof authorsById>>): VehicleRevisionSummary {
  return {
    id: row.id,
    vehicleId: row.vehicleId,
    revision: row.revision,
    note: row.note,
    author: authorOf(authors, row.createdBy),
    createdAt: row.createdAt.toISOString(),
    kind: row.kind as VehicleRevisionSummary['kind'],
    massKg: row.massKg,
    surfaceCount: row.surfaceCount,
    totalAreaM2: row.totalAreaM2,
    sourceUploadId: row.sourceUploadId,
  };
}

function toListItem(vehicle: VehicleModel, latest: VehicleRevisionModel): VehicleListItem {
  return {
    id: vehicle.id,
    missionId: vehicle.missionId,
    name: vehicle.name,
    kind: latest.kind as VehicleListItem['kind'],
    massKg: latest.massKg,
    surfaceCount: latest.surfaceCount,
    totalAreaM2: latest.totalAreaM2,
    revision: latest.revision,
    latestRevisionId: latest.id,
    createdAt: vehicle.createdAt.toISOString(),
    updatedAt: vehicle.updatedAt.toISOString(),
  };
}

/** The mission's vehicles by name, each with its latest revision's listing columns. */
export async function listVehicles(missionId: string): Promise<VehicleListItem[]> {
  const vehicles = await VehicleModel.findAll({ where: { missionId }, order: [['name', 'ASC']] });
  if (vehicles.length === 0) return [];
  const latest = await VehicleRevisionModel.findAll({
    where: { [Op.or]: vehicles.map((v) => ({ vehicleId: v.id, revision: v.latestRevision })) },
    attributes: { exclude: ['spec'] },
  });
  const byVehicle = new Map(latest.map((r) => [r.vehicleId, r]));
  return vehicles.flatMap((v) => {
    const revision = byVehicle.get(v.id);
    return revision ? [toListItem(v, revision)] : [];
  });
}

async function missionVehicle(missionId: string, vehicleId: string, transaction?: Transaction): Promise<VehicleModel> {
  const vehicle = await VehicleModel.findOne({
    where: { id: vehicleId, missionId },
    ...(transaction ? { transaction, lock: transaction.LOCK.UPDATE } : {}),
  });
  if (!vehicle) throw notFound('vehicle');
  return vehicle;
}

async function revisionRow(vehicleId: string, revision: number, transaction?: Transaction): Promise<VehicleRevisionModel> {
  const row = await VehicleRevisionModel.findOne({ where: { vehicleId, revision }, ...(transaction ? { transaction } : {}) });
  if (!row) throw notFound(`revision ${revision} of the vehicle`);
  return row;
}

/** A vehicle with every revision (newest first, without specs) and its latest spec. */
export async function getVehicleDetail(missionId: string, vehicleId: string): Promise<VehicleDetail> {
  const vehicle = await missionVehicle(missionId, vehicleId);
  const revisions = await VehicleRevisionModel.findAll({ where: { vehicleId }, order: [['revision', 'DESC']], attributes: { exclude: ['spec'] } });
  const latest = await revisionRow(vehicleId, vehicle.latestRevision);
  const authors = await authorsById(revisions.map((r) => r.createdBy));
  const spec = latest.spec;
  return {
    ...toListItem(vehicle, latest),
    revisions: revisions.map((r) => toRevisionSummary(r, authors)),
    latestSpec: spec,
    ...(spec.kind === 'mesh' ? { coefficientTable: await vehicleTableSummary(spec) } : {}),
  };
}

/** One revision with its spec. */
export async function getVehicleRevision(missionId: string, vehicleId: string, revision: number): Promise<VehicleRevision> {
  await missionVehicle(missionId, vehicleId);
  const row = await revisionRow(vehicleId, revision);
  const authors = await authorsById([row.createdBy]);
  return { ...toRevisionSummary(row, authors), spec: row.spec };
}

/** What a write of a revision carries besides the spec. */
export interface RevisionWrite {
  note?: string | undefined;
  /** The plate-set upload the revision is made from. */
  sourceUploadId?: string | null;
  /** The queue, for a mesh vehicle's coefficient table. */
  jobs?: JobSender | undefined;
}

function revisionResult(user: User, vehicle: VehicleModel, row: VehicleRevisionModel): VehicleSaved {
  const authors = new Map([[user.id, { id: user.id, displayName: user.displayName }]]);
  return { vehicle: toListItem(vehicle, row), revision: { ...toRevisionSummary(row, authors), spec: row.spec } };
}

/**
 * Creates a vehicle and its revision 1 inside the caller's transaction, audited. A name already
 * used in the mission is a 409 on `name`.
 */
export async function insertVehicle(
  transaction: Transaction,
  user: User,
  missionId: string,
  name: string,
  spec: VehicleSpec,
  write: RevisionWrite = {},
): Promise<VehicleSaved> {
  const columns = listingColumnsOf(spec, await prepareMeshVehicle(transaction, write.jobs, user, missionId, spec));
  let vehicle: VehicleModel;
  try {
    vehicle = await VehicleModel.create({ missionId, name, kind: spec.kind, latestRevision: 1, createdBy: user.id }, { transaction });
  } catch (err) {
    if (err instanceof UniqueConstraintError) {
      throw new AppError('conflict', `a vehicle named "${name}" already exists in this mission`, {
        fields: { name: 'already used by another vehicle of this mission: choose another name' },
        cause: err,
      });
    }
    throw err;
  }
  const row = await VehicleRevisionModel.create(
    { vehicleId: vehicle.id, revision: 1, spec, ...columns, note: write.note ?? '', sourceUploadId: write.sourceUploadId ?? null, createdBy: user.id },
    { transaction },
  );
  await audit(
    {
      userId: user.id,
      missionId,
      action: 'vehicle-created',
      entityType: 'vehicle',
      entityId: vehicle.id,
      detail: { name, revision: 1, kind: spec.kind, ...(write.note ? { note: write.note } : {}), ...(write.sourceUploadId ? { sourceUploadId: write.sourceUploadId } : {}) },
    },
    transaction,
  );
  return revisionResult(user, vehicle, row);
}

/**
 * Adds revision n + 1 inside the caller's transaction, audited. The vehicle row is locked first,
 * so two saves from the same revision cannot both pass: the second gets a 409 on
 * `basedOnRevision`. `specFrom` builds the new spec from the latest one (an upload keeps the
 * non-plate fields).
 */
export async function insertRevision(
  transaction: Transaction,
  user: User,
  missionId: string,
  vehicleId: string,
  basedOnRevision: number,
  specFrom: (latest: VehicleSpec) => VehicleSpec,
  write: RevisionWrite = {},
): Promise<VehicleSaved> {
  const vehicle = await missionVehicle(missionId, vehicleId, transaction);
  if (basedOnRevision !== vehicle.latestRevision) {
    throw new AppError(
      'conflict',
      `revision ${vehicle.latestRevision} of "${vehicle.name}" was saved since revision ${basedOnRevision} that this edit started from; reload it and apply the change again`,
      { fields: { basedOnRevision: `must be the latest revision, ${vehicle.latestRevision}` } },
    );
  }
  const latest = await revisionRow(vehicleId, vehicle.latestRevision, transaction);
  const spec = specFrom(latest.spec);
  const meshListing = await prepareMeshVehicle(transaction, write.jobs, user, missionId, spec);
  const next = vehicle.latestRevision + 1;
  const row = await VehicleRevisionModel.create(
    {
      vehicleId,
      revision: next,
      spec,
      ...listingColumnsOf(spec, meshListing),
      note: write.note ?? '',
      sourceUploadId: write.sourceUploadId ?? null,
      createdBy: user.id,
    },
    { transaction },
  );
  await vehicle.update({ kind: spec.kind, latestRevision: next }, { transaction });
  const changes = diffVehicleSpecs(latest.spec, spec);
  await audit(
    {
      userId: user.id,
      missionId,
      action: 'vehicle-revision-created',
      entityType: 'vehicle',
      entityId: vehicleId,
      detail: {
        revision: next,
        basedOnRevision,
        changeCount: changes.length,
        changed: changes.slice(0, AUDIT_PATHS_LIMIT).map((c) => `${c.change} ${c.path}${c.fields ? ` (${c.fields.join(', ')})` : ''}`),
        ...(write.note ? { note: write.note } : {}),
        ...(write.sourceUploadId ? { sourceUploadId: write.sourceUploadId } : {}),
      },
    },
    transaction,
  );
  return revisionResult(user, vehicle, row);
}

/** `POST .../vehicles`: a vehicle with its revision 1, in one transaction. */
export async function createVehicle(user: User, missionId: string, input: VehicleCreate, jobs?: JobSender): Promise<VehicleSaved> {
  const sequelize = VehicleModel.sequelize!;
  return sequelize.transaction((transaction) => insertVehicle(transaction, user, missionId, input.name, input.spec, { note: input.note, jobs }));
}

/** `POST .../vehicles/:vehicleId/revisions`: the next immutable revision. */
export async function createRevision(user: User, missionId: string, vehicleId: string, input: VehicleRevisionCreate, jobs?: JobSender): Promise<VehicleSaved> {
  const sequelize = VehicleModel.sequelize!;
  return sequelize.transaction((transaction) =>
    insertRevision(transaction, user, missionId, vehicleId, input.basedOnRevision, () => input.spec, { note: input.note, jobs }),
  );
}

/** What changed from revision `from` to revision `to` (either order). */
export async function compareRevisions(missionId: string, vehicleId: string, from: number, to: number): Promise<VehicleCompare> {
  await missionVehicle(missionId, vehicleId);
  const [older, newer] = await Promise.all([revisionRow(vehicleId, from), revisionRow(vehicleId, to)]);
  return { vehicleId, from, to, changes: diffVehicleSpecs(older.spec, newer.spec) };
}

/**
 * A revision of a vehicle of this mission, by revision id (scenarios name their vehicle so);
 * null when it does not exist or belongs to another mission.
 */
export async function findMissionRevision(
  missionId: string,
  revisionId: string,
): Promise<{ revisionId: string; vehicleId: string; vehicleName: string; revision: number } | null> {
  const row = await VehicleRevisionModel.findOne({
    where: { id: revisionId },
    attributes: ['id', 'vehicleId', 'revision'],
    include: [{ model: VehicleModel, as: 'vehicle', where: { missionId }, attributes: ['id', 'name'] }],
  });
  const vehicle = (row as (VehicleRevisionModel & { vehicle?: VehicleModel }) | null)?.vehicle;
  if (!row || !vehicle) return null;
  return { revisionId: row.id, vehicleId: vehicle.id, vehicleName: vehicle.name, revision: row.revision };
}

// ---------------------------------------------------------------------------------------------
// Differences between two specs

/** Top-level keys in the order a reader expects; unknown keys follow. */
const keyOrder = ['kind', 'name', 'description', 'massKg', 'centreOfMassM', 'areaM2', 'cr', 'normal', 'centroidM', 'optics'];

/** Equality of JSON values; object key order does not matter (PostgreSQL's jsonb reorders keys). */
export function jsonEqual(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (Array.isArray(a) || Array.isArray(b)) {
    return Array.isArray(a) && Array.isArray(b) && a.length === b.length && a.every((v, i) => jsonEqual(v, b[i]));
  }
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  const ra = a as Record<string, unknown>;
  const rb = b as Record<string, unknown>;
  const keys = new Set([...Object.keys(ra), ...Object.keys(rb)].filter((k) => ra[k] !== undefined || rb[k] !== undefined));
  return [...keys].every((k) => jsonEqual(ra[k], rb[k]));
}

type Plate = Extract<VehicleSpec, { kind: 'plates' }>['plates'][number];

const platePath = (name: string) => `plates[${JSON.stringify(name)}]`;

/**
 * The changes from `older` to `newer`: one per top-level field, and one per plate matched by
 * name (with the plate keys that differ), so that a moved or edited plate reads as one change
 * and reordering the plates is no change at all.
 */
export function diffVehicleSpecs(older: VehicleSpec, newer: VehicleSpec): VehicleChange[] {
  const a = older as Record<string, unknown>;
  const b = newer as Record<string, unknown>;
  const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])].filter((k) => k !== 'plates');
  keys.sort((x, y) => rank(x) - rank(y) || x.localeCompare(y));
  const changes: VehicleChange[] = [];
  for (const key of keys) {
    const from = a[key];
    const to = b[key];
    if (from === undefined && to === undefined) continue;
    if (from === undefined) changes.push({ path: key, change: 'added', to });
    else if (to === undefined) changes.push({ path: key, change: 'removed', from });
    else if (!jsonEqual(from, to)) changes.push({ path: key, change: 'changed', from, to });
  }
  const olderPlates: Plate[] = older.kind === 'plates' ? older.plates : [];
  const newerPlates: Plate[] = newer.kind === 'plates' ? newer.plates : [];
  const olderByName = new Map(olderPlates.map((p) => [p.name, p]));
  const newerNames = new Set(newerPlates.map((p) => p.name));
  for (const plate of newerPlates) {
    const before = olderByName.get(plate.name);
    if (!before) {
      changes.push({ path: platePath(plate.name), change: 'added', to: plate });
      continue;
    }
    const pa = before as Record<string, unknown>;
    const pb = plate as Record<string, unknown>;
    const fields = [...new Set([...Object.keys(pa), ...Object.keys(pb)])].filter((k) => !jsonEqual(pa[k], pb[k]));
    if (fields.length > 0) changes.push({ path: platePath(plate.name), change: 'changed', fields, from: before, to: plate });
  }
  for (const plate of olderPlates) {
    if (!newerNames.has(plate.name)) changes.push({ path: platePath(plate.name), change: 'removed', from: plate });
  }
  return changes;
}

function rank(key: string): number {
  const i = keyOrder.indexOf(key);
  return i === -1 ? keyOrder.length : i;
}
