import type { VehicleSpec as VehicleFile } from '@photon-ledger/shared';
import type { VehicleSpec } from '../src/index';

const DEG = Math.PI / 180;

/**
 * A vehicle file (shared schema, already parsed) as srp-core's spec: the one difference is the
 * tracking limits, degrees in files and radians in the core.
 */
export function vehicleFromFile(file: VehicleFile): VehicleSpec {
  if (file.kind !== 'plates') return file as VehicleSpec;
  return {
    ...file,
    plates: file.plates.map(({ trackingLimitsDeg, ...plate }) => ({
      ...plate,
      ...(trackingLimitsDeg ? { trackingLimitsRad: [trackingLimitsDeg[0] * DEG, trackingLimitsDeg[1] * DEG] as const } : {}),
    })),
  } as VehicleSpec;
}
