/**
 * Attitude laws: each is compiled once (`createAttitudeLaw` or a `create*Law`) and then
 * evaluated allocation-free through the one signature `attitudeAt`, so a propagator can call any
 * law. Every law returns the attitude in the product's quaternion convention (quaternion.ts:
 * `[w, x, y, z]`, Hamilton, carrying the EQJ axes onto the body axes).
 */
import { SrpError } from '../errors';
import type { ReadonlyVec3 } from '../math/vec3';
import { createInertialLaw, inertialAttitude } from './inertial-law';
import type { InertialLaw, InertialLawSpec } from './inertial-law';
import { createLvlhLaw, lvlhAttitude } from './lvlh-law';
import type { LvlhLaw, LvlhLawSpec } from './lvlh-law';
import { createSailConeClockLaw, sailConeClockAttitude } from './sail-cone-clock-law';
import type { SailConeClockLaw, SailConeClockLawSpec } from './sail-cone-clock-law';
import { createSunPointingLaw, sunPointingAttitude } from './sun-pointing-law';
import type { SunPointingLaw, SunPointingLawSpec } from './sun-pointing-law';
import { createTabulatedLaw, tabulatedAttitude } from './tabulated-law';
import type { TabulatedLaw, TabulatedLawSpec } from './tabulated-law';
import type { Quat } from './quaternion';

/** The names of the attitude laws (the `law` tag of specs and compiled laws). */
export const attitudeLawKinds = ['inertial', 'sun-pointing', 'lvlh', 'sail-cone-clock', 'tabulated'] as const;
/** One of `attitudeLawKinds`. */
export type AttitudeLawKind = (typeof attitudeLawKinds)[number];

/** Any attitude law as a caller describes it, SI units (angles in rad, times in s). */
export type AttitudeLawSpec =
  | InertialLawSpec
  | SunPointingLawSpec
  | LvlhLawSpec
  | SailConeClockLawSpec
  | TabulatedLawSpec;

/** Any compiled attitude law, ready for `attitudeAt`. */
export type AttitudeLaw = InertialLaw | SunPointingLaw | LvlhLaw | SailConeClockLaw | TabulatedLaw;

/**
 * Checks and compiles an attitude law from its spec (allocates; not for hot paths).
 * @param field path of `spec` in the caller's input, used in errors (`attitude`)
 * @throws SrpError `invalid_input`/`out_of_range` naming the offending `<field>.<key>`
 */
export function createAttitudeLaw(spec: AttitudeLawSpec, field = 'attitude'): AttitudeLaw {
  switch (spec.law) {
    case 'inertial':
      return createInertialLaw(spec, field);
    case 'sun-pointing':
      return createSunPointingLaw(spec, field);
    case 'lvlh':
      return createLvlhLaw(spec, field);
    case 'sail-cone-clock':
      return createSailConeClockLaw(spec, field);
    case 'tabulated':
      return createTabulatedLaw(spec, field);
    default: {
      const law: unknown = (spec as { law?: unknown }).law;
      throw new SrpError(
        'invalid_input',
        `${field}.law must be one of ${attitudeLawKinds.join(', ')}; got ${String(law)}`,
        { field: `${field}.law`, value: law, limit: attitudeLawKinds.join(' | ') },
      );
    }
  }
}

/**
 * The attitude of the spacecraft under a law at one instant. The one signature every law
 * shares; arguments a law does not need are ignored (the inertial law reads none, the tabulated
 * law only the time). Allocates nothing (unless a sail steering function does).
 * @param out receives the unit attitude quaternion `[w, x, y, z]` (EQJ axes onto body axes)
 * @param law a compiled law (`createAttitudeLaw`)
 * @param tSeconds time from the scenario epoch (s)
 * @param rSatEci spacecraft position relative to the central body (m), EQJ
 * @param vSatEci spacecraft velocity relative to the central body (m/s), EQJ
 * @param sunPosEci Sun position relative to the central body (m), EQJ; zero for heliocentric flight
 * @returns out
 * @throws SrpError for a state the law cannot use (named `rSatEci`, `vSatEci`, `sunPosEci`,
 *   `tSeconds`), see each law
 */
export function attitudeAt(
  out: Quat,
  law: AttitudeLaw,
  tSeconds: number,
  rSatEci: ReadonlyVec3,
  vSatEci: ReadonlyVec3,
  sunPosEci: ReadonlyVec3,
): Quat {
  switch (law.law) {
    case 'inertial':
      return inertialAttitude(out, law);
    case 'sun-pointing':
      return sunPointingAttitude(out, law, rSatEci, vSatEci, sunPosEci);
    case 'lvlh':
      return lvlhAttitude(out, law, rSatEci, vSatEci);
    case 'sail-cone-clock':
      return sailConeClockAttitude(out, law, tSeconds, rSatEci, vSatEci, sunPosEci);
    case 'tabulated':
      return tabulatedAttitude(out, law, tSeconds);
  }
}
