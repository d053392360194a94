/**
 * Test helper: a succeeded run stored directly with the models (vehicle, revision, scenario, run,
 * then computeRunOutcome + storeRunOutcome in one transaction), so result and export tests need no
 * job queue. Runs are kept small (hours to a day, coarse output steps).
 */
import type { Sequelize } from 'sequelize';
import type { Scenario, VehicleSpec } from '@photon-ledger/shared';
import { RunModel, type RunStatus } from '../src/models';
import { computeRunOutcome, storeRunOutcome, type RunOutcome } from '../src/services/run-outcome';
import { corvinaScenarioFile, corvinaVehicle, createScenarioRows } from '../src/jobs/run-test-support';

/** What to store; the scenario is the Corvina-2 demo scenario with these changes. */
export interface StoredRunOptions {
  missionId: string;
  /** Default 0.5 day. */
  spanDays?: number;
  /** Default 600 s. */
  outputStepS?: number;
  /** Wheel capacity and dump threshold; null for none; default the demo scenario's. */
  momentum?: { wheelCapacityNms: number; dumpThresholdFraction: number } | null;
  /** Default 'succeeded' (with results); any other status stores the run without results. */
  status?: RunStatus;
  /** Scenario name; default a unique one. */
  scenarioName?: string;
}

/** The stored run and what it was computed from. */
export interface StoredRun {
  runId: string;
  scenarioId: string;
  vehicleRevisionId: string;
  scenario: Scenario;
  vehicle: VehicleSpec;
  /** Null for a run stored without results. */
  outcome: RunOutcome | null;
}

/** The demo vehicle (Corvina-2 box-wing), parsed with the shared schema. */
export const demoVehicle = corvinaVehicle;

/** Inserts a vehicle, a revision, a scenario and a run; computes and stores the outcome for a succeeded run. */
export async function storeRun(sequelize: Sequelize, options: StoredRunOptions): Promise<StoredRun> {
  const status = options.status ?? 'succeeded';
  return sequelize.transaction(async (transaction) => {
    const { momentum: demoMomentum } = corvinaScenarioFile();
    const momentum = options.momentum === undefined ? demoMomentum : options.momentum;
    const rows = await createScenarioRows(
      sequelize,
      options.missionId,
      {
        momentum: momentum ?? undefined,
        spanDays: options.spanDays ?? 0.5,
        outputStepS: options.outputStepS ?? 600,
        ...(options.scenarioName ? { name: options.scenarioName } : {}),
      },
      demoVehicle(),
      transaction,
    );
    const { scenario, vehicle } = rows;
    const succeeded = status === 'succeeded';
    const run = await RunModel.create(
      {
        missionId: options.missionId,
        scenarioId: rows.scenarioId,
        vehicleRevisionId: rows.vehicleRevisionId,
        scenarioSpec: scenario,
        status,
        progress: succeeded ? 1 : 0,
        createdBy: null,
        ...(succeeded ? { startedAt: new Date(), finishedAt: new Date() } : {}),
      },
      { transaction },
    );
    let outcome: RunOutcome | null = null;
    if (succeeded) {
      outcome = computeRunOutcome({ scenario, vehicle, vehicleRevisionId: rows.vehicleRevisionId });
      if (!outcome) throw new Error('the test run was cancelled');
      await storeRunOutcome(run.id, outcome, transaction);
    }
    return { runId: run.id, scenarioId: rows.scenarioId, vehicleRevisionId: rows.vehicleRevisionId, scenario, vehicle, outcome };
  });
}
