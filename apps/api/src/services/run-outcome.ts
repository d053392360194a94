/**
 * One run's computation and its storage: the contract between the job (which computes in a worker
 * thread) and the result routes (which read). `computeRunOutcome` is pure CPU (no database);
 * `storeRunOutcome` writes everything in the caller's transaction, replacing any earlier copy, so a
 * job retried after a worker died still leaves exactly one result.
 */
import type { Transaction } from 'sequelize';
import type { AttitudeProfile, PropagationResult, SrpBudget, SrpCoefficientTable } from '@photon-ledger/srp-core';
import { computeBudget, EXPORT_CAUTION, formatUtc, INERTIAL_FRAME_LABEL, EPHEMERIS_CSV_COLUMNS, propagate } from '@photon-ledger/srp-core';
import { buildScenarioRun, vehicleFromFile } from '@photon-ledger/srp-core/io';
import type { RunEvent, RunSummary, Scenario, VehicleSpec } from '@photon-ledger/shared';
import { RunResultModel } from '../models';
import { writeSamples } from './sample-store';

/** What a run needs, all plain data (it crosses into a worker thread). */
export interface RunInput {
  scenario: Scenario;
  vehicle: VehicleSpec;
  vehicleRevisionId: string;
  /** The uploaded profile, when the attitude law names one. */
  attitudeProfile?: AttitudeProfile;
  /** A mesh vehicle's coefficient table (stored by the table jobs), required for that kind. */
  meshTable?: SrpCoefficientTable;
}

/** Everything a succeeded run stores. */
export interface RunOutcome {
  summary: RunSummary;
  events: RunEvent[];
  /** Budget computed without requirements: the mission's are applied when it is read. */
  budget: SrpBudget;
  layout: { stride: number; forceNames: string[] };
  samples: Float64Array;
  sampleCount: number;
}

/** Hooks into a long computation. */
export interface RunHooks {
  onProgress?: (fractionDone: number) => void;
  isCancelled?: () => boolean;
}

/** Sample column names in stored order: the CSV columns after time_utc, then `accel_<force>_m_s2`. */
export function sampleColumns(forceNames: readonly string[]): string[] {
  return [...EPHEMERIS_CSV_COLUMNS.slice(1), ...forceNames.map((f) => `accel_${f}_m_s2`)];
}

/**
 * Propagates the scenario and computes its budget. Returns null when cancelled.
 * @throws SrpError naming the offending field for inputs srp-core refuses
 */
export function computeRunOutcome(input: RunInput, hooks: RunHooks = {}): RunOutcome | null {
  const { scenario, vehicle } = input;
  // The stored spec is the file form (tracking limits in degrees); srp-core takes radians.
  // A mesh vehicle is its coefficient table, interpolated over Sun directions.
  const run = buildScenarioRun(scenario, vehicleFromFile(vehicle, input.meshTable ? { meshTable: input.meshTable } : {}), input.attitudeProfile);
  const result: PropagationResult = propagate({
    ...run.request,
    ...(hooks.onProgress ? { onProgress: hooks.onProgress } : {}),
    ...(hooks.isCancelled ? { isCancelled: hooks.isCancelled } : {}),
  });
  if (result.stats.cancelled) return null;
  const history = { layout: result.layout, samples: result.samples, sampleCount: result.sampleCount };
  const budget = computeBudget(history, run.budgetContext, []);
  const { epoch } = run.request;
  const stride = result.layout.stride;
  const last = (result.sampleCount - 1) * stride;
  const s = result.samples;
  const summary: RunSummary = {
    caution: EXPORT_CAUTION,
    scenarioName: scenario.name,
    vehicle: { name: run.vehicle.name, kind: run.vehicle.kind, massKg: run.vehicle.massKg, revisionId: input.vehicleRevisionId },
    epochUtc: epoch.utcIso,
    frame: INERTIAL_FRAME_LABEL,
    centralBody: run.request.centralBody,
    spanSeconds: run.request.spanSeconds,
    outputStepSeconds: run.request.outputStepSeconds,
    sampleCount: result.sampleCount,
    eventCount: result.events.length,
    columns: sampleColumns(result.layout.forceNames),
    forceNames: [...result.layout.forceNames],
    integrator: { steps: result.stats.steps, rejected: result.stats.rejected, evaluations: result.stats.evaluations, wallMs: result.stats.wallMs },
    finalState: {
      tSeconds: s[last]!,
      utc: formatUtc(epoch, s[last]!),
      positionM: [s[last + 1]!, s[last + 2]!, s[last + 3]!],
      velocityMS: [s[last + 4]!, s[last + 5]!, s[last + 6]!],
    },
    srpAcceleration: budget.srpAcceleration,
  };
  return {
    summary,
    events: result.events.map((e) => ({ name: e.name, tSeconds: e.tSeconds, utc: formatUtc(epoch, e.tSeconds) })),
    budget,
    layout: { stride, forceNames: [...result.layout.forceNames] },
    samples: result.samples.subarray(0, result.sampleCount * stride),
    sampleCount: result.sampleCount,
  };
}

/** Writes (or rewrites) a run's result and samples inside `transaction`. */
export async function storeRunOutcome(runId: string, outcome: RunOutcome, transaction: Transaction): Promise<void> {
  await RunResultModel.destroy({ where: { runId }, transaction });
  await RunResultModel.create(
    {
      runId,
      summary: outcome.summary as unknown as Record<string, unknown>,
      events: outcome.events,
      // JSON round trip: the budget holds only numbers, strings, nulls and arrays of them.
      budget: JSON.parse(JSON.stringify(outcome.budget)) as Record<string, unknown>,
      layout: outcome.layout,
      sampleCount: outcome.sampleCount,
    },
    { transaction },
  );
  await writeSamples(runId, outcome.samples, outcome.layout.stride, outcome.sampleCount, transaction);
}
