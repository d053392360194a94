import { SrpError } from '../errors';
import { createVec3 } from '../math/vec3';
import type { ReadonlyVec3, Vec3 } from '../math/vec3';
import { PARALLEL_SINE_LIMIT, checkUnitQuat } from './attitude-input';
import { createQuat, multiplyQuat, quatFromBodyAxes } from './quaternion';
import type { Quat, ReadonlyQuat } from './quaternion';

/** A nadir-pointing (LVLH-following) attitude as a caller describes it. */
export interface LvlhLawOptions {
  /**
   * Fixed rotation from the LVLH axes to the body axes, `[w, x, y, z]` (carries the LVLH axes onto
   * the body axes, expressed in LVLH); |q| = 1 ± 1e-4. Omitted: the identity (body = LVLH).
   */
  offsetQuaternion?: ArrayLike<number> | undefined;
}
/** `LvlhLawOptions` tagged for `createAttitudeLaw`. */
export type LvlhLawSpec = LvlhLawOptions & { law: 'lvlh' };

declare const checkedLvlhLaw: unique symbol;

/** A checked LVLH law, made by `createLvlhLaw`. */
export type LvlhLaw = {
  readonly law: 'lvlh';
  /** Unit offset quaternion, LVLH axes onto body axes. */
  readonly offset: ReadonlyQuat;
  readonly [checkedLvlhLaw]: true;
};

/**
 * Checks and compiles an LVLH law (allocates; not for hot paths).
 * @param field path of `spec` in the caller's input, used in errors (`attitude`)
 * @throws SrpError `invalid_input` naming `<field>.offsetQuaternion`
 */
export function createLvlhLaw(spec: LvlhLawOptions & { law?: 'lvlh' } = {}, field = 'attitude'): LvlhLaw {
  const offset =
    spec.offsetQuaternion === undefined
      ? createQuat()
      : checkUnitQuat(createQuat(), spec.offsetQuaternion, `${field}.offsetQuaternion`);
  return { law: 'lvlh', offset } as unknown as LvlhLaw;
}

const xScratch = createVec3();
const yScratch = createVec3();
const zScratch = createVec3();

/**
 * Attitude of the local-vertical/local-horizontal frame (EQJ axes onto LVLH axes):
 *   z = -r / |r|            (nadir)
 *   y = -(r × v) / |r × v|  (negative orbit normal)
 *   x = y × z               (along-track; equals v / |v| on a circular orbit)
 * Source: common practice (the ISS / Space Shuttle LVLH frame); the same axes are documented for
 * the Princeton Satellite Systems toolbox function QLVLH ("z is in the -r direction, y is in the
 * -r×v direction, and x completes the set"), psatellite.github.io, Sail/Guidance/EarthOrbitLVLH.
 * Other tools call a different frame LVLH (e.g. x radial outward): check before exchanging data.
 * Allocates nothing.
 * @param out receives the quaternion
 * @param rSatEci spacecraft position relative to the central body (m), EQJ
 * @param vSatEci spacecraft velocity relative to the central body (m/s), EQJ
 * @returns out
 * @throws SrpError `invalid_input` naming `rSatEci` (zero or not finite) or `vSatEci` (not finite,
 *   zero, or parallel to rSatEci: no orbit plane)
 */
export function lvlhQuat(out: Quat, rSatEci: ReadonlyVec3, vSatEci: ReadonlyVec3): Quat {
  // Indexed reads, not array destructuring: V8 (Node 20) allocates an iterator for the latter.
  const rx = rSatEci[0], ry = rSatEci[1], rz = rSatEci[2];
  const vx = vSatEci[0], vy = vSatEci[1], vz = vSatEci[2];
  // sqrt of the sum of squares, not Math.hypot (~20× slower in V8): no overflow below 1e150 m.
  const rNorm = Math.sqrt(rx * rx + ry * ry + rz * rz);
  if (!(rNorm > 0 && rNorm < Infinity)) {
    throw new SrpError('invalid_input', `rSatEci must be a finite, non-zero position (m) for LVLH; got [${rx}, ${ry}, ${rz}]`, {
      field: 'rSatEci',
      value: [rx, ry, rz],
      limit: 'finite, non-zero',
    });
  }
  const hx = ry * vz - rz * vy;
  const hy = rz * vx - rx * vz;
  const hz = rx * vy - ry * vx;
  const hNorm = Math.sqrt(hx * hx + hy * hy + hz * hz);
  const vNorm = Math.sqrt(vx * vx + vy * vy + vz * vz);
  // |h| / (|r| |v|) is the cosine of the flight-path angle: 0 on a radial trajectory.
  if (!(hNorm > PARALLEL_SINE_LIMIT * rNorm * vNorm && hNorm < Infinity)) {
    throw new SrpError(
      'invalid_input',
      `vSatEci must be finite and not parallel to rSatEci for LVLH (no orbit plane); got [${vx}, ${vy}, ${vz}]`,
      { field: 'vSatEci', value: [vx, vy, vz], limit: 'finite, not parallel to rSatEci' },
    );
  }
  const z = zScratch;
  z[0] = -rx / rNorm;
  z[1] = -ry / rNorm;
  z[2] = -rz / rNorm;
  const y = yScratch;
  y[0] = -hx / hNorm;
  y[1] = -hy / hNorm;
  y[2] = -hz / hNorm;
  const x: Vec3 = xScratch;
  x[0] = y[1] * z[2] - y[2] * z[1];
  x[1] = y[2] * z[0] - y[0] * z[2];
  x[2] = y[0] * z[1] - y[1] * z[0];
  return quatFromBodyAxes(out, x, y, z);
}

/**
 * LVLH attitude with the law's fixed offset: q = q_LVLH ⊗ q_offset. Allocates nothing.
 * @param out receives the attitude quaternion (EQJ axes onto body axes)
 * @param rSatEci spacecraft position relative to the central body (m), EQJ
 * @param vSatEci spacecraft velocity relative to the central body (m/s), EQJ
 * @returns out
 * @throws SrpError as `lvlhQuat`
 */
export function lvlhAttitude(out: Quat, law: LvlhLaw, rSatEci: ReadonlyVec3, vSatEci: ReadonlyVec3): Quat {
  lvlhQuat(out, rSatEci, vSatEci);
  return multiplyQuat(out, out, law.offset);
}
