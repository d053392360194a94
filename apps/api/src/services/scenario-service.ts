import { fn, col, UniqueConstraintError, type Transaction } from 'sequelize';
import type { MissionRegime, Scenario, ScenarioBody, ScenarioDetail, ScenarioListItem, User } from '@photon-ledger/shared';
import { AppError, notFound } from '../errors/app-error';
import { RunModel, ScenarioModel, VehicleModel, VehicleRevisionModel, audit } from '../models';
import { authorOf, authorsById } from './audit-service';
import { findMissionRevision, jsonEqual } from './vehicle-service';
import { isMissionAttitudeProfile } from './upload-service';

/** The central body each mission regime flies about. */
const centralBodyOf: Record<MissionRegime, Scenario['orbit']['centralBody']> = { 'earth-orbit': 'earth', heliocentric: 'sun' };

const badField = (field: string, message: string) => new AppError('validation_failed', `${field}: ${message}`, { fields: { [field]: message } });

/**
 * Checks what the schema cannot: the vehicle revision and the attitude profile belong to this
 * mission, and the orbit's central body fits the mission's regime. Returns the revision id.
 */
async function checkAgainstMission(missionId: string, regime: MissionRegime, body: ScenarioBody): Promise<string> {
  const { spec } = body;
  const expectedBody = centralBodyOf[regime];
  if (spec.orbit.centralBody !== expectedBody) {
    throw badField('spec.orbit.centralBody', `must be '${expectedBody}' in a ${regime} mission`);
  }
  if (!('ref' in spec.vehicle)) throw badField('spec.vehicle.ref', 'must name a vehicle revision of this mission');
  const revision = await findMissionRevision(missionId, spec.vehicle.ref);
  if (!revision) throw badField('spec.vehicle.ref', 'must be the id of a revision of a vehicle of this mission');
  if (spec.attitude.law === 'tabulated' && spec.attitude.profileId !== undefined) {
    if (!(await isMissionAttitudeProfile(missionId, spec.attitude.profileId))) {
      throw badField('spec.attitude.profileId', 'must be the id of an attitude-profile upload of this mission');
    }
  }
  return revision.revisionId;
}

async function runCounts(scenarioIds: string[]): Promise<Map<string, number>> {
  if (scenarioIds.length === 0) return new Map();
  const rows = (await RunModel.findAll({
    where: { scenarioId: scenarioIds },
    attributes: ['scenarioId', [fn('COUNT', col('id')), 'runCount']],
    group: ['scenarioId'],
    raw: true,
  })) as unknown as { scenarioId: string; runCount: string | number }[];
  return new Map(rows.map((r) => [r.scenarioId, Number(r.runCount)]));
}

type ScenarioWithRevision = ScenarioModel & { vehicleRevision?: VehicleRevisionModel & { vehicle?: VehicleModel } };

const withVehicle = {
  model: VehicleRevisionModel,
  as: 'vehicleRevision',
  attributes: ['id', 'revision', 'vehicleId'],
  include: [{ model: VehicleModel, as: 'vehicle', attributes: ['id', 'name'] }],
};

function toListItem(row: ScenarioWithRevision, runCount: number, authors: Awaited<ReturnType<typeof authorsById>>): ScenarioListItem {
  const revision = row.vehicleRevision;
  return {
    id: row.id,
    missionId: row.missionId,
    name: row.name,
    vehicleRevisionId: row.vehicleRevisionId,
    vehicle: { id: revision?.vehicle?.id ?? revision?.vehicleId ?? '', name: revision?.vehicle?.name ?? '', revision: revision?.revision ?? 0 },
    centralBody: row.spec.orbit.centralBody,
    spanDays: row.spec.spanDays,
    attitudeLaw: row.spec.attitude.law,
    runCount,
    author: authorOf(authors, row.createdBy),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

async function detailOf(scenarioId: string): Promise<ScenarioDetail> {
  const row = (await ScenarioModel.findByPk(scenarioId, { include: [withVehicle] })) as ScenarioWithRevision | null;
  if (!row) throw notFound('scenario');
  const [counts, authors] = await Promise.all([runCounts([row.id]), authorsById([row.createdBy])]);
  return { ...toListItem(row, counts.get(row.id) ?? 0, authors), spec: row.spec };
}

/** The mission's scenarios by name. */
export async function listScenarios(missionId: string): Promise<ScenarioListItem[]> {
  const rows = (await ScenarioModel.findAll({ where: { missionId }, include: [withVehicle], order: [['name', 'ASC']] })) as ScenarioWithRevision[];
  const [counts, authors] = await Promise.all([runCounts(rows.map((r) => r.id)), authorsById(rows.map((r) => r.createdBy))]);
  return rows.map((r) => toListItem(r, counts.get(r.id) ?? 0, authors));
}

/** One scenario of the mission with its spec. */
export async function getScenario(missionId: string, scenarioId: string): Promise<ScenarioDetail> {
  const row = await ScenarioModel.findOne({ where: { id: scenarioId, missionId }, attributes: ['id'] });
  if (!row) throw notFound('scenario');
  return detailOf(scenarioId);
}

function duplicateName(err: unknown, name: string): never {
  if (err instanceof UniqueConstraintError) {
    throw new AppError('conflict', `a scenario named "${name}" already exists in this mission`, {
      fields: { name: 'already used by another scenario of this mission: choose another name' },
      cause: err,
    });
  }
  throw err;
}

/** Creates a scenario, audited. */
export async function createScenario(user: User, missionId: string, regime: MissionRegime, body: ScenarioBody): Promise<ScenarioDetail> {
  const vehicleRevisionId = await checkAgainstMission(missionId, regime, body);
  const sequelize = ScenarioModel.sequelize!;
  const id = await sequelize
    .transaction(async (transaction) => {
      const row = await ScenarioModel.create({ missionId, name: body.name, vehicleRevisionId, spec: body.spec, createdBy: user.id }, { transaction });
      await audit(
        { userId: user.id, missionId, action: 'scenario-created', entityType: 'scenario', entityId: row.id, detail: { name: body.name, vehicleRevisionId } },
        transaction,
      );
      return row.id;
    })
    .catch((err: unknown) => duplicateName(err, body.name));
  return detailOf(id);
}

/** Which parts of a scenario an edit changed, for the audit line: `name`, `spec.orbit`... */
function changedParts(before: ScenarioModel, body: ScenarioBody): string[] {
  const changed = before.name === body.name ? [] : ['name'];
  const a = before.spec as Record<string, unknown>;
  const b = body.spec as Record<string, unknown>;
  for (const key of [...new Set([...Object.keys(a), ...Object.keys(b)])].sort()) {
    if (!jsonEqual(a[key], b[key])) changed.push(`spec.${key}`);
  }
  return changed;
}

async function lockedScenario(missionId: string, scenarioId: string, transaction: Transaction): Promise<ScenarioModel> {
  const row = await ScenarioModel.findOne({ where: { id: scenarioId, missionId }, transaction, lock: transaction.LOCK.UPDATE });
  if (!row) throw notFound('scenario');
  return row;
}

/** Replaces a scenario's name and spec, audited with what changed. Runs keep the spec they were made with. */
export async function updateScenario(user: User, missionId: string, regime: MissionRegime, scenarioId: string, body: ScenarioBody): Promise<ScenarioDetail> {
  const vehicleRevisionId = await checkAgainstMission(missionId, regime, body);
  const sequelize = ScenarioModel.sequelize!;
  await sequelize
    .transaction(async (transaction) => {
      const row = await lockedScenario(missionId, scenarioId, transaction);
      const changed = changedParts(row, body);
      if (changed.length === 0) return;
      await row.update({ name: body.name, spec: body.spec, vehicleRevisionId }, { transaction });
      await audit(
        { userId: user.id, missionId, action: 'scenario-updated', entityType: 'scenario', entityId: row.id, detail: { name: body.name, changed } },
        transaction,
      );
    })
    .catch((err: unknown) => duplicateName(err, body.name));
  return detailOf(scenarioId);
}

/**
 * Deletes a scenario that has no runs (409 otherwise), audited. The row is locked first: a run
 * being created at the same moment either commits before (and is counted) or waits and then
 * fails on its foreign key, so no run is deleted with its scenario.
 */
export async function deleteScenario(user: User, missionId: string, scenarioId: string): Promise<void> {
  const sequelize = ScenarioModel.sequelize!;
  await sequelize.transaction(async (transaction) => {
    const row = await lockedScenario(missionId, scenarioId, transaction);
    const runs = await RunModel.count({ where: { scenarioId }, transaction });
    if (runs > 0) {
      throw new AppError('conflict', `scenario "${row.name}" has ${runs} run(s) and cannot be deleted; runs keep the scenario they were made from`);
    }
    await row.destroy({ transaction });
    await audit({ userId: user.id, missionId, action: 'scenario-deleted', entityType: 'scenario', entityId: scenarioId, detail: { name: row.name } }, transaction);
  });
}
