/**
 * Third-body gravity: the pull of a body (the Sun, the Moon, a planet) on the spacecraft minus its
 * pull on the central body, which is what accelerates the spacecraft relative to the central body:
 *
 *   a = μ_b [ (s − r)/|s − r|³ − s/|s|³ ]      (direct minus indirect term)
 *
 * with s the body's and r the spacecraft's position relative to the central body. Evaluated in
 * Battin's form, a = −(μ_b/|d|³) (r + F(q) s), d = r − s, q = r·(r − 2s)/(s·s),
 * F(q) = (1+q)^{3/2} − 1 = q (3 + 3q + q²)/(1 + (1+q)^{3/2}) (Battin, An Introduction to the
 * Mathematics and Methods of Astrodynamics, 1987/1999, §8.4, eq. 8.60 or near it, from memory;
 * the identity is re-derived here and checked against the plain difference in the tests).
 * Why: near the Earth the two terms of the Sun's pull are each 5.9e-3 m/s² and differ by
 * ~3.3e-6 m/s² at GEO (less in LEO), so the plain difference loses three to four digits to
 * cancellation; Battin's form loses none, at the same cost.
 */
import { planetGm, type HeliocentricEphemeris } from '../../bodies/heliocentric-ephemeris';
import { MOON_GM, SUN_GM } from '../../bodies/body-constants';
import type { GeocentricEphemeris } from '../../bodies/geocentric-ephemeris';
import type { PlanetName } from '../../bodies/ephemeris';
import { evaluateChebyshevTable } from '../../bodies/chebyshev-table';
import { SrpError, requirePositive } from '../../errors';
import type { ReadonlyVec3, Vec3 } from '../../math/vec3';
import { createPositionMemo, sunMoonMemo, type PositionMemo } from './ephemeris-cache';
import type { ForceModel } from './force-model';

/**
 * The third-body acceleration (m/s²) of a body of parameter `mu` at `s` on a spacecraft at `r`,
 * both relative to the central body (m), by Battin's F(q) (file comment). Allocates nothing.
 * @param r spacecraft position (m): the first three entries are read (a state vector will do)
 * @returns out
 */
export function thirdBodyAcceleration(out: Vec3, mu: number, r: ArrayLike<number>, s: ReadonlyVec3): Vec3 {
  // Positions passed as arrays, not as three numbers: V8 boxes double arguments of a call it
  // does not inline (an allocation per call).
  const rx = r[0]!;
  const ry = r[1]!;
  const rz = r[2]!;
  const sx = s[0];
  const sy = s[1];
  const sz = s[2];
  const dx = rx - sx;
  const dy = ry - sy;
  const dz = rz - sz;
  const s2 = sx * sx + sy * sy + sz * sz;
  const q = (rx * (rx - 2 * sx) + ry * (ry - 2 * sy) + rz * (rz - 2 * sz)) / s2;
  const onePlusQ = 1 + q;
  const f = (q * (3 + 3 * q + q * q)) / (1 + onePlusQ * Math.sqrt(onePlusQ));
  const d2 = dx * dx + dy * dy + dz * dz;
  const k = -mu / (d2 * Math.sqrt(d2));
  out[0] = k * (rx + f * sx);
  out[1] = k * (ry + f * sy);
  out[2] = k * (rz + f * sz);
  return out;
}

/**
 * A third body given by a memoised position function (m, relative to the central body).
 * @param name force name ('sun', 'moon', a planet name)
 * @param mu the body's gravitational parameter (m³/s²), > 0
 */
export function createThirdBodyForce(name: string, mu: number, position: PositionMemo): ForceModel {
  requirePositive(mu, 'mu', 'm^3/s^2');
  return {
    name,
    acceleration(out: Vec3, t: number, y: Float64Array): Vec3 {
      return thirdBodyAcceleration(out, mu, y, position.at(t));
    },
  };
}

/** The Sun as a third body for an Earth-centred run (SUN_GM), positions from `ephemeris`. */
export function createSunThirdBodyForce(ephemeris: GeocentricEphemeris): ForceModel {
  return createThirdBodyForce('sun', SUN_GM, sunMoonMemo(ephemeris).sun);
}

/** The Moon as a third body for an Earth-centred run (MOON_GM), positions from `ephemeris`. */
export function createMoonThirdBodyForce(ephemeris: GeocentricEphemeris): ForceModel {
  return createThirdBodyForce('moon', MOON_GM, sunMoonMemo(ephemeris).moon);
}

/**
 * A planet as a third body for a Sun-centred run: heliocentric position from `ephemeris`, the
 * planet's (system) GM from `planetGm` unless `mu` is given. The name is the planet's.
 * @throws SrpError `invalid_input` naming `planet` when the ephemeris was not fitted for it
 */
export function createPlanetThirdBodyForce(
  planet: PlanetName,
  ephemeris: HeliocentricEphemeris,
  mu: number = planetGm[planet],
): ForceModel {
  const table = ephemeris.tables[planet];
  if (table === undefined) {
    throw new SrpError(
      'invalid_input',
      `planet '${planet}' is not in the heliocentric ephemeris (fitted: ${ephemeris.planets.join(', ')}); add it to its planets`,
      { field: 'planet', value: planet, limit: ephemeris.planets.join(' | ') },
    );
  }
  return createThirdBodyForce(planet, mu, createPositionMemo((out, t) => evaluateChebyshevTable(out, table, t)));
}
