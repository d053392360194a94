/**
 * What passes between a worker's main thread and the thread that computes a run
 * (run-thread.ts): plain data only, cloned or transferred by postMessage.
 */
import type { Scenario, VehicleSpec } from '@photon-ledger/shared';
import type { SrpCoefficientTable } from '@photon-ledger/srp-core';
import type { RunOutcome } from '../services/run-outcome';

/** What the computation needs, loaded from the database by the main thread. */
export interface RunThreadInput {
  scenario: Scenario;
  vehicle: VehicleSpec;
  vehicleRevisionId: string;
  /** Text of the uploaded attitude profile (CSV) when the attitude law names one; parsed in the thread. */
  attitudeCsv?: string;
  /** A mesh vehicle's coefficient table, loaded from the database. */
  meshTable?: SrpCoefficientTable;
}

/** workerData of a run thread. */
export interface RunThreadStart {
  /** file: URL of the thread's TypeScript entry, loaded by run-thread-boot.mjs. */
  entry: string;
  /** One Int32 on a SharedArrayBuffer: 1 asks the computation in hand to stop at its next step. */
  cancelFlag: SharedArrayBuffer;
}

/** A request to the thread: compute one run (the thread takes one at a time). */
export interface RunThreadRequest {
  /** Echoed in every answer, so a late message of an earlier computation is never mistaken. */
  token: number;
  input: RunThreadInput;
}

/** Why a computation failed, with the offending field when srp-core named one. */
export interface RunThreadError {
  message: string;
  /** SrpError code, when it was one. */
  code?: string;
  /** Dot path of the offending input (`attitude.profileId.5.q_x`, `plates.3.front.specular`). */
  field?: string;
}

/** Messages from the thread per request: progress any number of times, then exactly one outcome. */
export type RunThreadMessage = { token: number } & (
  | { kind: 'progress'; fraction: number }
  | { kind: 'succeeded'; outcome: RunOutcome }
  | { kind: 'cancelled' }
  | { kind: 'failed'; error: RunThreadError }
);
