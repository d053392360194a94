/**
 * Two-axis alignment (the TRIAD construction): put a primary body axis exactly along one
 * inertial direction and a secondary body axis as close as possible to a second one.
 *
 * Both sides are completed to right-handed orthonormal triads (primary, secondary ⊥ primary,
 * primary × secondary). With T_B the triad in body components and T_I in inertial components,
 * the attitude is R = T_I T_Bᵀ, i.e. q = q(T_I) ⊗ conj(q(T_B)) in the product's convention
 * (quaternion.ts: q carries the inertial axes onto the body axes, R(q1 ⊗ q2) = R(q1) R(q2)).
 * The body half is fixed for a law, so it is computed once by `createBodyTriad`.
 * Source: the TRIAD method, Black, "A passive system for determining the attitude of a
 * satellite", AIAA Journal 2(7), 1964 (from memory).
 */
import { SrpError } from '../errors';
import { createVec3, crossVec3, dotVec3 } from '../math/vec3';
import type { ReadonlyVec3 } from '../math/vec3';
import { PARALLEL_SINE_LIMIT, checkAxis } from './attitude-input';
import { conjugateQuat, createQuat, multiplyQuat, quatFromBodyAxes } from './quaternion';
import type { Quat, ReadonlyQuat } from './quaternion';

const thirdScratch = createVec3();

/**
 * The body half of a two-axis alignment: conj of the quaternion whose "body axes" are the body
 * triad (primary, secondary made perpendicular to primary, their cross product). Allocates.
 * @param primaryBody body axis to align exactly (any non-zero length)
 * @param secondaryBody body axis to align as closely as possible; only its component
 *   perpendicular to `primaryBody` matters; must not be parallel to it
 * @returns conj(q(T_B)), to pass to `alignTriad`
 * @throws SrpError `invalid_input` naming `primaryField` or `secondaryField`
 */
export function createBodyTriad(
  primaryBody: ReadonlyVec3,
  secondaryBody: ReadonlyVec3,
  primaryField: string,
  secondaryField: string,
): Quat {
  const p = checkAxis(createVec3(), primaryBody, primaryField);
  const s = checkAxis(createVec3(), secondaryBody, secondaryField);
  const along = dotVec3(s, p);
  const perp = createVec3(s[0] - along * p[0], s[1] - along * p[1], s[2] - along * p[2]);
  const sine = Math.hypot(perp[0], perp[1], perp[2]);
  if (!(sine >= PARALLEL_SINE_LIMIT)) {
    throw new SrpError(
      'invalid_input',
      `${secondaryField} must not be parallel to ${primaryField}; got [${secondaryBody.join(', ')}] ` +
        `and [${primaryBody.join(', ')}]`,
      { field: secondaryField, value: Array.from(secondaryBody), limit: `not parallel to ${primaryField}` },
    );
  }
  perp[0] /= sine;
  perp[1] /= sine;
  perp[2] /= sine;
  const third = crossVec3(createVec3(), p, perp);
  const qTriadInBody = quatFromBodyAxes(createQuat(), p, perp, third);
  return conjugateQuat(qTriadInBody, qTriadInBody);
}

/**
 * The attitude that puts the body triad of `bodyTriadConj` onto the inertial triad
 * (primaryInertial, secondaryInertial, primary × secondary). Allocates nothing.
 * @param out receives the attitude quaternion (inertial axes onto body axes)
 * @param primaryInertial unit vector, inertial frame
 * @param secondaryInertial unit vector perpendicular to `primaryInertial`, inertial frame
 * @param bodyTriadConj from `createBodyTriad`
 * @returns out
 */
export function alignTriad(
  out: Quat,
  primaryInertial: ReadonlyVec3,
  secondaryInertial: ReadonlyVec3,
  bodyTriadConj: ReadonlyQuat,
): Quat {
  crossVec3(thirdScratch, primaryInertial, secondaryInertial);
  quatFromBodyAxes(out, primaryInertial, secondaryInertial, thirdScratch);
  return multiplyQuat(out, out, bodyTriadConj);
}
