/**
 * What passes between a table-chunk slot and its computation thread (coefficient-table-thread.ts):
 * plain data only, cloned or transferred by postMessage.
 */
import type { CoefficientTableSettings, MeshOpticsInput } from '@photon-ledger/srp-core';

/** workerData of a table thread (the boot file loads `entry`). */
export interface TableThreadStart {
  /** file: URL of the thread's TypeScript entry, loaded by run-thread-boot.mjs. */
  entry: string;
  /** One Int32 on a SharedArrayBuffer: 1 asks the band in hand to stop before its next row. */
  cancelFlag: SharedArrayBuffer;
}

/** Compute polar rows [firstPolarRow, endPolarRow) of a table. */
export interface TableThreadRequest {
  /** Echoed in every answer, so a late message of an earlier band is never mistaken. */
  token: number;
  /** Equal keys mean the same scene (the table's cache key): the thread keeps the last one built. */
  sceneKey: string;
  positions: Float64Array;
  groupOfTriangle: Uint32Array;
  groupNames: string[];
  optics: MeshOpticsInput;
  settings: CoefficientTableSettings;
  firstPolarRow: number;
  endPolarRow: number;
}

/** Messages per request: progress any number of times, then exactly one outcome. */
export type TableThreadMessage = { token: number } & (
  | { kind: 'progress'; rowsDone: number }
  | { kind: 'succeeded'; values: Float64Array; rays: number; computeMs: number }
  | { kind: 'cancelled' }
  | { kind: 'failed'; message: string; field?: string }
);
