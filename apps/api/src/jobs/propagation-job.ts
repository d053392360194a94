/**
 * The `propagation` job: compute one analysis run. A worker slot claims the run row, loads the
 * vehicle revision (and the uploaded attitude profile a tabulated law names), computes in its
 * thread while it reports progress and a heartbeat every second, and stores the outcome only if
 * it still holds the run. Delivered at least once: a duplicate finds the run held or finished.
 */
import type PgBoss from 'pg-boss';
import { ConnectionError } from 'sequelize';
import type { z } from 'zod';
import { fieldErrors, propagationJobSchema, scenarioSchema, vehicleSpecSchema } from '@photon-ledger/shared';
import { UploadModel, VehicleRevisionModel } from '../models';
import type { RunOutcome } from '../services/run-outcome';
import { loadVehicleTable, VehicleTableError } from '../services/coefficient-table-service';
import { ComputeThread, type Computation } from './compute-thread';
import { mailIfLongRun } from '../services/mail-delivery';
import { claimRun, finishSucceeded, finishWithoutResult, heartbeat, takeBackRuns, type ClaimedRun } from './run-lease';
import type { RunThreadError, RunThreadInput } from './run-thread-protocol';
import type { JobContext, JobSlot } from './index';

/** Milliseconds between heartbeats: every second, and at least three per stale period. */
export function heartbeatIntervalMs(staleSeconds: number): number {
  return Math.min(1000, (staleSeconds * 1000) / 3);
}

/** A computation that cannot start, with the message the run shows (naming the field). */
class RunInputError extends Error {}

function firstIssue(prefix: string, error: z.ZodError): string {
  const [field, message] = Object.entries(fieldErrors(error))[0] ?? ['(root)', 'invalid'];
  return `${prefix}.${field}: ${message}`;
}

/** Loads what the computation needs; RunInputError for inputs that can never compute. */
async function loadRunInput(run: ClaimedRun): Promise<RunThreadInput> {
  // The snapshot was validated when the run was made; it is checked again as it comes off the database.
  const scenario = scenarioSchema.safeParse(run.scenarioSpec);
  if (!scenario.success) throw new RunInputError(firstIssue('scenario', scenario.error));
  const revision = await VehicleRevisionModel.findByPk(run.vehicleRevisionId, { attributes: ['id', 'spec'] });
  if (!revision) throw new RunInputError(`vehicleRevisionId: vehicle revision ${run.vehicleRevisionId} no longer exists`);
  const vehicle = vehicleSpecSchema.safeParse(revision.spec);
  if (!vehicle.success) throw new RunInputError(firstIssue('vehicle', vehicle.error));

  const input: RunThreadInput = { scenario: scenario.data, vehicle: vehicle.data, vehicleRevisionId: run.vehicleRevisionId };
  if (vehicle.data.kind === 'mesh') {
    try {
      input.meshTable = await loadVehicleTable(vehicle.data);
    } catch (err) {
      if (err instanceof VehicleTableError) throw new RunInputError(err.message);
      throw err;
    }
  }
  const attitude = scenario.data.attitude;
  if (attitude.law === 'tabulated' && attitude.profileId) {
    const upload = await UploadModel.unscoped().findOne({
      where: { id: attitude.profileId, missionId: run.missionId, kind: 'attitude-profile' },
      attributes: ['id', 'data'],
    });
    if (!upload) throw new RunInputError(`attitude.profileId: no attitude profile ${attitude.profileId} was uploaded to this mission`);
    input.attitudeCsv = upload.data.toString('utf8');
  }
  return input;
}

/** The run's error message: srp-core's message, with the field in front when the message does not name it. */
export function failureMessage(error: RunThreadError): string {
  const { field, message } = error;
  if (!field || message.includes(field) || message.startsWith(field.split('.')[0]!)) return message;
  return `${field}: ${message}`;
}

interface InHand {
  runId: string;
  computation: Computation | null;
}

let slotsInProcess = 0;

/**
 * One unit of a worker's concurrency: one job at a time, with its own computation thread. Its id
 * (`host:pid:n`, n counted over the process, so two workers in one process never share one) is
 * what the run row's worker_id names.
 */
export class PropagationSlot implements JobSlot {
  readonly workerId: string;
  private readonly thread = new ComputeThread();
  private inHand: InHand | null = null;
  private idle: Promise<void> = Promise.resolve();
  /** The worker is stopping: a run in hand is given back to the queue instead of finished. */
  private releasing = false;

  constructor(
    private readonly context: JobContext,
    hostName: string,
  ) {
    this.workerId = `${hostName}:${process.pid}:${slotsInProcess++}`;
    this.thread.warmUp();
  }

  /** pg-boss handler (batch size 1). Throws only when the database fails, so that pg-boss retries. */
  readonly handle = async (jobs: PgBoss.Job<unknown>[]): Promise<void> => {
    for (const job of jobs) {
      const payload = propagationJobSchema.safeParse(job.data);
      if (!payload.success) {
        console.error(`[worker] job ${job.id} on ${job.name} ignored: ${Object.entries(fieldErrors(payload.error)).map(([k, v]) => `${k}: ${v}`).join('; ')}`);
        continue;
      }
      let ended!: () => void;
      this.idle = new Promise((resolve) => (ended = resolve));
      try {
        await this.runJob(payload.data.runId);
      } finally {
        this.inHand = null;
        ended();
      }
    }
  };

  /** Resolves when no job is in hand. */
  whenIdle(): Promise<void> {
    return this.idle;
  }

  /** Stops the computation in hand and gives its run back to the queue. */
  async release(): Promise<void> {
    this.releasing = true;
    await this.inHand?.computation?.abort();
    await this.idle;
  }

  /** Ends the computation thread (after the last job). */
  close(): Promise<void> {
    return this.thread.close();
  }

  private async runJob(runId: string): Promise<void> {
    const { sequelize, staleSeconds } = this.context;
    const run = await claimRun(sequelize, runId, this.workerId, staleSeconds);
    if (!run) return; // finished, cancelled, or held by a live worker: nothing to do
    const inHand: InHand = { runId, computation: null };
    this.inHand = inHand;
    if (this.releasing) {
      await this.giveBack(runId);
      return;
    }

    let input: RunThreadInput;
    try {
      input = await loadRunInput(run);
    } catch (err) {
      if (!(err instanceof RunInputError)) throw err;
      await finishWithoutResult(sequelize, runId, this.workerId, 'failed', err.message);
      return;
    }
    if (this.releasing) {
      await this.giveBack(runId);
      return;
    }

    let progress = 0;
    const computation = this.thread.compute(input, (fraction) => {
      progress = fraction;
    });
    inHand.computation = computation;
    let lost = false;
    let beat: Promise<void> | null = null;
    const timer = setInterval(() => {
      if (beat) return;
      beat = heartbeat(sequelize, runId, this.workerId, progress)
        .then(async (answer) => {
          if (!answer.held) {
            // Taken back (this worker was presumed dead) or finished elsewhere: stop, write nothing.
            lost = true;
            await computation.abort();
          } else if (answer.cancelRequested) {
            computation.requestCancel();
          }
        })
        // A missed beat is not fatal; enough of them and the run goes to another worker.
        .catch((err: unknown) => console.error(`[worker] heartbeat of run ${runId} failed:`, err))
        .finally(() => {
          beat = null;
        });
    }, heartbeatIntervalMs(staleSeconds));

    let result;
    try {
      result = await computation.done;
    } finally {
      clearInterval(timer);
      await beat;
    }

    switch (result.kind) {
      case 'succeeded':
        await this.storeOutcome(runId, result.outcome);
        return;
      case 'cancelled':
        await finishWithoutResult(sequelize, runId, this.workerId, 'cancelled');
        return;
      case 'failed':
        await finishWithoutResult(sequelize, runId, this.workerId, 'failed', failureMessage(result.error));
        return;
      case 'aborted':
        if (this.releasing && !lost) await this.giveBack(runId);
    }
  }

  private async storeOutcome(runId: string, outcome: RunOutcome): Promise<void> {
    const { sequelize } = this.context;
    let stored: boolean;
    try {
      stored = await finishSucceeded(sequelize, runId, this.workerId, outcome);
    } catch (err) {
      // Database away: the run stays running without heartbeats and is computed again elsewhere.
      if (err instanceof ConnectionError) throw err;
      // Anything else would fail the same way on every attempt: say so on the run.
      console.error(`[worker] storing the result of run ${runId} failed:`, err);
      const reason = err instanceof Error ? err.message : String(err);
      await finishWithoutResult(sequelize, runId, this.workerId, 'failed', `the result could not be stored: ${reason}`);
      return;
    }
    if (stored) void mailIfLongRun(this.context.boss, runId);
    if (!stored) console.warn(`[worker] run ${runId} was taken from ${this.workerId} before it finished; its result is discarded`);
  }

  private async giveBack(runId: string): Promise<void> {
    const { sequelize, boss } = this.context;
    await takeBackRuns(sequelize, boss, {
      where: 'r.id = :runId AND r.worker_id = :workerId',
      replacements: { runId, workerId: this.workerId },
      reason: 'its worker was stopped',
      // An orderly stop is not the run's fault: it never counts towards failing it.
      failAfterAttempts: Number.MAX_SAFE_INTEGER,
    });
  }
}
