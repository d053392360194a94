/**
 * Directions that attitude laws point at or align with, computed from the state, allocation-free.
 * Positions and velocities are in the inertial frame EQJ (J2000 mean equator and equinox),
 * relative to the central body (the Earth, or the Sun for heliocentric flight).
 */
import { SrpError } from '../errors';
import { createVec3 } from '../math/vec3';
import type { ReadonlyVec3, Vec3 } from '../math/vec3';
import { PARALLEL_SINE_LIMIT } from './attitude-input';

/**
 * Reference directions a secondary body axis can be aligned with:
 * - `orbit-normal`: r × v, the orbital angular momentum direction about the central body;
 * - `celestial-north`: EQJ +z;
 * - `nadir`: -r, from the spacecraft to the centre of the central body;
 * - `velocity`: v, relative to the central body.
 */
export const secondaryReferences = ['orbit-normal', 'celestial-north', 'nadir', 'velocity'] as const;
/** One of `secondaryReferences`. */
export type SecondaryReference = (typeof secondaryReferences)[number];

const refScratch = createVec3();

/**
 * Unit vector from the spacecraft to the Sun, (sunPos - rSat) / |sunPos - rSat|, inertial frame.
 * @param out receives the unit vector
 * @param sunPosEci position of the Sun relative to the central body (m), EQJ
 * @param rSatEci position of the spacecraft relative to the central body (m), EQJ
 * @returns out
 * @throws SrpError `invalid_input` naming `sunPosEci` when the Sun line is zero or not finite
 */
export function satToSunUnit(out: Vec3, sunPosEci: ReadonlyVec3, rSatEci: ReadonlyVec3): Vec3 {
  const x = sunPosEci[0] - rSatEci[0];
  const y = sunPosEci[1] - rSatEci[1];
  const z = sunPosEci[2] - rSatEci[2];
  // sqrt of the sum of squares, not Math.hypot (~20× slower in V8): no overflow below 1e150 m.
  const n = Math.sqrt(x * x + y * y + z * z);
  if (!(n > 0 && n < Infinity)) {
    throw new SrpError(
      'invalid_input',
      `sunPosEci - rSatEci must be a finite, non-zero vector (m); got [${x}, ${y}, ${z}]`,
      { field: 'sunPosEci', value: [sunPosEci[0], sunPosEci[1], sunPosEci[2]], limit: 'finite, != rSatEci' },
    );
  }
  out[0] = x / n;
  out[1] = y / n;
  out[2] = z / n;
  return out;
}

/** Writes the (unnormalised) reference direction into out; throws on non-finite input. */
function rawReference(
  out: Vec3,
  reference: SecondaryReference,
  rSatEci: ReadonlyVec3,
  vSatEci: ReadonlyVec3,
): Vec3 {
  // Indexed reads, not array destructuring: V8 (Node 20) allocates an iterator for the latter.
  const rx = rSatEci[0], ry = rSatEci[1], rz = rSatEci[2];
  const vx = vSatEci[0], vy = vSatEci[1], vz = vSatEci[2];
  switch (reference) {
    case 'orbit-normal':
      out[0] = ry * vz - rz * vy;
      out[1] = rz * vx - rx * vz;
      out[2] = rx * vy - ry * vx;
      break;
    case 'celestial-north':
      out[0] = 0;
      out[1] = 0;
      out[2] = 1;
      break;
    case 'nadir':
      out[0] = -rx;
      out[1] = -ry;
      out[2] = -rz;
      break;
    case 'velocity':
      out[0] = vx;
      out[1] = vy;
      out[2] = vz;
      break;
  }
  if (!Number.isFinite(out[0] + out[1] + out[2])) {
    const rFinite = Number.isFinite(rx + ry + rz);
    const field = reference === 'velocity' || (reference === 'orbit-normal' && rFinite) ? 'vSatEci' : 'rSatEci';
    const value = field === 'vSatEci' ? [vx, vy, vz] : [rx, ry, rz];
    throw new SrpError('invalid_input', `${field} must be finite for the ${reference} reference; got [${value.join(', ')}]`, {
      field,
      value,
      limit: 'finite',
    });
  }
  return out;
}

/**
 * Unit component of `v` perpendicular to the unit `axis`, into out.
 * @returns false (out untouched) when v is zero or within PARALLEL_SINE_LIMIT of ±axis
 */
function perpendicularUnit(out: Vec3, v: ReadonlyVec3, axis: ReadonlyVec3): boolean {
  const len = Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
  const along = v[0] * axis[0] + v[1] * axis[1] + v[2] * axis[2];
  const px = v[0] - along * axis[0];
  const py = v[1] - along * axis[1];
  const pz = v[2] - along * axis[2];
  const perp = Math.sqrt(px * px + py * py + pz * pz);
  // perp / len is the sine of the angle between v and the axis.
  if (!(perp > PARALLEL_SINE_LIMIT * len)) return false;
  out[0] = px / perp;
  out[1] = py / perp;
  out[2] = pz / perp;
  return true;
}

const NORTH: ReadonlyVec3 = [0, 0, 1];
const EQUINOX: ReadonlyVec3 = [1, 0, 0];

/**
 * The unit component of a reference direction perpendicular to a unit axis (e.g. the Sun line),
 * inertial frame: the direction in which a secondary body axis is placed so that it is as close
 * as possible to the reference. Allocates nothing.
 *
 * Fallback when the reference is zero (r × v = 0, r = 0, v = 0) or within PARALLEL_SINE_LIMIT
 * of the axis (the attitude about the axis is then undefined): celestial north (EQJ +z) is used
 * instead, or the vernal equinox (EQJ +x) when the reference is celestial north or north is also
 * parallel to the axis. The function returns true when it fell back, so that the caller can say so.
 * @param out receives the unit vector, perpendicular to `axisInertial`
 * @param axisInertial unit vector, inertial frame
 * @param rSatEci spacecraft position relative to the central body (m), EQJ
 * @param vSatEci spacecraft velocity relative to the central body (m/s), EQJ
 * @returns true when the fallback direction was used
 * @throws SrpError `invalid_input` naming `rSatEci` or `vSatEci` when the reference is not finite
 */
export function perpendicularReference(
  out: Vec3,
  reference: SecondaryReference,
  axisInertial: ReadonlyVec3,
  rSatEci: ReadonlyVec3,
  vSatEci: ReadonlyVec3,
): boolean {
  rawReference(refScratch, reference, rSatEci, vSatEci);
  if (perpendicularUnit(out, refScratch, axisInertial)) return false;
  if (reference !== 'celestial-north' && perpendicularUnit(out, NORTH, axisInertial)) return true;
  // The axis cannot be within 1e-6 of both EQJ +z and +x, so this always succeeds.
  perpendicularUnit(out, EQUINOX, axisInertial);
  return true;
}
