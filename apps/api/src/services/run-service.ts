/**
 * Analysis runs as the API sees them: make one from a scenario (a snapshot of its spec and vehicle
 * revision, queued as a job in the same transaction), list and read them, cancel, run again.
 * Computing them is the worker's business (jobs/propagation-job.ts).
 */
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import {
  fieldErrors,
  scenarioSchema,
  type Run,
  type RunCreate,
  type RunListQuery,
  type RunStatus,
  type Scenario,
  type User,
} from '@photon-ledger/shared';
import { AppError, notFound } from '../errors/app-error';
import type { JobSender } from '../jobs/job-sender';
import { PROPAGATION_QUEUE } from '../jobs/queue';
import { audit, RunModel, ScenarioModel, UploadModel, VehicleRevisionModel, type MissionModel } from '../models';
import { assertVehicleTableReady } from './coefficient-table-service';

/** What run writes need besides the models. */
export interface RunDeps {
  sequelize: Sequelize;
  jobs: JobSender;
}

interface RunRow {
  id: string;
  mission_id: string;
  scenario_id: string;
  scenario_name: string | null;
  vehicle_revision_id: string;
  status: RunStatus;
  progress: number;
  cancel_requested: boolean;
  error_message: string | null;
  worker_id: string | null;
  attempts: number;
  rerun_of: string | null;
  created_by: string | null;
  queued_at: Date;
  started_at: Date | null;
  heartbeat_at: Date | null;
  finished_at: Date | null;
}

// The scenario's name comes out of the snapshot: the spec itself can be large (inline attitude rows).
const RUN_COLUMNS = `id, mission_id, scenario_id, scenario_spec->>'name' AS scenario_name, vehicle_revision_id, status, progress,
  cancel_requested, error_message, worker_id, attempts, rerun_of, created_by, queued_at, started_at, heartbeat_at, finished_at`;

const iso = (d: Date | null) => (d ? d.toISOString() : null);

function toRun(row: RunRow): Run {
  return {
    id: row.id,
    missionId: row.mission_id,
    scenarioId: row.scenario_id,
    scenarioName: row.scenario_name ?? '',
    vehicleRevisionId: row.vehicle_revision_id,
    status: row.status,
    progress: Number(row.progress),
    cancelRequested: row.cancel_requested,
    errorMessage: row.error_message,
    workerId: row.worker_id,
    attempts: row.attempts,
    rerunOf: row.rerun_of,
    createdBy: row.created_by,
    queuedAt: row.queued_at.toISOString(),
    startedAt: iso(row.started_at),
    heartbeatAt: iso(row.heartbeat_at),
    finishedAt: iso(row.finished_at),
  };
}

/** A run of a mission as the API shows it, or null. */
export async function findRun(sequelize: Sequelize, missionId: string, runId: string, transaction?: Transaction): Promise<Run | null> {
  const [row] = await sequelize.query<RunRow>(`SELECT ${RUN_COLUMNS} FROM runs WHERE id = :runId AND mission_id = :missionId`, {
    replacements: { runId, missionId },
    type: QueryTypes.SELECT,
    ...(transaction ? { transaction } : {}),
  });
  return row ? toRun(row) : null;
}

/** A run of a mission; 404 when the mission has no such run. */
export async function getRun(sequelize: Sequelize, mission: MissionModel, runId: string): Promise<Run> {
  const run = await findRun(sequelize, mission.id, runId);
  if (!run) throw notFound('run');
  return run;
}

/** A mission's runs, newest first, filtered by scenario and status. */
export async function listRuns(sequelize: Sequelize, mission: MissionModel, query: RunListQuery): Promise<Run[]> {
  const rows = await sequelize.query<RunRow>(
    `SELECT ${RUN_COLUMNS} FROM runs
      WHERE mission_id = :missionId
        ${query.scenarioId ? 'AND scenario_id = :scenarioId' : ''}
        ${query.status ? 'AND status = :status' : ''}
      ORDER BY created_at DESC, id
      LIMIT :limit`,
    {
      replacements: { missionId: mission.id, scenarioId: query.scenarioId ?? null, status: query.status ?? null, limit: query.limit },
      type: QueryTypes.SELECT,
    },
  );
  return rows.map(toRun);
}

/** What a new run is made from. */
interface RunSnapshot {
  scenarioId: string;
  vehicleRevisionId: string;
  scenarioSpec: Scenario;
  rerunOf: string | null;
}

/** Inserts a queued run, its audit line and its job, all in one transaction. */
async function queueRun(deps: RunDeps, user: User, mission: MissionModel, snapshot: RunSnapshot): Promise<Run> {
  const { sequelize, jobs } = deps;
  // A mesh vehicle propagates with its coefficient table: 409 until the table has succeeded.
  const revision = await VehicleRevisionModel.findByPk(snapshot.vehicleRevisionId, { attributes: ['id', 'spec'] });
  if (revision) await assertVehicleTableReady(revision.spec, 'the run');
  const runId = await sequelize.transaction(async (transaction) => {
    const run = await RunModel.create(
      {
        missionId: mission.id,
        scenarioId: snapshot.scenarioId,
        vehicleRevisionId: snapshot.vehicleRevisionId,
        scenarioSpec: snapshot.scenarioSpec,
        rerunOf: snapshot.rerunOf,
        createdBy: user.id,
      },
      { transaction },
    );
    await audit(
      {
        userId: user.id,
        missionId: mission.id,
        action: snapshot.rerunOf ? 'run-rerun' : 'run-created',
        entityType: 'run',
        entityId: run.id,
        detail: { scenarioId: snapshot.scenarioId, vehicleRevisionId: snapshot.vehicleRevisionId, ...(snapshot.rerunOf ? { rerunOf: snapshot.rerunOf } : {}) },
      },
      transaction,
    );
    // The job is inserted in this transaction: no run without its job, no job without its run.
    await jobs.send(PROPAGATION_QUEUE, { runId: run.id }, { inTransaction: { sequelize, transaction } });
    return run.id;
  });
  return (await findRun(sequelize, mission.id, runId))!;
}

const scenarioField = 'scenarioId';

/**
 * Makes a run of a scenario of `mission` and queues it: the scenario spec and its vehicle revision
 * are snapshotted, so later edits do not change what this run computes.
 * @throws AppError 400 naming `scenarioId` when the mission has no such scenario, or its spec or
 *   attitude profile cannot be run
 */
export async function createRun(deps: RunDeps, user: User, mission: MissionModel, input: RunCreate): Promise<Run> {
  const scenario = await ScenarioModel.findOne({ where: { id: input.scenarioId, missionId: mission.id } });
  if (!scenario) {
    throw new AppError('validation_failed', 'scenarioId does not name a scenario of this mission', {
      fields: { [scenarioField]: 'scenarioId must name a scenario of this mission' },
    });
  }
  const spec = scenarioSchema.safeParse(scenario.spec);
  if (!spec.success) {
    const problems = Object.entries(fieldErrors(spec.error)).map(([field, message]) => `${field}: ${message}`);
    throw new AppError('validation_failed', `scenario "${scenario.name}" cannot be run until it is fixed: ${problems.join('; ')}`, {
      fields: { [scenarioField]: `the scenario is not valid (${problems[0]})` },
    });
  }
  const attitude = spec.data.attitude;
  if (attitude.law === 'tabulated' && attitude.profileId) {
    const profile = await UploadModel.findOne({ where: { id: attitude.profileId, missionId: mission.id, kind: 'attitude-profile' }, attributes: ['id'] });
    if (!profile) {
      throw new AppError('validation_failed', `scenario "${scenario.name}" names attitude profile ${attitude.profileId}, which this mission has no upload of`, {
        fields: { [scenarioField]: 'the scenario\'s attitude.profileId names no attitude profile uploaded to this mission' },
      });
    }
  }
  return queueRun(deps, user, mission, {
    scenarioId: scenario.id,
    vehicleRevisionId: scenario.vehicleRevisionId,
    scenarioSpec: spec.data,
    rerunOf: null,
  });
}

/** Makes a new run from the same snapshot as `runId` (whatever became of the scenario since). */
export async function rerunRun(deps: RunDeps, user: User, mission: MissionModel, runId: string): Promise<Run> {
  const original = await RunModel.findOne({
    where: { id: runId, missionId: mission.id },
    attributes: ['id', 'scenarioId', 'vehicleRevisionId', 'scenarioSpec'],
  });
  if (!original) throw notFound('run');
  return queueRun(deps, user, mission, {
    scenarioId: original.scenarioId,
    vehicleRevisionId: original.vehicleRevisionId,
    scenarioSpec: original.scenarioSpec,
    rerunOf: original.id,
  });
}

/**
 * Cancels a run: a queued one at once; a running one is asked to stop (its worker ends it as
 * cancelled within about a second). One guarded UPDATE, so it cannot race a worker's claim.
 * @throws AppError 404 for an unknown run, 409 for a finished one
 */
export async function cancelRun(deps: RunDeps, user: User, mission: MissionModel, runId: string): Promise<Run> {
  const { sequelize } = deps;
  return sequelize.transaction(async (transaction) => {
    const [row] = await sequelize.query<{ status: RunStatus }>(
      `UPDATE runs
          SET status = CASE WHEN status = 'queued' THEN 'cancelled' ELSE status END,
              finished_at = CASE WHEN status = 'queued' THEN now() ELSE finished_at END,
              cancel_requested = true, updated_at = now()
        WHERE id = :runId AND mission_id = :missionId AND status IN ('queued', 'running')
        RETURNING status`,
      { replacements: { runId, missionId: mission.id }, type: QueryTypes.SELECT, transaction },
    );
    if (!row) {
      const run = await findRun(sequelize, mission.id, runId, transaction);
      if (!run) throw notFound('run');
      throw new AppError('conflict', `the run has already ${run.status === 'cancelled' ? 'been cancelled' : run.status}: only queued or running runs can be cancelled`);
    }
    await audit(
      {
        userId: user.id,
        missionId: mission.id,
        action: row.status === 'cancelled' ? 'run-cancelled' : 'run-cancel-requested',
        entityType: 'run',
        entityId: runId,
      },
      transaction,
    );
    return (await findRun(sequelize, mission.id, runId, transaction))!;
  });
}
