/**
 * Figures of merit of a vehicle pushed by sunlight: characteristic acceleration, sail loading and
 * lightness number, as defined in McInnes, Solar Sailing (1999), §2.3-2.4 (from memory).
 */
import { SUN_GM } from '../bodies/body-constants';
import { ASTRONOMICAL_UNIT, SOLAR_CONSTANT } from '../constants';
import { SrpError, requirePositive } from '../errors';
import type { ReadonlyVec3, Vec3 } from '../math/vec3';
import { radiationPressureAt } from '../radiation/flux';
import type { CompiledVehicle } from './compiled-vehicle';
import { evaluateSrp } from './evaluate-srp';
import type { SrpResult } from './evaluate-srp';

/**
 * Solar gravitational acceleration at 1 au, g☉ = GM☉ / au² ≈ 5.930e-3 m/s² (m/s²), with
 * GM☉ = 1.32712440018e20 m³/s² from bodies/body-constants.ts (JPL DE405, Standish 1998; DE430's
 * 1.32712440041939e20 is 2e-10 higher, immaterial here) and the IAU 2012 au.
 */
export const SUN_GRAVITY_AT_1AU = SUN_GM / (ASTRONOMICAL_UNIT * ASTRONOMICAL_UNIT);

const scratchResult: SrpResult = { forceBody: [0, 0, 0], torqueBody: [0, 0, 0], surfacesBody: new Float64Array(0) };
const scratchSun: Vec3 = [0, 0, 0];

/**
 * Characteristic acceleration a_c: the magnitude of the SRP acceleration at 1 au in full Sun,
 * |F(1 au)| / m (McInnes 1999, §2.3, from memory: defined with the sail normal along the Sun
 * line). Allocates nothing.
 * @param vehicle from `compileVehicle`
 * @param sunDirBody unit vector to the Sun, body frame; defaults to straight onto a sail's front
 *   (-normal) and to +x for a cannonball; required for a plate-set vehicle
 * @param s0 total solar irradiance at 1 au (W/m²), default SOLAR_CONSTANT (1361)
 * @returns characteristic acceleration (m/s²)
 * @throws SrpError naming `sunDirBody` or `s0`
 */
export function characteristicAcceleration(
  vehicle: CompiledVehicle,
  sunDirBody?: ReadonlyVec3,
  s0: number = SOLAR_CONSTANT,
): number {
  let sun: ReadonlyVec3;
  if (sunDirBody !== undefined) sun = sunDirBody;
  else if (vehicle.kind === 'sail') {
    const n = vehicle.sailNormal;
    scratchSun[0] = -n[0]!;
    scratchSun[1] = -n[1]!;
    scratchSun[2] = -n[2]!;
    sun = scratchSun;
  } else if (vehicle.kind === 'cannonball') {
    scratchSun[0] = 1;
    scratchSun[1] = 0;
    scratchSun[2] = 0;
    sun = scratchSun;
  } else {
    throw new SrpError(
      'invalid_input',
      `sunDirBody is required for the plate-set vehicle '${vehicle.name}': its push depends on where the Sun is`,
      { field: 'sunDirBody', value: undefined },
    );
  }
  const pressure = radiationPressureAt(ASTRONOMICAL_UNIT, s0);
  const f = evaluateSrp(scratchResult, vehicle, sun, pressure, 1).forceBody;
  return Math.hypot(f[0], f[1], f[2]) / vehicle.massKg;
}

/**
 * Sail loading σ = m / A (McInnes 1999, §2.4, from memory).
 * @param massKg total vehicle mass (kg), > 0
 * @param areaM2 sail area (m²), > 0
 * @returns sail loading (kg/m²)
 */
export function sailLoading(massKg: number, areaM2: number): number {
  return requirePositive(massKg, 'massKg', 'kg') / requirePositive(areaM2, 'areaM2', 'm^2');
}

/**
 * Lightness number β = a_c / g☉(1 au): the ratio of SRP to solar gravity, both falling as 1/r²
 * (McInnes 1999, §2.4, from memory).
 * @param characteristicAccelerationMps2 a_c (m/s²), ≥ 0
 * @returns lightness number (unit-less)
 */
export function lightnessNumber(characteristicAccelerationMps2: number): number {
  if (!(characteristicAccelerationMps2 >= 0 && characteristicAccelerationMps2 < Infinity)) {
    throw new SrpError(
      Number.isFinite(characteristicAccelerationMps2) ? 'out_of_range' : 'invalid_input',
      `characteristicAccelerationMps2 must be a finite number (m/s^2) >= 0; got ${characteristicAccelerationMps2}`,
      { field: 'characteristicAccelerationMps2', value: characteristicAccelerationMps2, limit: '>= 0' },
    );
  }
  return characteristicAccelerationMps2 / SUN_GRAVITY_AT_1AU;
}

/**
 * Characteristic acceleration of an ideal (perfectly reflecting, flat) sail, a_c = 2 P(1 au) / σ
 * (McInnes 1999, §2.4, from memory).
 * @param sailLoadingKgM2 σ (kg/m²), > 0
 * @param s0 total solar irradiance at 1 au (W/m²), default SOLAR_CONSTANT
 * @returns characteristic acceleration (m/s²)
 */
export function idealSailCharacteristicAcceleration(sailLoadingKgM2: number, s0: number = SOLAR_CONSTANT): number {
  requirePositive(sailLoadingKgM2, 'sailLoadingKgM2', 'kg/m^2');
  return (2 * radiationPressureAt(ASTRONOMICAL_UNIT, s0)) / sailLoadingKgM2;
}

/**
 * Critical sail loading σ* = 2 P(1 au) / g☉(1 au): the loading at which an ideal sail facing the
 * Sun has lightness number 1 (McInnes 1999, §2.4, quotes ≈ 1.53 g/m²; from memory).
 * @param s0 total solar irradiance at 1 au (W/m²), default SOLAR_CONSTANT
 * @returns critical sail loading (kg/m²)
 */
export function criticalSailLoading(s0: number = SOLAR_CONSTANT): number {
  return (2 * radiationPressureAt(ASTRONOMICAL_UNIT, s0)) / SUN_GRAVITY_AT_1AU;
}
