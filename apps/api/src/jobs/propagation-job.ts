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
import { failureMessage, LeasedSlot } from './leased-slot';
import { mailIfLongRun } from '../services/mail-delivery';
import { claimRun, finishSucceeded, finishWithoutResult, heartbeat, takeBackRuns, type ClaimedRun } from './run-lease';
import type { RunThreadInput } from './run-thread-protocol';
import type { JobContext } from './index';

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

let slotsInProcess = 0;

const runThreadEntry = new URL('./run-thread.ts', import.meta.url);

/**
 * One unit of a worker's concurrency: one job at a time, with its own computation thread. Its id
 * (`host:pid:n`, n counted over the process, so two workers in one process never share one) is
 * what the run row's worker_id names.
 */
export class PropagationSlot extends LeasedSlot<RunThreadInput, RunOutcome> {
  constructor(context: JobContext, hostName: string) {
    super(context, `${hostName}:${process.pid}:${slotsInProcess++}`, runThreadEntry, null);
    this.thread.warmUp();
  }

  protected async runJob(job: PgBoss.Job<unknown>): Promise<void> {
    const payload = propagationJobSchema.safeParse(job.data);
    if (!payload.success) {
      console.error(`[worker] job ${job.id} on ${job.name} ignored: ${Object.entries(fieldErrors(payload.error)).map(([k, v]) => `${k}: ${v}`).join('; ')}`);
      return;
    }
    const { runId } = payload.data;
    const { sequelize, staleSeconds } = this.context;
    const run = await claimRun(sequelize, runId, this.workerId, staleSeconds);
    if (!run) return; // finished, cancelled, or held by a live worker: nothing to do
    if (this.releasing) return this.giveBack(runId);

    let input: RunThreadInput;
    try {
      input = await loadRunInput(run);
    } catch (err) {
      if (!(err instanceof RunInputError)) throw err;
      await finishWithoutResult(sequelize, runId, this.workerId, 'failed', err.message);
      return;
    }
    if (this.releasing) return this.giveBack(runId);

    let progress = 0;
    const { result, lost } = await this.computeHeld(
      input,
      (fraction) => {
        progress = fraction;
      },
      async () => {
        const answer = await heartbeat(sequelize, runId, this.workerId, progress);
        return { held: answer.held, cancel: answer.cancelRequested };
      },
      `run ${runId}`,
    );
    switch (result.kind) {
      case 'succeeded':
        await this.storeOutcome(runId, result.result);
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
