import { SrpError, requirePositive } from '../errors';
import { dotVec3, normVec3, setVec3 } from '../math/vec3';
import type { ReadonlyVec3, Vec3 } from '../math/vec3';
import { checkSurfaceOptics } from './surface-optics';
import type { SurfaceOptics } from './surface-optics';

/** A flat plate as a caller describes it, before checking. */
export interface FlatPlateSpec {
  /** Area (m²), > 0. */
  area: number;
  /** Outward normal of the front side, body frame; any non-zero length, normalised on creation. */
  normal: ReadonlyVec3;
  /** Optics of the front side. The back side is inert for now (one-sided plate). */
  front: SurfaceOptics;
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
  readonly [checkedPlate]: true;
};

/**
 * Checks a plate and returns a copy with its normal normalised (allocates; not for hot paths).
 * @param field path of `spec` in the caller's input, used in errors (`plates.3`)
 * @throws SrpError naming `<field>.area`, `<field>.normal` or the offending `<field>.front.*`
 */
export function createFlatPlate(spec: FlatPlateSpec, field = 'plate'): FlatPlate {
  requirePositive(spec.area, `${field}.area`, 'm^2');
  const [nx, ny, nz] = spec.normal;
  const length = normVec3(spec.normal);
  if (!Number.isFinite(length) || length === 0) {
    throw new SrpError(
      'invalid_input',
      `${field}.normal must be a finite, non-zero vector; got [${nx}, ${ny}, ${nz}]`,
      { field: `${field}.normal`, value: [nx, ny, nz] },
    );
  }
  const front = checkSurfaceOptics(spec.front, `${field}.front`);
  const plate = {
    area: spec.area,
    normal: [nx / length, ny / length, nz / length] as const,
    front: { absorbed: front.absorbed, specular: front.specular, diffuse: front.diffuse },
  };
  return plate as FlatPlate;
}

/**
 * Tolerance on |satToSun|² - 1: a direction normalised in double precision is within ~1e-15,
 * one that went through single precision within ~1e-7; an unnormalised vector is far outside.
 */
const UNIT_TOLERANCE = 1e-6;

/**
 * Solar radiation pressure force on a one-sided flat plate, standard flat-plate model with
 * Lambertian diffuse reflection:
 *
 *   F = -P A cos θ [ (1 - ρs) s + 2 (ρs cos θ + ρd / 3) n ],  cos θ = n · s,
 *
 * with s the unit vector to the Sun, n the front normal, ρs and ρd the specular and diffuse
 * fractions. Zero when the Sun is behind or in the plane of the front side (cos θ ≤ 0).
 * Source: Montenbruck & Gill, Satellite Orbits (Springer, 2000), §3.4, eq. (3.73) for the
 * absorbed + specular form (equation number from memory, not checked against the book here);
 * the Lambertian term 2ρd/3 n as in Milani, Nobili & Farinella, Non-gravitational Perturbations
 * and Satellite Geodesy (1987) (from memory).
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
  const cosTheta = dotVec3(n, satToSun);
  if (cosTheta <= 0) return setVec3(out, 0, 0, 0);

  const { specular, diffuse } = plate.front;
  const k = -pressure * plate.area * cosTheta;
  const alongSun = k * (1 - specular);
  const alongNormal = 2 * k * (specular * cosTheta + diffuse / 3);
  return setVec3(
    out,
    alongSun * satToSun[0] + alongNormal * n[0],
    alongSun * satToSun[1] + alongNormal * n[1],
    alongSun * satToSun[2] + alongNormal * n[2],
  );
}
