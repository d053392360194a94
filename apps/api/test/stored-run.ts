/**
 * Test helper: a succeeded run stored directly with the models (vehicle, revision, scenario, run,
 * then computeRunOutcome + storeRunOutcome in one transaction), so result and export tests need no
 * job queue. Runs are kept small (hours to a day, coarse output steps).
 */
import { readFileSync } from 'node:fs';
import { randomUUID } from 'node:crypto';
import type { Sequelize } from 'sequelize';
import { scenarioSchema, vehicleSpecSchema, type Scenario, type VehicleSpec } from '@photon-ledger/shared';
import { RunModel, ScenarioModel, VehicleModel, VehicleRevisionModel, type RunStatus } from '../src/models';
import { computeRunOutcome, storeRunOutcome, type RunOutcome } from '../src/services/run-outcome';

const fixture = (relative: string): unknown => JSON.parse(readFileSync(new URL(`../../../fixtures/${relative}`, import.meta.url), 'utf8'));

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
export function demoVehicle(): VehicleSpec {
  return vehicleSpecSchema.parse(fixture('vehicles/corvina-2.vehicle.json'));
}

/** Inserts a vehicle, a revision, a scenario and a run; computes and stores the outcome for a succeeded run. */
export async function storeRun(sequelize: Sequelize, options: StoredRunOptions): Promise<StoredRun> {
  const vehicle = demoVehicle();
  const tag = randomUUID().slice(0, 8);
  const raw = fixture('scenarios/corvina-2-geo-30d.scenario.json') as Record<string, unknown>;
  const status = options.status ?? 'succeeded';
  return sequelize.transaction(async (transaction) => {
    const vehicleRow = await VehicleModel.create(
      { missionId: options.missionId, name: `Corvina-2 test ${tag}`, kind: vehicle.kind, latestRevision: 1, createdBy: null },
      { transaction },
    );
    const plates = vehicle.kind === 'plates' ? vehicle.plates : [];
    const revision = await VehicleRevisionModel.create(
      {
        vehicleId: vehicleRow.id,
        revision: 1,
        spec: vehicle,
        kind: vehicle.kind,
        massKg: vehicle.massKg,
        surfaceCount: plates.length,
        totalAreaM2: plates.reduce((sum, p) => sum + p.areaM2, 0),
        sourceUploadId: null,
        createdBy: null,
      },
      { transaction },
    );
    const { momentum: demoMomentum, ...rest } = raw;
    const momentum = options.momentum === undefined ? demoMomentum : options.momentum;
    const scenario = scenarioSchema.parse({
      ...rest,
      ...(momentum ? { momentum } : {}),
      name: options.scenarioName ?? `Corvina-2 — test run ${tag}`,
      vehicle: { ref: revision.id },
      spanDays: options.spanDays ?? 0.5,
      outputStepS: options.outputStepS ?? 600,
    });
    const scenarioRow = await ScenarioModel.create(
      { missionId: options.missionId, name: scenario.name, vehicleRevisionId: revision.id, spec: scenario, createdBy: null },
      { transaction },
    );
    const succeeded = status === 'succeeded';
    const run = await RunModel.create(
      {
        missionId: options.missionId,
        scenarioId: scenarioRow.id,
        vehicleRevisionId: revision.id,
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
      outcome = computeRunOutcome({ scenario, vehicle, vehicleRevisionId: revision.id });
      if (!outcome) throw new Error('the test run was cancelled');
      await storeRunOutcome(run.id, outcome, transaction);
    }
    return { runId: run.id, scenarioId: scenarioRow.id, vehicleRevisionId: revision.id, scenario, vehicle, outcome };
  });
}
