import type { VehicleSpec as VehicleFile } from '@photon-ledger/shared';
import { SrpError, type SrpCoefficientTable, type VehicleSpec } from '../src/index';

const DEG = Math.PI / 180;

/** What a vehicle file needs besides itself to become a spec. */
export interface VehicleFromFileOptions {
  /**
   * The coefficient table of a mesh vehicle, computed from its mesh, optics and `table` settings
   * (by the API's table job); required for `kind: 'mesh'`, ignored otherwise.
   */
  meshTable?: SrpCoefficientTable | undefined;
}

/**
 * A vehicle file (shared schema, already parsed) as srp-core's spec: tracking limits go from
 * degrees (files) to radians (core); a mesh vehicle becomes a `MeshTableSpec` around its table.
 * @throws SrpError naming `table` when a mesh vehicle comes without its coefficient table
 */
export function vehicleFromFile(file: VehicleFile, options: VehicleFromFileOptions = {}): VehicleSpec {
  if (file.kind === 'mesh') {
    const table = options.meshTable;
    if (table === undefined) {
      throw new SrpError(
        'invalid_input',
        `mesh vehicle '${file.name}' needs its coefficient table (computed by the API from mesh ${file.meshId} ` +
          `at ${file.table.stepDeg}°, ${file.table.samplesPerFacet} samples per facet); none was given`,
        { field: 'table', value: undefined },
      );
    }
    if (table.stepDeg !== file.table.stepDeg) {
      throw new SrpError(
        'invalid_input',
        `the coefficient table given for mesh vehicle '${file.name}' has a ${table.stepDeg}° step; the vehicle asks for ${file.table.stepDeg}°`,
        { field: 'table.stepDeg', value: table.stepDeg, limit: `= ${file.table.stepDeg}` },
      );
    }
    return {
      kind: 'mesh',
      name: file.name,
      ...(file.description === undefined ? {} : { description: file.description }),
      massKg: file.massKg,
      centreOfMassM: file.centreOfMassM,
      table,
    };
  }
  if (file.kind !== 'plates') return file as VehicleSpec;
  return {
    ...file,
    plates: file.plates.map(({ trackingLimitsDeg, ...plate }) => ({
      ...plate,
      ...(trackingLimitsDeg ? { trackingLimitsRad: [trackingLimitsDeg[0] * DEG, trackingLimitsDeg[1] * DEG] as const } : {}),
    })),
  } as VehicleSpec;
}
