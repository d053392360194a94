import { SrpError } from '../errors';
import { createVec3 } from '../math/vec3';
import type { ReadonlyVec3 } from '../math/vec3';
import { perpendicularReference, satToSunUnit, secondaryReferences } from './reference-direction';
import type { SecondaryReference } from './reference-direction';
import { alignTriad, createBodyTriad } from './triad';
import type { Quat, ReadonlyQuat } from './quaternion';

/** A Sun-pointing attitude with a secondary-axis constraint, as a caller describes it. */
export interface SunPointingLawOptions {
  /** Body axis that points at the Sun (e.g. +z, a panel normal); any non-zero length. */
  sunAxisBody: ReadonlyVec3;
  /**
   * Body axis aligned as closely as possible with `secondaryReference`; not parallel to
   * `sunAxisBody` (only its component perpendicular to `sunAxisBody` matters).
   */
  secondaryAxisBody: ReadonlyVec3;
  /** The inertial direction the secondary axis follows (see `secondaryReferences`). */
  secondaryReference: SecondaryReference;
}
/** `SunPointingLawOptions` tagged for `createAttitudeLaw`. */
export type SunPointingLawSpec = SunPointingLawOptions & { law: 'sun-pointing' };

declare const checkedSunPointingLaw: unique symbol;

/** A checked Sun-pointing law, made by `createSunPointingLaw`. */
export type SunPointingLaw = {
  readonly law: 'sun-pointing';
  readonly secondaryReference: SecondaryReference;
  /** conj of the body triad (sun axis, secondary ⊥, cross), precomputed. */
  readonly bodyTriadConj: ReadonlyQuat;
  /**
   * True when the last evaluation found the reference zero or parallel to the Sun line and used
   * the fallback (celestial north, or the vernal equinox; see `perpendicularReference`).
   */
  readonly usedFallback: boolean;
  readonly [checkedSunPointingLaw]: true;
};

/**
 * Checks and compiles a Sun-pointing law (allocates; not for hot paths).
 * @param field path of `spec` in the caller's input, used in errors (`attitude`)
 * @throws SrpError `invalid_input` naming `<field>.sunAxisBody`, `<field>.secondaryAxisBody` or
 *   `<field>.secondaryReference`
 */
export function createSunPointingLaw(
  spec: SunPointingLawOptions & { law?: 'sun-pointing' },
  field = 'attitude',
): SunPointingLaw {
  if (!secondaryReferences.includes(spec.secondaryReference)) {
    throw new SrpError(
      'invalid_input',
      `${field}.secondaryReference must be one of ${secondaryReferences.join(', ')}; got ${String(spec.secondaryReference)}`,
      { field: `${field}.secondaryReference`, value: spec.secondaryReference, limit: secondaryReferences.join(' | ') },
    );
  }
  const bodyTriadConj = createBodyTriad(
    spec.sunAxisBody,
    spec.secondaryAxisBody,
    `${field}.sunAxisBody`,
    `${field}.secondaryAxisBody`,
  );
  return {
    law: 'sun-pointing',
    secondaryReference: spec.secondaryReference,
    bodyTriadConj,
    usedFallback: false,
  } as unknown as SunPointingLaw;
}

const sunDirScratch = createVec3();
const secondaryScratch = createVec3();

/**
 * Sun-pointing attitude: the Sun axis along the spacecraft-to-Sun line, the secondary axis in the
 * half-plane bounded by the Sun line that contains the reference direction (the closest it can
 * get to the reference). Allocates nothing; sets `law.usedFallback`.
 * @param out receives the attitude quaternion (EQJ axes onto body axes)
 * @param rSatEci spacecraft position relative to the central body (m), EQJ
 * @param vSatEci spacecraft velocity relative to the central body (m/s), EQJ
 * @param sunPosEci Sun position relative to the central body (m), EQJ (zero for heliocentric flight)
 * @returns out
 * @throws SrpError `invalid_input` naming `sunPosEci`, `rSatEci` or `vSatEci` for unusable state
 */
export function sunPointingAttitude(
  out: Quat,
  law: SunPointingLaw,
  rSatEci: ReadonlyVec3,
  vSatEci: ReadonlyVec3,
  sunPosEci: ReadonlyVec3,
): Quat {
  satToSunUnit(sunDirScratch, sunPosEci, rSatEci);
  return sunPointingAttitudeFromSunDir(out, law, rSatEci, vSatEci, sunDirScratch);
}

/**
 * `sunPointingAttitude` for a caller that already holds the unit spacecraft-to-Sun direction
 * (the SRP force computes it for the pressure): the same attitude without a second square root.
 * Allocates nothing; sets `law.usedFallback`.
 * @param out receives the attitude quaternion (EQJ axes onto body axes)
 * @param rSatEci spacecraft position relative to the central body (m), EQJ
 * @param vSatEci spacecraft velocity relative to the central body (m/s), EQJ
 * @param satToSunEci unit vector from the spacecraft to the Sun, EQJ (as `satToSunUnit` gives it)
 * @returns out
 * @throws SrpError `invalid_input` naming `rSatEci` or `vSatEci` for unusable state
 */
export function sunPointingAttitudeFromSunDir(
  out: Quat,
  law: SunPointingLaw,
  rSatEci: ReadonlyVec3,
  vSatEci: ReadonlyVec3,
  satToSunEci: ReadonlyVec3,
): Quat {
  const fellBack = perpendicularReference(secondaryScratch, law.secondaryReference, satToSunEci, rSatEci, vSatEci);
  (law as { usedFallback: boolean }).usedFallback = fellBack;
  return alignTriad(out, satToSunEci, secondaryScratch, law.bodyTriadConj);
}
