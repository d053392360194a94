/**
 * A worker thread computing runs (and study cases) one at a time, driven by compute-thread.ts:
 * propagation and budget are CPU-bound for seconds to minutes, so they run here and the worker's
 * event loop stays free for heartbeats, cancellation and other jobs. The thread lives as long as
 * its worker slot, so module loading and JIT warm-up are paid once, not per run.
 */
import { parseAttitudeCsv } from '@photon-ledger/srp-core';
import { computeRunOutcome, type RunOutcome } from '../services/run-outcome';
import type { RunThreadInput } from './run-thread-protocol';
import { serveComputations } from './thread-host';

serveComputations<RunThreadInput, RunOutcome>((input, control) => {
  const attitudeProfile =
    input.attitudeCsv === undefined
      ? undefined
      : parseAttitudeCsv(input.attitudeCsv, { epochUtc: input.scenario.orbit.epochUtc, field: 'attitude.profileId' });
  const outcome = computeRunOutcome(
    {
      scenario: input.scenario,
      vehicle: input.vehicle,
      vehicleRevisionId: input.vehicleRevisionId,
      ...(attitudeProfile ? { attitudeProfile } : {}),
      ...(input.meshTable ? { meshTable: input.meshTable } : {}),
    },
    control,
  );
  // Hand the samples' memory over instead of copying it (it can be hundreds of megabytes).
  return outcome ? { result: outcome, transfer: [outcome.samples.buffer as ArrayBuffer] } : null;
});
