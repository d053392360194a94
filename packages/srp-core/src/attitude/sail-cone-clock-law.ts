/**
 * Solar-sail steering by cone and clock angles relative to the Sun line.
 *
 * Frame (inertial components, computed at each evaluation):
 *   u  = (rSat - sunPos) / |rSat - sunPos|   Sun-to-sail direction (radial, r̂, for a heliocentric sail)
 *   e1 = unit component of the orbit normal r × v perpendicular to u   (clock angle 0)
 *   e2 = e1 × u                                                      (clock angle 90°)
 * The sail normal n (the body axis `normalAxisBody`, pointing AWAY from the Sun, i.e. along the
 * force of an ideal sail) is
 *   n = cos α u + sin α (cos δ e1 + sin δ e2),   cone α ∈ [0, 90°], clock δ any angle,
 * so δ is counted from the orbit-normal side of the Sun line towards e2, counter-clockwise as
 * seen from the Sun. For a heliocentric orbit (u = r̂, e1 = ĥ, e2 = ĥ × r̂ = θ̂, the transverse
 * direction) this reads n = cos α r̂ + sin α sin δ θ̂ + sin α cos δ ĥ: δ = 90° tilts the normal
 * prograde (spiral outwards), δ = 270° retrograde (spiral inwards), δ = 0 towards the orbit normal.
 * Source: n = cos α r̂ + sin α sin δ θ̂ + sin α cos δ k̂ is B. Wie, "Propellantless AOCS design
 * for a 160-m, 450-kg sailcraft of the Solar Polar Imager mission", AIAA 2005-3928, p. 11, as
 * quoted in the Princeton Satellite Systems toolbox documentation (QXToAlphaDelta); the same
 * documentation (ClockConversion) names "clock angle measured from the osculating orbit normal"
 * the McInnes convention (C. R. McInnes, Solar Sailing, Springer-Praxis 1999). The sign of δ in
 * McInnes' book itself was not checked here.
 *
 * Roll about the normal: the body axis `secondaryAxisBody` is put along y_S = m × u with
 * m = cos δ e1 + sin δ e2, the sail-plane direction perpendicular to the Sun line (the axis about
 * which the normal is tilted by α). At α = δ = 0 the body axes (normal, secondary, normal ×
 * secondary) are (r̂, θ̂, ĥ) for a heliocentric sail. This frame is defined for every α,
 * including α = 0.
 *
 * Degenerate case: when the orbit normal is zero or parallel to the Sun line (possible around a
 * planet, never on a heliocentric orbit), e1 falls back to celestial north (EQJ +z), then to the
 * vernal equinox (EQJ +x); `usedFallback` says so.
 */
import { SrpError } from '../errors';
import { createVec3 } from '../math/vec3';
import type { ReadonlyVec3 } from '../math/vec3';
import { checkAxis, checkFinite } from './attitude-input';
import { perpendicularReference, satToSunUnit } from './reference-direction';
import { alignTriad, createBodyTriad } from './triad';
import type { Quat, ReadonlyQuat } from './quaternion';

/** Cone and clock angles (rad), written by a steering function. */
export interface ConeClockAngles {
  /** Cone angle α between the sail normal and the Sun-to-sail direction (rad), [0, π/2]. */
  coneRad: number;
  /** Clock angle δ about the Sun line from the orbit-normal side (rad), any finite value. */
  clockRad: number;
}

/**
 * A steering law: writes the cone and clock angles for a state into `out` and returns it. Must
 * not allocate if the caller's hot path is to stay allocation-free. Arguments as `attitudeAt`.
 */
export type SailSteering = (
  out: ConeClockAngles,
  tSeconds: number,
  rSatEci: ReadonlyVec3,
  vSatEci: ReadonlyVec3,
  sunPosEci: ReadonlyVec3,
) => ConeClockAngles;

/** A cone/clock sail attitude as a caller describes it: fixed angles, or a steering function. */
export type SailConeClockLawOptions = {
  /** Body axis that points away from the Sun along the ideal-sail force (the back-side normal). */
  normalAxisBody: ReadonlyVec3;
  /**
   * Body axis put along y_S (see the file header); not parallel to `normalAxisBody`. Omitted: the
   * body coordinate axis least aligned with the normal (first of x, y, z on a tie), made
   * perpendicular to it.
   */
  secondaryAxisBody?: ReadonlyVec3 | undefined;
} & (
  | {
      /** Fixed cone angle α (rad), [0, π/2]. */
      coneRad: number;
      /** Fixed clock angle δ (rad), finite. */
      clockRad: number;
      steering?: undefined;
    }
  | {
      /** Angles from the state at each evaluation (e.g. a locally optimal law). */
      steering: SailSteering;
      coneRad?: undefined;
      clockRad?: undefined;
    }
);
/** `SailConeClockLawOptions` tagged for `createAttitudeLaw`. */
export type SailConeClockLawSpec = SailConeClockLawOptions & { law: 'sail-cone-clock' };

declare const checkedSailLaw: unique symbol;

/** A checked cone/clock sail law, made by `createSailConeClockLaw`. */
export type SailConeClockLaw = {
  readonly law: 'sail-cone-clock';
  /** Fixed angles (rad); ignored when `steering` is set. */
  readonly coneRad: number;
  readonly clockRad: number;
  readonly steering: SailSteering | undefined;
  /** conj of the body triad (normal, secondary ⊥, cross), precomputed. */
  readonly bodyTriadConj: ReadonlyQuat;
  /** True when the last evaluation found the orbit normal unusable and fell back (file header). */
  readonly usedFallback: boolean;
  readonly [checkedSailLaw]: true;
};

const HALF_PI = Math.PI / 2;

function checkCone(coneRad: number, field: string): void {
  checkFinite(coneRad, field, 'rad');
  if (coneRad < 0 || coneRad > HALF_PI) {
    throw new SrpError('out_of_range', `${field} must be in [0, π/2] rad; got ${coneRad}`, {
      field,
      value: coneRad,
      limit: '[0, π/2]',
    });
  }
}

/**
 * Checks and compiles a cone/clock sail law (allocates; not for hot paths).
 * @param field path of `spec` in the caller's input, used in errors (`attitude`)
 * @throws SrpError naming `<field>.normalAxisBody`, `<field>.secondaryAxisBody`, `<field>.coneRad`,
 *   `<field>.clockRad` or `<field>.steering`
 */
export function createSailConeClockLaw(
  spec: SailConeClockLawOptions & { law?: 'sail-cone-clock' },
  field = 'attitude',
): SailConeClockLaw {
  const normal = checkAxis(createVec3(), spec.normalAxisBody, `${field}.normalAxisBody`);
  let secondary: ReadonlyVec3;
  if (spec.secondaryAxisBody === undefined) {
    const ax = Math.abs(normal[0]);
    const ay = Math.abs(normal[1]);
    const az = Math.abs(normal[2]);
    secondary = ax <= ay && ax <= az ? [1, 0, 0] : ay <= az ? [0, 1, 0] : [0, 0, 1];
  } else {
    secondary = spec.secondaryAxisBody;
  }
  const bodyTriadConj = createBodyTriad(normal, secondary, `${field}.normalAxisBody`, `${field}.secondaryAxisBody`);
  let coneRad = 0;
  let clockRad = 0;
  if (spec.steering !== undefined) {
    const steering: unknown = spec.steering;
    if (typeof steering !== 'function' || spec.coneRad !== undefined || spec.clockRad !== undefined) {
      throw new SrpError(
        'invalid_input',
        `${field}.steering must be a function, given without coneRad and clockRad (give fixed angles or a steering function, not both)`,
        { field: `${field}.steering`, value: typeof steering, limit: 'function, without coneRad/clockRad' },
      );
    }
  } else {
    checkCone(spec.coneRad, `${field}.coneRad`);
    checkFinite(spec.clockRad, `${field}.clockRad`, 'rad');
    coneRad = spec.coneRad;
    clockRad = spec.clockRad;
  }
  return {
    law: 'sail-cone-clock',
    coneRad,
    clockRad,
    steering: spec.steering,
    bodyTriadConj,
    usedFallback: false,
  } as unknown as SailConeClockLaw;
}

const uScratch = createVec3();
const e1Scratch = createVec3();
const normalScratch = createVec3();
const ySailScratch = createVec3();
const anglesScratch: ConeClockAngles = { coneRad: 0, clockRad: 0 };

/**
 * Sail attitude for the law's cone and clock angles (see the file header). Allocates nothing
 * (unless the steering function does); sets `law.usedFallback`.
 * @param out receives the attitude quaternion (EQJ axes onto body axes)
 * @param tSeconds time from the scenario epoch (s), passed to the steering function
 * @param rSatEci spacecraft position relative to the central body (m), EQJ
 * @param vSatEci spacecraft velocity relative to the central body (m/s), EQJ
 * @param sunPosEci Sun position relative to the central body (m), EQJ (zero for heliocentric flight)
 * @returns out
 * @throws SrpError `invalid_input` for an unusable state; `out_of_range`/`invalid_input` naming
 *   `steering.coneRad` or `steering.clockRad` when the steering function returns bad angles
 */
export function sailConeClockAttitude(
  out: Quat,
  law: SailConeClockLaw,
  tSeconds: number,
  rSatEci: ReadonlyVec3,
  vSatEci: ReadonlyVec3,
  sunPosEci: ReadonlyVec3,
): Quat {
  let cone = law.coneRad;
  let clock = law.clockRad;
  if (law.steering !== undefined) {
    const angles = law.steering(anglesScratch, tSeconds, rSatEci, vSatEci, sunPosEci);
    cone = angles.coneRad;
    clock = angles.clockRad;
    if (!(cone >= 0 && cone <= HALF_PI)) checkCone(cone, 'steering.coneRad');
    if (!Number.isFinite(clock)) checkFinite(clock, 'steering.clockRad', 'rad');
  }
  const u = satToSunUnit(uScratch, sunPosEci, rSatEci);
  u[0] = -u[0];
  u[1] = -u[1];
  u[2] = -u[2];
  const e1 = e1Scratch;
  (law as { usedFallback: boolean }).usedFallback = perpendicularReference(e1, 'orbit-normal', u, rSatEci, vSatEci);
  // e2 = e1 × u; m = cos δ e1 + sin δ e2 (unit, ⊥ u).
  const cd = Math.cos(clock);
  const sd = Math.sin(clock);
  const mx = cd * e1[0] + sd * (e1[1] * u[2] - e1[2] * u[1]);
  const my = cd * e1[1] + sd * (e1[2] * u[0] - e1[0] * u[2]);
  const mz = cd * e1[2] + sd * (e1[0] * u[1] - e1[1] * u[0]);
  const ca = Math.cos(cone);
  const sa = Math.sin(cone);
  const n = normalScratch;
  n[0] = ca * u[0] + sa * mx;
  n[1] = ca * u[1] + sa * my;
  n[2] = ca * u[2] + sa * mz;
  // y_S = m × u, unit because m ⊥ u.
  const ys = ySailScratch;
  ys[0] = my * u[2] - mz * u[1];
  ys[1] = mz * u[0] - mx * u[2];
  ys[2] = mx * u[1] - my * u[0];
  return alignTriad(out, n, ys, law.bodyTriadConj);
}
