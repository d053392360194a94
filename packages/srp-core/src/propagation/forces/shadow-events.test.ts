import { describe, expect, it } from 'vitest';
import { EARTH_GM } from '../../bodies/body-constants';
import { createGeocentricEphemeris } from '../../bodies/geocentric-ephemeris';
import type { Vec3 } from '../../math/vec3';
import { conicalShadowFraction, cylindricalShadowFraction } from '../../radiation/shadow';
import { parseUtcEpoch } from '../../time/epoch';
import { findEclipseEvents } from '../eclipse-events';
import { integrate } from '../integrator/integrate';
import { propagateKepler } from '../kepler';
import { createCentralBodyForce } from './central-body';
import { createDynamics } from './dynamics';
import { createShadowEvents } from './shadow-events';

const epoch = parseUtcEpoch('2026-09-10T00:00:00Z');
const eph = createGeocentricEphemeris(epoch, 0, 2 * 86_400);
const ORIGIN: Vec3 = [0, 0, 0];
const R_EARTH = 6_378_137; // WGS 84

/** A circular orbit of radius r whose plane contains the Sun direction at t = 0 (eclipsed every orbit). */
function eclipsingOrbit(r: number): Float64Array {
  const sun: Vec3 = [0, 0, 0];
  eph.sunPositionAt(sun, 0);
  const sn = Math.hypot(...sun);
  const u = sun.map((x) => x / sn);
  // Perpendicular in-plane direction, tilted out of the equator.
  const p = [-u[1]!, u[0]!, 0.3];
  const dot = p[0]! * u[0]! + p[1]! * u[1]! + p[2]! * u[2]!;
  const w = p.map((x, k) => x - dot * u[k]!);
  const wn = Math.hypot(w[0]!, w[1]!, w[2]!);
  const v = Math.sqrt(EARTH_GM / r);
  return Float64Array.of(r * u[0]!, r * u[1]!, r * u[2]!, (v * w[0]!) / wn, (v * w[1]!) / wn, (v * w[2]!) / wn);
}

describe('createShadowEvents', () => {
  it("the conical g-functions' signs agree with the shadow fraction along an orbit", () => {
    // penumbra g < 0 ⇔ ν < 1 (some of the Sun hidden); umbra g < 0 ⇔ ν = 0. Exact geometry, but
    // ν's sunlit test compares cosines where g compares angles: ignore |g| < 1e-9 rad.
    const events = createShadowEvents({ ephemeris: eph, shadowModel: 'conical', bodies: ['earth'] });
    const penumbra = events.find((e) => e.name === 'earth-penumbra-entry')!.g;
    const umbra = events.find((e) => e.name === 'earth-umbra-entry')!.g;
    const antumbra = events.find((e) => e.name === 'earth-antumbra-entry')!.g;
    const y0 = eclipsingOrbit(7_000_000);
    const y = new Float64Array(6);
    const sun: Vec3 = [0, 0, 0];
    let dark = 0;
    let partial = 0;
    for (let t = 0; t < 6000; t += 1.7) {
      propagateKepler(y, y0, t, EARTH_GM);
      eph.sunPositionAt(sun, t);
      const nu = conicalShadowFraction([y[0]!, y[1]!, y[2]!], sun, ORIGIN, R_EARTH);
      const gp = penumbra(t, y);
      const gu = umbra(t, y);
      if (Math.abs(gp) > 1e-9) expect(gp < 0).toBe(nu < 1);
      if (Math.abs(gu) > 1e-9) expect(gu < 0).toBe(nu === 0);
      expect(antumbra(t, y)).toBeGreaterThan(0); // the Earth looks larger than the Sun in LEO
      if (nu === 0) dark += 1;
      else if (nu < 1) partial += 1;
    }
    expect(dark).toBeGreaterThan(100);
    expect(partial).toBeGreaterThan(2);
  });

  it('the cylindrical g-function is negative exactly inside the shadow cylinder', () => {
    const events = createShadowEvents({ ephemeris: eph, shadowModel: 'cylindrical', bodies: ['earth'] });
    expect(events.map((e) => e.name)).toEqual(['earth-shadow-entry', 'earth-shadow-exit']);
    const g = events[0]!.g;
    const y0 = eclipsingOrbit(7_000_000);
    const y = new Float64Array(6);
    const sun: Vec3 = [0, 0, 0];
    for (let t = 0; t < 6000; t += 3.1) {
      propagateKepler(y, y0, t, EARTH_GM);
      eph.sunPositionAt(sun, t);
      const lit = cylindricalShadowFraction([y[0]!, y[1]!, y[2]!], sun, ORIGIN, R_EARTH);
      const gv = g(t, y);
      if (Math.abs(gv) > 1e-6) expect(gv < 0).toBe(lit === 0); // 1 µm of rounding ignored
    }
  });

  it('located by the integrator, the events fall within 10 µs of findEclipseEvents on the same orbit', () => {
    // Two-body orbit: DOP853 at relTol 1e-12 follows the Kepler solution to millimetres (a few
    // 1e-7 s of along-track time); findEclipseEvents is refined to 1 µs here and the integrator's
    // locator to 1e-9 s. Measured: 1.0e-8 s at most over 16 events.
    const y0 = eclipsingOrbit(7_000_000);
    const span = 4 * 5_830; // four orbits
    const events = createShadowEvents({ ephemeris: eph, shadowModel: 'conical' });
    const result = integrate(
      createDynamics([createCentralBodyForce(EARTH_GM)]),
      0,
      y0,
      span,
      { relTol: 1e-12, absTol: 1e-6, maxStepSeconds: 300 },
      { events },
    );
    const y = new Float64Array(6);
    const reference = findEclipseEvents(
      (out, t) => {
        propagateKepler(y, y0, t, EARTH_GM);
        out[0] = y[0]!;
        out[1] = y[1]!;
        out[2] = y[2]!;
        return out;
      },
      eph,
      0,
      span,
      { toleranceSeconds: 1e-6 },
    );
    const want = reference.events.map((e) => ({ name: `${e.body}-${e.kind}`, t: e.tSeconds }));
    const got = result.events.map((e) => ({ name: e.name, t: e.t }));
    expect(got.map((e) => e.name)).toEqual(want.map((e) => e.name));
    expect(got.length).toBeGreaterThanOrEqual(16);
    for (let i = 0; i < got.length; i += 1) expect(Math.abs(got[i]!.t - want[i]!.t)).toBeLessThan(1e-5);
  });

  it("gives no events for the 'none' model and refuses an unknown body, naming bodies.<i>", () => {
    expect(createShadowEvents({ ephemeris: eph, shadowModel: 'none' })).toEqual([]);
    expect(() => createShadowEvents({ ephemeris: eph, shadowModel: 'conical', bodies: ['venus' as 'moon'] })).toThrow(
      expect.objectContaining({ details: expect.objectContaining({ field: 'bodies.0' }) }),
    );
  });
});
