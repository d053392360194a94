/**
 * The `study-case` job: compute one case of a trade study. Same pattern as a run (propagation-job.ts):
 * the slot claims the case row with a guarded UPDATE, computes in its own thread (leased-slot.ts)
 * with a heartbeat every second that also reads the study's cancel flag, and stores the budget line
 * values only if it still holds the case. A case whose worker died (no heartbeat for the stale
 * period) is taken back by the reaper every worker runs (study-case-reaper.ts) and queued again.
 */
import type PgBoss from 'pg-boss';
import { QueryTypes, type Sequelize } from 'sequelize';
import { fieldErrors, scenarioSchema, studyCaseJobSchema, vehicleSpecSchema, type Scenario, type VehicleSpec } from '@photon-ledger/shared';
import { caseSpecs } from '../services/study-design';
import { noteStudyFinishedIfLast } from '../services/mail-delivery';
import { STUDY_CASE_QUEUE } from '../services/study-service';
import { loadVehicleTable, VehicleTableError } from '../services/coefficient-table-service';
import type { SrpCoefficientTable } from '@photon-ledger/srp-core';
import { failureMessage, LeasedSlot } from './leased-slot';
import type { RunOutcome } from '../services/run-outcome';
import type { RunThreadInput } from './run-thread-protocol';
import { sendJob } from './queue';
import type { JobContext } from './index';

interface ClaimedCase {
  id: string;
  parameters: Record<string, number>;
  baseScenario: unknown;
  baseVehicle: unknown;
  vehicleRevisionId: string;
}

/** Takes a queued case (or a running one whose holder went silent) of a study not cancelled. */
export async function claimCase(sequelize: Sequelize, caseId: string, workerId: string, staleSeconds: number): Promise<ClaimedCase | null> {
  const [row] = await sequelize.query<{ id: string; parameters: Record<string, number>; base_scenario: unknown; base_vehicle: unknown; vehicle_revision_id: string }>(
    `UPDATE study_cases c
        SET status = 'running', worker_id = :workerId, attempts = c.attempts + 1, error_message = NULL,
            started_at = now(), heartbeat_at = now(), updated_at = now()
       FROM trade_studies s
      WHERE c.id = :caseId AND s.id = c.study_id AND NOT s.cancel_requested
        AND (c.status = 'queued' OR (c.status = 'running' AND c.heartbeat_at < now() - make_interval(secs => :staleSeconds)))
      RETURNING c.id, c.parameters, s.base_scenario, s.base_vehicle, s.vehicle_revision_id`,
    { replacements: { caseId, workerId, staleSeconds }, type: QueryTypes.SELECT },
  );
  if (!row) return null;
  return { id: row.id, parameters: row.parameters, baseScenario: row.base_scenario, baseVehicle: row.base_vehicle, vehicleRevisionId: row.vehicle_revision_id };
}

/** Proves the worker alive; false when the case is no longer held, `cancel` when the study was cancelled. */
async function caseHeartbeat(sequelize: Sequelize, caseId: string, workerId: string): Promise<{ held: boolean; cancel: boolean }> {
  const [row] = await sequelize.query<{ cancel: boolean }>(
    `UPDATE study_cases c SET heartbeat_at = now(), updated_at = now()
       FROM trade_studies s
      WHERE c.id = :caseId AND c.worker_id = :workerId AND c.status = 'running' AND s.id = c.study_id
      RETURNING s.cancel_requested AS cancel`,
    { replacements: { caseId, workerId }, type: QueryTypes.SELECT },
  );
  return row ? { held: true, cancel: row.cancel } : { held: false, cancel: false };
}

/** Ends a held case; false when it was no longer this worker's. */
export async function finishCase(
  sequelize: Sequelize,
  caseId: string,
  workerId: string,
  status: 'succeeded' | 'failed' | 'cancelled',
  lines: Record<string, number | null> | null,
  errorMessage: string | null,
): Promise<boolean> {
  const [row] = await sequelize.query<{ id: string }>(
    `UPDATE study_cases SET status = :status, lines = CAST(:lines AS jsonb), error_message = :errorMessage,
            finished_at = now(), heartbeat_at = now(), updated_at = now()
      WHERE id = :caseId AND worker_id = :workerId AND status = 'running'
      RETURNING id`,
    { replacements: { caseId, workerId, status, lines: lines === null ? null : JSON.stringify(lines), errorMessage }, type: QueryTypes.SELECT },
  );
  return Boolean(row);
}

function firstIssue(prefix: string, error: import('zod').ZodError): string {
  const [field, message] = Object.entries(fieldErrors(error))[0] ?? ['(root)', 'invalid'];
  return `${prefix}.${field}: ${message}`;
}

let slotsInProcess = 0;

/** How long a slot keeps fetching cases itself before it returns to pg-boss's work loop (ms). */
const DRAIN_MS = 30_000;

const runThreadEntry = new URL('./run-thread.ts', import.meta.url);

/**
 * One unit of a worker's concurrency on the study-case queue, with its own computation thread.
 * A study's cases are short and many: the slot drains the queue (LeasedSlot's drain mode).
 */
export class StudyCaseSlot extends LeasedSlot<RunThreadInput, RunOutcome> {
  constructor(context: JobContext, hostName: string) {
    super(context, `${hostName}:${process.pid}:study-${slotsInProcess++}`, runThreadEntry, { queue: STUDY_CASE_QUEUE, ms: DRAIN_MS });
  }

  protected async runJob(job: PgBoss.Job<unknown>): Promise<void> {
    const payload = studyCaseJobSchema.safeParse(job.data);
    if (!payload.success) {
      console.error(`[worker] job ${job.id} on ${job.name} ignored: bad payload`);
      return;
    }
    await this.runCase(payload.data.caseId);
  }

  private async runCase(caseId: string): Promise<void> {
    const { sequelize, staleSeconds } = this.context;
    const claimed = await claimCase(sequelize, caseId, this.workerId, staleSeconds);
    if (!claimed) return;
    if (this.releasing) return this.giveBack(caseId);

    const vehicleBase = vehicleSpecSchema.safeParse(claimed.baseVehicle);
    const scenarioBase = scenarioSchema.safeParse(claimed.baseScenario);
    if (!vehicleBase.success || !scenarioBase.success) {
      const message = !vehicleBase.success ? firstIssue('vehicle', vehicleBase.error) : firstIssue('scenario', scenarioBase.error!);
      await finishCase(sequelize, caseId, this.workerId, 'failed', null, message);
      return;
    }
    const specs = caseSpecs({ vehicle: vehicleBase.data, scenario: scenarioBase.data }, claimed.parameters);
    const vehicle = vehicleSpecSchema.safeParse(specs.vehicle);
    const scenario = scenarioSchema.safeParse(specs.scenario);
    if (!vehicle.success || !scenario.success) {
      const message = !vehicle.success ? firstIssue('vehicle', vehicle.error) : firstIssue('scenario', scenario.error!);
      await finishCase(sequelize, caseId, this.workerId, 'failed', null, message);
      return;
    }

    // A mesh vehicle's case varies mass or centre of mass only: the base's table serves every case.
    let meshTable: SrpCoefficientTable | undefined;
    if (vehicle.data.kind === 'mesh') {
      try {
        meshTable = await loadVehicleTable(vehicle.data);
      } catch (err) {
        if (!(err instanceof VehicleTableError)) throw err;
        await finishCase(sequelize, caseId, this.workerId, 'failed', null, err.message);
        return;
      }
    }
    const input: RunThreadInput = {
      scenario: scenario.data as Scenario,
      vehicle: vehicle.data as VehicleSpec,
      vehicleRevisionId: claimed.vehicleRevisionId,
      ...(meshTable ? { meshTable } : {}),
    };
    const { result, lost } = await this.computeHeld(input, () => {}, () => caseHeartbeat(sequelize, caseId, this.workerId), `study case ${caseId}`);
    switch (result.kind) {
      case 'succeeded': {
        const lines = Object.fromEntries(result.result.budget.lines.map((line) => [line.key, line.value]));
        if (await finishCase(sequelize, caseId, this.workerId, 'succeeded', lines, null)) await noteStudyFinishedIfLast(this.context.boss, sequelize, caseId);
        return;
      }
      case 'cancelled':
        await finishCase(sequelize, caseId, this.workerId, 'cancelled', null, null);
        return;
      case 'failed':
        if (await finishCase(sequelize, caseId, this.workerId, 'failed', null, failureMessage(result.error))) {
          await noteStudyFinishedIfLast(this.context.boss, sequelize, caseId);
        }
        return;
      case 'aborted':
        if (this.releasing && !lost) await this.giveBack(caseId);
    }
  }

  /** The worker is stopping: the case goes back to queued with a new job, in one transaction. */
  private async giveBack(caseId: string): Promise<void> {
    const { sequelize, boss } = this.context;
    await sequelize.transaction(async (transaction) => {
      const [row] = await sequelize.query<{ id: string }>(
        `UPDATE study_cases SET status = 'queued', worker_id = NULL, heartbeat_at = NULL, updated_at = now()
          WHERE id = :caseId AND worker_id = :workerId AND status = 'running' RETURNING id`,
        { replacements: { caseId, workerId: this.workerId }, type: QueryTypes.SELECT, transaction },
      );
      if (row) await sendJob(boss, STUDY_CASE_QUEUE, { caseId }, { inTransaction: { sequelize, transaction } });
    });
  }
}
