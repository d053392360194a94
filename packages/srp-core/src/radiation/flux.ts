import { ASTRONOMICAL_UNIT, SOLAR_CONSTANT, SPEED_OF_LIGHT } from '../constants';
import { requirePositive } from '../errors';

/**
 * Solar irradiance at a distance from the Sun, by the inverse-square law S(r) = S0 (1 au / r)².
 * Exact for a spherically symmetric Sun: its luminosity spreads over concentric spheres.
 * @param distanceM distance from the centre of the Sun (m), finite and > 0
 * @param s0 total solar irradiance at 1 au (W/m²), finite and > 0; defaults to SOLAR_CONSTANT
 * @returns irradiance (W/m²)
 * @throws SrpError `invalid_input` or `out_of_range` naming `distanceM` or `s0`
 */
export function irradianceAt(distanceM: number, s0: number = SOLAR_CONSTANT): number {
  requirePositive(distanceM, 'distanceM', 'm');
  requirePositive(s0, 's0', 'W/m^2');
  const auOverR = ASTRONOMICAL_UNIT / distanceM;
  return s0 * auOverR * auOverR;
}

/**
 * Solar radiation pressure on a perfectly absorbing surface facing the Sun, P = S(r) / c.
 * @param distanceM distance from the centre of the Sun (m), finite and > 0
 * @param s0 total solar irradiance at 1 au (W/m²), finite and > 0; defaults to SOLAR_CONSTANT
 * @returns pressure (N/m² = Pa)
 * @throws SrpError `invalid_input` or `out_of_range` naming `distanceM` or `s0`
 */
export function radiationPressureAt(distanceM: number, s0: number = SOLAR_CONSTANT): number {
  return irradianceAt(distanceM, s0) / SPEED_OF_LIGHT;
}
