/**
 * The input of a run's computation thread (run-thread.ts), loaded from the database by the slot;
 * the messages themselves follow thread-protocol.ts.
 */
import type { Scenario, VehicleSpec } from '@photon-ledger/shared';
import type { SrpCoefficientTable } from '@photon-ledger/srp-core';

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
