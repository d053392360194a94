/**
 * A worker's hold on a run, all in guarded UPDATEs on the run row: claim it, prove it is alive
 * (heartbeat), finish it, or give it back. Every write after the claim carries
 * `worker_id = <this worker> AND status = 'running'`, so once a run has been taken back from a
 * worker that stopped reporting, nothing that worker does later can touch it: a retried or
 * duplicated job leaves exactly one result.
 */
import type PgBoss from 'pg-boss';
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { audit } from '../models';
import { storeRunOutcome, type RunOutcome } from '../services/run-outcome';
import { PROPAGATION_QUEUE, sendJob } from './queue';

/** A run this worker now holds (status running), with what computing it needs. */
export interface ClaimedRun {
  id: string;
  missionId: string;
  /** The scenario snapshot as stored (validated again by the caller: it comes off the database). */
  scenarioSpec: unknown;
  vehicleRevisionId: string;
  attempts: number;
}

/**
 * Takes a run for `workerId`: a queued run, or a running one whose worker has not reported for
 * `staleSeconds` (its holder is presumed dead). Null when the run is finished, cancelled, held by
 * a live worker, or unknown: the job then has nothing to do.
 */
export async function claimRun(sequelize: Sequelize, runId: string, workerId: string, staleSeconds: number): Promise<ClaimedRun | null> {
  const [row] = await sequelize.query<{ id: string; mission_id: string; scenario_spec: unknown; vehicle_revision_id: string; attempts: number }>(
    `UPDATE runs
        SET status = 'running', worker_id = :workerId, attempts = attempts + 1, progress = 0,
            error_message = NULL, started_at = now(), heartbeat_at = now(), updated_at = now()
      WHERE id = :runId AND NOT cancel_requested
        AND (status = 'queued' OR (status = 'running' AND heartbeat_at < now() - make_interval(secs => :staleSeconds)))
      RETURNING id, mission_id, scenario_spec, vehicle_revision_id, attempts`,
    { replacements: { runId, workerId, staleSeconds }, type: QueryTypes.SELECT },
  );
  if (!row) return null;
  return { id: row.id, missionId: row.mission_id, scenarioSpec: row.scenario_spec, vehicleRevisionId: row.vehicle_revision_id, attempts: row.attempts };
}

/** What a heartbeat learns. */
export interface HeartbeatAnswer {
  /** False when the run is no longer this worker's (taken back, or finished elsewhere): stop computing. */
  held: boolean;
  /** Someone asked for the run to stop. */
  cancelRequested: boolean;
}

/** Records progress (0..1) and that the worker is alive; reads whether a cancel was asked for. */
export async function heartbeat(sequelize: Sequelize, runId: string, workerId: string, progress: number): Promise<HeartbeatAnswer> {
  const [row] = await sequelize.query<{ cancel_requested: boolean }>(
    `UPDATE runs SET progress = :progress, heartbeat_at = now(), updated_at = now()
      WHERE id = :runId AND worker_id = :workerId AND status = 'running'
      RETURNING cancel_requested`,
    { replacements: { runId, workerId, progress: Math.min(1, Math.max(0, progress)) }, type: QueryTypes.SELECT },
  );
  return row ? { held: true, cancelRequested: row.cancel_requested } : { held: false, cancelRequested: false };
}

type FinalStatus = 'succeeded' | 'failed' | 'cancelled';

/** Sets a final status if this worker still holds the run; true when it did (inside `transaction`). */
async function finishHeld(
  sequelize: Sequelize,
  runId: string,
  workerId: string,
  status: FinalStatus,
  errorMessage: string | null,
  transaction: Transaction,
): Promise<{ missionId: string } | null> {
  const [row] = await sequelize.query<{ mission_id: string }>(
    `UPDATE runs
        SET status = :status, error_message = :errorMessage, finished_at = now(), heartbeat_at = now(), updated_at = now(),
            progress = CASE WHEN :status = 'succeeded' THEN 1 ELSE progress END
      WHERE id = :runId AND worker_id = :workerId AND status = 'running'
      RETURNING mission_id`,
    { replacements: { runId, workerId, status, errorMessage }, type: QueryTypes.SELECT, transaction },
  );
  return row ? { missionId: row.mission_id } : null;
}

/**
 * Stores the outcome and marks the run succeeded, in one transaction and only if this worker still
 * holds the run (the UPDATE's row lock keeps a reaper or another claim out until the commit).
 * @returns false when the run was no longer this worker's: nothing was written
 */
export async function finishSucceeded(sequelize: Sequelize, runId: string, workerId: string, outcome: RunOutcome): Promise<boolean> {
  return sequelize.transaction(async (transaction) => {
    const held = await finishHeld(sequelize, runId, workerId, 'succeeded', null, transaction);
    if (!held) return false;
    await storeRunOutcome(runId, outcome, transaction);
    await audit(
      {
        userId: null,
        missionId: held.missionId,
        action: 'run-succeeded',
        entityType: 'run',
        entityId: runId,
        detail: { workerId, sampleCount: outcome.sampleCount, eventCount: outcome.events.length },
      },
      transaction,
    );
    return true;
  });
}

/** Marks a held run failed (with the reason) or cancelled; false when it was no longer this worker's. */
export async function finishWithoutResult(
  sequelize: Sequelize,
  runId: string,
  workerId: string,
  status: 'failed' | 'cancelled',
  errorMessage: string | null = null,
): Promise<boolean> {
  return sequelize.transaction(async (transaction) => {
    const held = await finishHeld(sequelize, runId, workerId, status, errorMessage, transaction);
    if (!held) return false;
    await audit(
      {
        userId: null,
        missionId: held.missionId,
        action: status === 'failed' ? 'run-failed' : 'run-cancelled',
        entityType: 'run',
        entityId: runId,
        detail: { workerId, ...(errorMessage ? { errorMessage } : {}) },
      },
      transaction,
    );
    return true;
  });
}

/** A run taken back from its worker. */
export interface RequeuedRun {
  id: string;
  missionId: string;
  /** Where it went: queued again with a new job, cancelled (a cancel was pending), or failed (too many attempts). */
  status: 'queued' | 'cancelled' | 'failed';
  /** The worker that held it (worker_id keeps naming it until the next claim). */
  workerId: string | null;
}

/** Attempts after which a run whose workers keep disappearing is failed instead of queued again. */
export const MAX_RUN_ATTEMPTS = 5;

/** Options of `takeBackRuns`. */
export interface TakeBackOptions {
  /** SQL condition over the runs row aliased `r`. */
  where: string;
  replacements: Record<string, unknown>;
  /** Why, for the audit line. */
  reason: string;
  /** Fail instead of queueing a run that has had this many attempts (default MAX_RUN_ATTEMPTS). */
  failAfterAttempts?: number;
}

/**
 * Takes back the running runs matching `options.where` and queues each again with a new job, in
 * one transaction: a pending cancel ends it as cancelled, and a run that has already had
 * `failAfterAttempts` attempts is failed. The UPDATE is guarded by `status = 'running'`, so when
 * several workers do this at once each run goes to exactly one of them.
 */
export async function takeBackRuns(sequelize: Sequelize, boss: PgBoss, options: TakeBackOptions): Promise<RequeuedRun[]> {
  const { where, replacements, reason, failAfterAttempts = MAX_RUN_ATTEMPTS } = options;
  return sequelize.transaction(async (transaction) => {
    const rows = await sequelize.query<{ id: string; mission_id: string; status: RequeuedRun['status']; worker_id: string | null }>(
      `UPDATE runs AS r
          SET status = CASE WHEN r.cancel_requested THEN 'cancelled' WHEN r.attempts >= :maxAttempts THEN 'failed' ELSE 'queued' END,
              error_message = CASE WHEN NOT r.cancel_requested AND r.attempts >= :maxAttempts
                                   THEN 'the run was started ' || r.attempts || ' times and its worker stopped reporting each time; run it again'
                                   ELSE r.error_message END,
              finished_at = CASE WHEN r.cancel_requested OR r.attempts >= :maxAttempts THEN now() ELSE NULL END,
              progress = CASE WHEN r.cancel_requested OR r.attempts >= :maxAttempts THEN r.progress ELSE 0 END,
              heartbeat_at = NULL, updated_at = now()
        WHERE r.status = 'running' AND (${where})
        RETURNING r.id, r.mission_id, r.status, r.worker_id`,
      { replacements: { ...replacements, maxAttempts: failAfterAttempts }, type: QueryTypes.SELECT, transaction },
    );
    for (const row of rows) {
      if (row.status === 'queued') await sendJob(boss, PROPAGATION_QUEUE, { runId: row.id }, { inTransaction: { sequelize, transaction } });
      await audit(
        {
          userId: null,
          missionId: row.mission_id,
          action: row.status === 'queued' ? 'run-requeued' : row.status === 'cancelled' ? 'run-cancelled' : 'run-failed',
          entityType: 'run',
          entityId: row.id,
          detail: { reason, previousWorkerId: row.worker_id },
        },
        transaction,
      );
    }
    return rows.map((r) => ({ id: r.id, missionId: r.mission_id, status: r.status, workerId: r.worker_id }));
  });
}
