/**
 * Checks shared by the attitude laws: unit quaternions and body axes given by a caller.
 * Not for hot paths (they run once, when a law is created).
 */
import { SrpError } from '../errors';
import type { ReadonlyVec3, Vec3 } from '../math/vec3';
import type { Quat } from './quaternion';

/**
 * Allowed deviation of |q| from 1 for a quaternion given as input; within it the quaternion is
 * normalised, beyond it refused. Components printed with 5 decimals round |q| by at most
 * 4 × 5e-6 / 2 ≈ 1e-5, so such data passes; a quaternion that was never meant to be a unit one
 * (a component missing, angles in degrees, a typo) is off by far more.
 */
export const QUATERNION_NORM_TOLERANCE = 1e-4;

/**
 * Smallest sine of the angle between two directions that the attitude code treats as "not
 * parallel". A cross product of unit vectors loses about 1e-16 / sin of its direction to
 * rounding, so at 1e-6 the constructed axis is still good to ~1e-10 rad.
 */
export const PARALLEL_SINE_LIMIT = 1e-6;

/**
 * Checks a quaternion `[w, x, y, z]` (finite components, |q| = 1 ± QUATERNION_NORM_TOLERANCE)
 * and writes it, normalised, into `out`.
 * @param field path of `q` in the caller's input, used in errors (`offsetQuaternion`)
 * @returns out
 * @throws SrpError `invalid_input` naming `field`
 */
export function checkUnitQuat(out: Quat, q: ArrayLike<number>, field: string): Quat {
  const w = q[0];
  const x = q[1];
  const y = q[2];
  const z = q[3];
  if (
    q.length !== 4 ||
    !Number.isFinite(w) ||
    !Number.isFinite(x) ||
    !Number.isFinite(y) ||
    !Number.isFinite(z)
  ) {
    throw new SrpError(
      'invalid_input',
      `${field} must be a quaternion [w, x, y, z] of 4 finite numbers; got [${Array.from(q).join(', ')}]`,
      { field, value: Array.from(q), limit: '4 finite numbers' },
    );
  }
  const norm = Math.hypot(w!, x!, y!, z!);
  if (!(Math.abs(norm - 1) <= QUATERNION_NORM_TOLERANCE)) {
    throw new SrpError(
      'invalid_input',
      `${field} must be a unit quaternion [w, x, y, z] (|q| = 1 ± ${QUATERNION_NORM_TOLERANCE}); ` +
        `got |q| = ${norm}`,
      { field, value: [w, x, y, z], limit: `|q| = 1 ± ${QUATERNION_NORM_TOLERANCE}` },
    );
  }
  out[0] = w! / norm;
  out[1] = x! / norm;
  out[2] = y! / norm;
  out[3] = z! / norm;
  return out;
}

/**
 * Checks a direction (finite, non-zero; any length) and writes its unit vector into `out`.
 * @param field path of `v` in the caller's input, used in errors (`sunAxisBody`)
 * @returns out
 * @throws SrpError `invalid_input` naming `field`
 */
export function checkAxis(out: Vec3, v: ReadonlyVec3, field: string): Vec3 {
  const [x, y, z] = v;
  const norm = Math.hypot(x, y, z);
  if (v.length !== 3 || !Number.isFinite(norm) || norm === 0) {
    throw new SrpError(
      'invalid_input',
      `${field} must be a finite, non-zero direction [x, y, z]; got [${Array.from(v).join(', ')}]`,
      { field, value: Array.from(v), limit: 'finite, non-zero' },
    );
  }
  out[0] = x / norm;
  out[1] = y / norm;
  out[2] = z / norm;
  return out;
}

/**
 * Throws unless `value` is a finite number (for angles and times given once, at creation).
 * @param unit written into the message (`rad`, `s`)
 * @throws SrpError `invalid_input` naming `field`
 */
export function checkFinite(value: number, field: string, unit: string): number {
  if (!Number.isFinite(value)) {
    throw new SrpError('invalid_input', `${field} must be a finite number (${unit}); got ${String(value)}`, {
      field,
      value,
      limit: 'finite',
    });
  }
  return value;
}
