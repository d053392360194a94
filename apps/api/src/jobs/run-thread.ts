/**
 * A worker thread computing runs one at a time (driven by compute-thread.ts): propagation and
 * budget are CPU-bound for seconds to minutes, so they run here and the worker's event loop stays
 * free for heartbeats, cancellation and other jobs. The thread lives as long as its worker slot,
 * so module loading and JIT warm-up are paid once, not per run.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { parseAttitudeCsv, SrpError } from '@photon-ledger/srp-core';
import { computeRunOutcome } from '../services/run-outcome';
import type { RunThreadError, RunThreadMessage, RunThreadRequest, RunThreadStart } from './run-thread-protocol';

const port = parentPort;
if (!port) throw new Error('run-thread.ts runs as a worker thread only');
const { cancelFlag } = workerData as RunThreadStart;
const cancel = new Int32Array(cancelFlag);

function describe(err: unknown): RunThreadError {
  if (err instanceof SrpError) return { message: err.message, code: err.code, field: err.details.field };
  if (err instanceof Error) return { message: err.message };
  return { message: String(err) };
}

function compute({ token, input }: RunThreadRequest): void {
  const post = (message: RunThreadMessage, transfer: ArrayBuffer[] = []) => port!.postMessage(message, transfer);
  try {
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
      {
        onProgress: (fraction) => post({ token, kind: 'progress', fraction }),
        isCancelled: () => Atomics.load(cancel, 0) === 1,
      },
    );
    if (outcome) {
      // Hand the samples' memory over instead of copying it (it can be hundreds of megabytes).
      post({ token, kind: 'succeeded', outcome }, [outcome.samples.buffer as ArrayBuffer]);
    } else {
      post({ token, kind: 'cancelled' });
    }
  } catch (err) {
    post({ token, kind: 'failed', error: describe(err) });
  }
}

port.on('message', compute);
