import { SrpError, requirePositive } from '../errors';
import { dotVec3, normVec3, setVec3 } from '../math/vec3';
import type { ReadonlyVec3, Vec3 } from '../math/vec3';
import { resolvePlateOptics } from './plate-optics';
import type { SurfaceOpticsInput } from './plate-optics';
import type { SurfaceOptics } from './surface-optics';
import { surfaceForceCoefficients } from './surface-optics';

/** A flat plate as a caller describes it, before checking. */
export interface FlatPlateSpec {
  /** Area (m²), > 0. */
  area: number;
  /** Outward normal of the front side, body frame; any non-zero length, normalised on creation. */
  normal: ReadonlyVec3;
  /** Optics of the front side (fractions, or a material preset name). */
  front: SurfaceOpticsInput;
  /** Optics of the back side; absent means the back takes no light (one-sided plate). */
  back?: SurfaceOpticsInput;
}

declare const checkedPlate: unique symbol;

/**
 * A checked flat plate: area > 0, unit normal, valid optics. Made only by `createFlatPlate`, so
 * the force function can trust it without checking again in the hot path.
 */
export type FlatPlate = {
  /** Area (m²). */
  readonly area: number;
  /** Unit outward normal of the front side, body frame. */
  readonly normal: ReadonlyVec3;
  /** Optics of the front side. */
  readonly front: Readonly<SurfaceOptics>;
  /** Optics of the back side, null for a one-sided plate. */
  readonly back: Readonly<SurfaceOptics> | null;
  /** Force coefficients c0, c1, c2 of the front side then of the back side (`surfaceForceCoefficients`). */
  readonly coefficients: Float64Array;
  readonly [checkedPlate]: true;
};

/** Throws unless `v` is a finite non-zero vector; returns its length. */
export function requireDirection(v: ReadonlyVec3, field: string): number {
  const length = normVec3(v);
  if (!Number.isFinite(length) || length === 0) {
    throw new SrpError(
      'invalid_input',
      `${field} must be a finite, non-zero vector; got [${v[0]}, ${v[1]}, ${v[2]}]`,
      { field, value: [v[0], v[1], v[2]] },
    );
  }
  return length;
}

/**
 * Checks a plate and returns a copy with its normal normalised (allocates; not for hot paths).
 * @param field path of `spec` in the caller's input, used in errors (`plates.3`)
 * @throws SrpError naming `<field>.area`, `<field>.normal` or the offending `<field>.front.*`
 */
export function createFlatPlate(spec: FlatPlateSpec, field = 'plate'): FlatPlate {
  requirePositive(spec.area, `${field}.area`, 'm^2');
  const length = requireDirection(spec.normal, `${field}.normal`);
  const optics = resolvePlateOptics(spec.front, spec.back, field);
  const coefficients = new Float64Array(6);
  surfaceForceCoefficients(coefficients, 0, optics.front);
  if (optics.back) surfaceForceCoefficients(coefficients, 3, optics.back);
  const [nx, ny, nz] = spec.normal;
  const plate = {
    area: spec.area,
    normal: [nx / length, ny / length, nz / length] as const,
    front: optics.front,
    back: optics.back,
    coefficients,
  };
  return plate as FlatPlate;
}

/**
 * Tolerance on |satToSun|² - 1: a direction normalised in double precision is within ~1e-15,
 * one that went through single precision within ~1e-7; an unnormalised vector is far outside.
 */
export const UNIT_TOLERANCE = 1e-6;

/**
 * Solar radiation pressure force on a flat plate, standard flat-plate model with Lambertian
 * diffuse reflection and optional Lambertian thermal re-emission:
 *
 *   F = -P A cos θ [ (1 - ρs) s + (2 ρs cos θ + 2 ρd / 3 + (2/3) α (εf - εb)/(εf + εb)) m ],
 *
 * cos θ = m · s > 0, with s the unit vector to the Sun and m the outward normal of the lit face:
 * the front normal n when n · s > 0 (front optics), -n when n · s < 0 and the plate has a back
 * (back optics, whose emissivity roles are the front's swapped). ρs, ρd, α are the lit side's
 * specular, diffuse and absorbed fractions. Zero when the Sun is in the plate's plane or behind a
 * one-sided plate.
 * Source: Montenbruck & Gill, Satellite Orbits (Springer, 2000), §3.4, eq. (3.73) for the
 * absorbed + specular form (equation number from memory, not checked against the book here);
 * the Lambertian term 2ρd/3 m as in Milani, Nobili & Farinella, Non-gravitational Perturbations
 * and Satellite Geodesy (1987) (from memory); the thermal term as in `surfaceForceCoefficients`.
 * Allocates nothing.
 * @param out receives the force (N), in the frame of `plate.normal` and `satToSun`
 * @param plate a plate from `createFlatPlate`
 * @param satToSun unit vector from the spacecraft to the Sun, same frame as `plate.normal`
 * @param pressure radiation pressure at the spacecraft (N/m² = Pa), ≥ 0, e.g. `radiationPressureAt`
 * @returns force (N), `out`
 * @throws SrpError naming `pressure` (`invalid_input`, `out_of_range`) or `satToSun` (`invalid_input`)
 */
export function flatPlateForce(
  out: Vec3,
  plate: FlatPlate,
  satToSun: ReadonlyVec3,
  pressure: number,
): Vec3 {
  if (!(pressure >= 0 && pressure < Infinity)) {
    throw new SrpError(
      Number.isFinite(pressure) ? 'out_of_range' : 'invalid_input',
      `pressure must be a finite number (Pa) >= 0; got ${pressure}`,
      { field: 'pressure', value: pressure, limit: '>= 0' },
    );
  }
  const lengthSq = dotVec3(satToSun, satToSun);
  if (!(Math.abs(lengthSq - 1) <= UNIT_TOLERANCE)) {
    const [x, y, z] = satToSun;
    throw new SrpError(
      'invalid_input',
      `satToSun must be a unit vector; got [${x}, ${y}, ${z}] with |v|² = ${lengthSq}`,
      { field: 'satToSun', value: [x, y, z], limit: `|v|² = 1 ± ${UNIT_TOLERANCE}` },
    );
  }
  const n = plate.normal;
  let cosTheta = dotVec3(n, satToSun);
  let sign = 1;
  let base = 0;
  if (cosTheta < 0 && plate.back !== null) {
    cosTheta = -cosTheta;
    sign = -1;
    base = 3;
  }
  if (cosTheta <= 0) return setVec3(out, 0, 0, 0);

  const c = plate.coefficients;
  const k = -pressure * plate.area * cosTheta;
  const alongSun = k * c[base]!;
  const alongNormal = sign * k * (c[base + 1]! * cosTheta + c[base + 2]!);
  return setVec3(
    out,
    alongSun * satToSun[0] + alongNormal * n[0],
    alongSun * satToSun[1] + alongNormal * n[1],
    alongSun * satToSun[2] + alongNormal * n[2],
  );
}
