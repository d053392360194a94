import { ASTRONOMICAL_UNIT, SOLAR_CONSTANT, radiationPressureAt } from '@photon-ledger/srp-core';

/** Solar radiation pressure at 1 au with srp-core's solar constant (Pa): S₀/c. */
export const PRESSURE_AT_1AU_PA = radiationPressureAt(ASTRONOMICAL_UNIT);
/** The solar constant behind it (W/m²). */
export const SOLAR_CONSTANT_W_M2 = SOLAR_CONSTANT;
