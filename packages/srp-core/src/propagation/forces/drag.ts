/**
 * Atmospheric drag with the exponential density model, a = −½ ρ (Cd A / m) |v_rel| v_rel, where
 * v_rel = v − ω⊕ × r is the velocity relative to an atmosphere that co-rotates with the Earth.
 *
 * Simplifications, each standard for budgets: the Earth's spin axis is the EQJ z-axis (the J2000
 * pole; precession and nutation neglected, ~1e-4 rad per year); the altitude is |r| − R⊕ above a
 * spherical Earth of radius EARTH_EQUATORIAL_RADIUS (up to 21 km low at the poles, which is how
 * Vallado's algorithm uses the table); no winds, no solar or geomagnetic activity.
 */
import { EARTH_EQUATORIAL_RADIUS } from '../../bodies/body-constants';
import { requirePositive } from '../../errors';
import type { Vec3 } from '../../math/vec3';
import type { ForceModel } from './force-model';

/**
 * Rotation rate of the Earth ω⊕ (rad/s).
 * Source: IERS Conventions 2010 (IERS TN 36), Table 1.1 / WGS 84: 7.292115 × 10⁻⁵ rad s⁻¹
 * (nominal mean angular velocity).
 */
export const EARTH_ROTATION_RATE = 7.292115e-5;

/**
 * Exponential atmosphere: rows of [base altitude h0 (km), density ρ0 (kg/m³), scale height H (km)];
 * ρ(h) = ρ0 exp(−(h − h0)/H) in the band h0 ≤ h < next h0.
 * Source: Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), Table 8-4
 * "Exponential atmospheric model" (after the CIRA-72 / U.S. Standard Atmosphere 1976 values;
 * table number from memory, values checked against several independent copies).
 */
export const EXPONENTIAL_ATMOSPHERE_TABLE: readonly (readonly [number, number, number])[] = [
  [0, 1.225, 7.249],
  [25, 3.899e-2, 6.349],
  [30, 1.774e-2, 6.682],
  [40, 3.972e-3, 7.554],
  [50, 1.057e-3, 8.382],
  [60, 3.206e-4, 7.714],
  [70, 8.77e-5, 6.549],
  [80, 1.905e-5, 5.799],
  [90, 3.396e-6, 5.382],
  [100, 5.297e-7, 5.877],
  [110, 9.661e-8, 7.263],
  [120, 2.438e-8, 9.473],
  [130, 8.484e-9, 12.636],
  [140, 3.845e-9, 16.149],
  [150, 2.07e-9, 22.523],
  [180, 5.464e-10, 29.74],
  [200, 2.789e-10, 37.105],
  [250, 7.248e-11, 45.546],
  [300, 2.418e-11, 53.628],
  [350, 9.518e-12, 53.298],
  [400, 3.725e-12, 58.515],
  [450, 1.585e-12, 60.828],
  [500, 6.967e-13, 63.822],
  [600, 1.454e-13, 71.835],
  [700, 3.614e-14, 88.667],
  [800, 1.17e-14, 124.64],
  [900, 5.245e-15, 181.05],
  [1000, 3.019e-15, 268.0],
];

/** Above this altitude (m) the density is taken as zero: the table's top row, 1000 km. */
export const ATMOSPHERE_TOP_M = 1_000_000;

// The table in SI, flattened for the hot path: h0 (m), ρ0 (kg/m³), 1/H (1/m).
const BANDS = EXPONENTIAL_ATMOSPHERE_TABLE.length;
const H0 = new Float64Array(EXPONENTIAL_ATMOSPHERE_TABLE.map((row) => row[0] * 1000));
const RHO0 = new Float64Array(EXPONENTIAL_ATMOSPHERE_TABLE.map((row) => row[1]));
const INV_H = new Float64Array(EXPONENTIAL_ATMOSPHERE_TABLE.map((row) => 1 / (row[2] * 1000)));

/**
 * Density of the exponential atmosphere (Vallado 2013 Table 8-4) at a geometric altitude.
 * Zero above ATMOSPHERE_TOP_M (the model's top; the density there, 3.0e-15 kg/m³, gives drag
 * 1e-5 of SRP for like areas); below 0 the first band is extrapolated.
 * @param altitudeM altitude above the spherical Earth (m)
 * @returns density (kg/m³)
 */
export function exponentialDensity(altitudeM: number): number {
  if (!(altitudeM <= ATMOSPHERE_TOP_M)) return 0;
  let i = BANDS - 1;
  while (i > 0 && altitudeM < H0[i]!) i -= 1;
  return RHO0[i]! * Math.exp(-(altitudeM - H0[i]!) * INV_H[i]!);
}

/** Options of `createDragForce`. */
export interface DragForceOptions {
  /** Drag coefficient Cd (-), > 0 (2.2 is the usual value for a compact satellite). */
  cd: number;
  /** Reference (cross-section) area (m²), > 0. */
  areaM2: number;
  /** Spacecraft mass (kg), > 0. */
  massKg: number;
}

/**
 * Drag on a spacecraft in Earth orbit (exponential atmosphere, co-rotating; see the file comment).
 * @throws SrpError naming `cd`, `areaM2` or `massKg`
 */
export function createDragForce(options: DragForceOptions): ForceModel {
  const cd = requirePositive(options.cd, 'cd', '-');
  const area = requirePositive(options.areaM2, 'areaM2', 'm^2');
  const mass = requirePositive(options.massKg, 'massKg', 'kg');
  const halfBallistic = (0.5 * cd * area) / mass; // ½ Cd A / m (m²/kg)
  const w = EARTH_ROTATION_RATE;
  const radius = EARTH_EQUATORIAL_RADIUS;
  return {
    name: 'drag',
    acceleration(out: Vec3, _t: number, y: Float64Array): Vec3 {
      const x = y[0]!;
      const yy = y[1]!;
      const z = y[2]!;
      const rho = exponentialDensity(Math.sqrt(x * x + yy * yy + z * z) - radius);
      if (rho === 0) {
        out[0] = 0;
        out[1] = 0;
        out[2] = 0;
        return out;
      }
      // v_rel = v − ω × r with ω = (0, 0, ω⊕): ω × r = (−ω y, ω x, 0).
      const vx = y[3]! + w * yy;
      const vy = y[4]! - w * x;
      const vz = y[5]!;
      const k = -halfBallistic * rho * Math.sqrt(vx * vx + vy * vy + vz * vz);
      out[0] = k * vx;
      out[1] = k * vy;
      out[2] = k * vz;
      return out;
    },
  };
}
