/**
 * Solar radiation pressure as a force model: "what light arrives here" (radiation/: the Sun's
 * distance and the shadow) composed with "how this vehicle responds to it" (vehicles/evaluateSrp)
 * under an attitude law (attitude/attitudeAt).
 *
 * At each (t, y): the Sun's position relative to the central body (the geocentric ephemeris for
 * 'earth', the origin for 'sun'); the attitude from the law at (t, r, v, sunPos); the unit
 * spacecraft-to-Sun direction rotated into the body frame; the pressure P = s0 (1 au / d)² / c at
 * the actual Sun distance d; the illuminated fraction ν of the solar disc (Earth and Moon for
 * 'earth', none for 'sun'); the body-frame force and torque from `evaluateSrp`; the force rotated
 * to EQJ and divided by the mass. The shadow is not smoothed: its edges are integrator events
 * (`createShadowEvents`).
 */
import { attitudeAt, type AttitudeLaw } from '../../attitude/attitude-law';
import { rotateBodyToInertial, rotateInertialToBody, type Quat } from '../../attitude/quaternion';
import { sunPointingAttitudeFromSunDir } from '../../attitude/sun-pointing-law';
import { MOON_RADIUS } from '../../bodies/body-constants';
import type { GeocentricEphemeris } from '../../bodies/geocentric-ephemeris';
import { ASTRONOMICAL_UNIT, SOLAR_CONSTANT, SPEED_OF_LIGHT } from '../../constants';
import { SrpError, requirePositive } from '../../errors';
import type { ReadonlyVec3, Vec3 } from '../../math/vec3';
import {
  conicalShadowFraction,
  cylindricalShadowFraction,
  earthMoonShadowFraction,
  shadowModels,
  type ShadowModel,
} from '../../radiation/shadow';
import type { CompiledVehicle } from '../../vehicles/compiled-vehicle';
import { createSrpResult, evaluateSrp } from '../../vehicles/evaluate-srp';
import { occultingBodies, type OccultingBody } from '../eclipse-events';
import { sunMoonMemo, type PositionMemo } from './ephemeris-cache';
import type { ForceModel } from './force-model';

/** Everything a sample records about SRP at one (t, y). */
export interface SrpDetail {
  /** SRP acceleration (m/s²), inertial EQJ. */
  accelInertial: Vec3;
  /** SRP acceleration (m/s²), body frame. */
  accelBody: Vec3;
  /** SRP torque about the centre of mass (N·m), body frame. */
  torqueBody: Vec3;
  /** Attitude quaternion [w, x, y, z], EQJ axes onto body axes (attitude/quaternion.ts). */
  attitude: Quat;
  /** Fraction of the solar disc visible, [0, 1]. */
  illuminatedFraction: number;
  /** Distance from the spacecraft to the Sun's centre (m). */
  sunDistanceM: number;
}

/** Allocates a zeroed `SrpDetail` to reuse as the output of `SrpForce.detail`. */
export function createSrpDetail(): SrpDetail {
  return {
    accelInertial: [0, 0, 0],
    accelBody: [0, 0, 0],
    torqueBody: [0, 0, 0],
    attitude: [1, 0, 0, 0],
    illuminatedFraction: 1,
    sunDistanceM: 0,
  };
}

/** The SRP force model, with the per-sample detail. */
export interface SrpForce extends ForceModel {
  /** Everything a sample records about SRP at (t, y); allocates nothing. */
  detail(out: SrpDetail, t: number, y: Float64Array): SrpDetail;
}

/** Options of `createSrpForce`. */
export interface SrpForceOptions {
  /** The vehicle (`compileVehicle`); its massKg divides the force. */
  vehicle: CompiledVehicle;
  /** The attitude law (`createAttitudeLaw`). */
  attitude: AttitudeLaw;
  /** Shadow model for an Earth-centred run; ignored for 'sun' (no occulting body). */
  shadowModel: ShadowModel;
  /** The central body the state is relative to. */
  centralBody: 'earth' | 'sun';
  /** Sun and Moon positions for 'earth' (required); null for 'sun'. */
  ephemeris: GeocentricEphemeris | null;
  /** Total solar irradiance at 1 au (W/m²); default SOLAR_CONSTANT (1361). */
  s0?: number;
  /** Occulting bodies for 'earth'; default both ['earth', 'moon']. */
  shadowBodies?: OccultingBody[];
}

const ORIGIN: ReadonlyVec3 = [0, 0, 0];
const centralBodies = ['earth', 'sun'] as const;

/**
 * Creates the SRP force (see the file comment). Allocates its scratch once.
 * @throws SrpError naming `centralBody`, `ephemeris`, `shadowModel`, `shadowBodies.<i>` or `s0`
 */
export function createSrpForce(opts: SrpForceOptions): SrpForce {
  const { vehicle, attitude, centralBody } = opts;
  if (!centralBodies.includes(centralBody)) {
    throw new SrpError('invalid_input', `centralBody must be 'earth' or 'sun'; got ${String(centralBody)}`, {
      field: 'centralBody',
      value: centralBody,
      limit: 'earth | sun',
    });
  }
  if (!shadowModels.includes(opts.shadowModel)) {
    throw new SrpError('invalid_input', `shadowModel must be one of ${shadowModels.join(', ')}; got ${String(opts.shadowModel)}`, {
      field: 'shadowModel',
      value: opts.shadowModel,
      limit: shadowModels.join(' | '),
    });
  }
  const s0 = requirePositive(opts.s0 ?? SOLAR_CONSTANT, 's0', 'W/m^2');
  const bodies = opts.shadowBodies ?? [...occultingBodies];
  bodies.forEach((body, i) => {
    if (!occultingBodies.includes(body)) {
      throw new SrpError('invalid_input', `shadowBodies.${i} must be one of ${occultingBodies.join(', ')}; got ${String(body)}`, {
        field: `shadowBodies.${i}`,
        value: body,
        limit: occultingBodies.join(' | '),
      });
    }
  });
  if (centralBody === 'earth' && (opts.ephemeris === null || opts.ephemeris === undefined)) {
    throw new SrpError('invalid_input', "ephemeris is required for centralBody 'earth' (createGeocentricEphemeris over the span)", {
      field: 'ephemeris',
      value: null,
      limit: 'GeocentricEphemeris',
    });
  }
  const memo = centralBody === 'earth' && opts.ephemeris ? sunMoonMemo(opts.ephemeris) : null;
  const sun: PositionMemo | null = memo === null ? null : memo.sun;
  const moon: PositionMemo | null = memo === null ? null : memo.moon;
  const model: ShadowModel = centralBody === 'sun' ? 'none' : opts.shadowModel;
  const useEarth = bodies.includes('earth');
  const useMoon = bodies.includes('moon');
  const mass = vehicle.massKg;
  // P at 1 au (Pa) times (1 au)², so that P(d) = k / d².
  const pressureTimesD2 = (s0 / SPEED_OF_LIGHT) * ASTRONOMICAL_UNIT * ASTRONOMICAL_UNIT;

  const result = createSrpResult(vehicle);
  const r: Vec3 = [0, 0, 0];
  const v: Vec3 = [0, 0, 0];
  const sunDirInertial: Vec3 = [0, 0, 0];
  const sunDirBody: Vec3 = [0, 0, 0];
  const q: Quat = [1, 0, 0, 0];
  // ν and the Sun distance (m) of the last evaluation, in a typed array rather than captured
  // `let`s, which V8 boxes on every store (an allocation per evaluation).
  const last = new Float64Array(2);

  function illuminated(sunPos: ReadonlyVec3, t: number): number {
    if (model === 'none') return 1;
    if (useEarth) return earthMoonShadowFraction(model, r, sunPos, useMoon ? moon!.at(t) : null);
    if (!useMoon) return 1;
    const moonPos = moon!.at(t);
    return model === 'conical'
      ? conicalShadowFraction(r, sunPos, moonPos, MOON_RADIUS)
      : cylindricalShadowFraction(r, sunPos, moonPos, MOON_RADIUS);
  }

  /** Fills result.forceBody/torqueBody, q, nu, distance for (t, y). */
  function evaluate(t: number, y: Float64Array): void {
    r[0] = y[0]!;
    r[1] = y[1]!;
    r[2] = y[2]!;
    v[0] = y[3]!;
    v[1] = y[4]!;
    v[2] = y[5]!;
    const sunPos = sun === null ? ORIGIN : sun.at(t);
    const dx = sunPos[0] - r[0];
    const dy = sunPos[1] - r[1];
    const dz = sunPos[2] - r[2];
    const d2 = dx * dx + dy * dy + dz * dz;
    const distance = Math.sqrt(d2);
    last[1] = distance;
    if (!(distance > 0 && distance < Infinity)) {
      throw new SrpError('invalid_input', `the spacecraft-to-Sun distance at t = ${t} s is ${distance} m; need a finite, non-zero distance`, {
        field: 'y',
        value: [r[0], r[1], r[2]],
        limit: 'finite, not at the Sun',
      });
    }
    sunDirInertial[0] = dx / distance;
    sunDirInertial[1] = dy / distance;
    sunDirInertial[2] = dz / distance;
    // The Sun-pointing law reuses the direction just computed (same bits as its own).
    if (attitude.law === 'sun-pointing') sunPointingAttitudeFromSunDir(q, attitude, r, v, sunDirInertial);
    else attitudeAt(q, attitude, t, r, v, sunPos);
    rotateInertialToBody(sunDirBody, q, sunDirInertial);
    const nu = illuminated(sunPos, t);
    last[0] = nu;
    // evaluateSrp is linear in P·ν (the Sun direction alone sets the tracking angles and the
    // incidence), so it runs at 1 Pa, full Sun, and the result is scaled: passing the computed P
    // and ν would box two doubles into a call V8 does not inline (two allocations per evaluation).
    evaluateSrp(result, vehicle, sunDirBody, 1, 1);
    const k = (pressureTimesD2 / d2) * nu;
    const fb = result.forceBody;
    const tb = result.torqueBody;
    // `+ 0` turns the −0 of an eclipsed vehicle into 0, as evaluateSrp does.
    fb[0] = fb[0] * k + 0;
    fb[1] = fb[1] * k + 0;
    fb[2] = fb[2] * k + 0;
    tb[0] = tb[0] * k + 0;
    tb[1] = tb[1] * k + 0;
    tb[2] = tb[2] * k + 0;
  }

  return {
    name: 'srp',
    acceleration(out: Vec3, t: number, y: Float64Array): Vec3 {
      evaluate(t, y);
      rotateBodyToInertial(out, q, result.forceBody);
      out[0] /= mass;
      out[1] /= mass;
      out[2] /= mass;
      return out;
    },
    detail(out: SrpDetail, t: number, y: Float64Array): SrpDetail {
      evaluate(t, y);
      const fb = result.forceBody;
      const tb = result.torqueBody;
      out.accelBody[0] = fb[0] / mass;
      out.accelBody[1] = fb[1] / mass;
      out.accelBody[2] = fb[2] / mass;
      // Rotate then divide, exactly as `acceleration`, so both give the same bits.
      const a = rotateBodyToInertial(out.accelInertial, q, fb);
      a[0] /= mass;
      a[1] /= mass;
      a[2] /= mass;
      out.torqueBody[0] = tb[0];
      out.torqueBody[1] = tb[1];
      out.torqueBody[2] = tb[2];
      out.attitude[0] = q[0];
      out.attitude[1] = q[1];
      out.attitude[2] = q[2];
      out.attitude[3] = q[3];
      out.illuminatedFraction = last[0]!;
      out.sunDistanceM = last[1]!;
      return out;
    },
  };
}

