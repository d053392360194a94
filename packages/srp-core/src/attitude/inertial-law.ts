import { checkUnitQuat } from './attitude-input';
import { createQuat } from './quaternion';
import type { Quat, ReadonlyQuat } from './quaternion';

/** An inertially fixed attitude as a caller describes it. */
export interface InertialLawOptions {
  /** Attitude `[w, x, y, z]` carrying the EQJ axes onto the body axes; |q| = 1 ± 1e-4, normalised on creation. */
  quaternion: ArrayLike<number>;
}
/** `InertialLawOptions` tagged for `createAttitudeLaw`. */
export type InertialLawSpec = InertialLawOptions & { law: 'inertial' };

declare const checkedInertialLaw: unique symbol;

/** A checked inertially fixed attitude law, made by `createInertialLaw`. */
export type InertialLaw = {
  readonly law: 'inertial';
  /** Unit attitude quaternion (EQJ axes onto body axes). */
  readonly quaternion: ReadonlyQuat;
  readonly [checkedInertialLaw]: true;
};

/**
 * Checks and compiles an inertially fixed attitude (allocates; not for hot paths).
 * @param field path of `spec` in the caller's input, used in errors (`attitude`)
 * @throws SrpError `invalid_input` naming `<field>.quaternion`
 */
export function createInertialLaw(spec: InertialLawOptions & { law?: 'inertial' }, field = 'attitude'): InertialLaw {
  const quaternion = checkUnitQuat(createQuat(), spec.quaternion, `${field}.quaternion`);
  return { law: 'inertial', quaternion } as unknown as InertialLaw;
}

/** out = the fixed quaternion of the law. Allocates nothing. */
export function inertialAttitude(out: Quat, law: InertialLaw): Quat {
  const q = law.quaternion;
  out[0] = q[0];
  out[1] = q[1];
  out[2] = q[2];
  out[3] = q[3];
  return out;
}
