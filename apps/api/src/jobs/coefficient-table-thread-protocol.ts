/**
 * The input and result of a table-band computation thread (coefficient-table-thread.ts); the
 * messages themselves follow thread-protocol.ts (progress is the number of rows done).
 */
import type { CoefficientTableSettings, MeshOpticsInput } from '@photon-ledger/srp-core';

/** Compute polar rows [firstPolarRow, endPolarRow) of a table. */
export interface TableBandInput {
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

/** A computed band: its values (SrpCoefficientTable layout), rays cast and compute time (ms). */
export interface TableBandResult {
  values: Float64Array;
  rays: number;
  computeMs: number;
}
