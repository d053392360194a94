import { describe, expect, it } from 'vitest';
import type { ReadonlyVec3 } from '../math/vec3';
import { attitudeAt, createAttitudeLaw } from './attitude-law';
import { createQuat } from './quaternion';
import { createSailConeClockLaw, sailConeClockAttitude } from './sail-cone-clock-law';
import type { ConeClockAngles } from './sail-cone-clock-law';
import { bodyToInertial, cross, unit, dot, sub, expectVec } from './attitude-test-helpers';

/** Difference of two angles wrapped into (-π, π]. */
function angleDiff(a: number, b: number): number {
  const d = (a - b) % (2 * Math.PI);
  return d > Math.PI ? d - 2 * Math.PI : d <= -Math.PI ? d + 2 * Math.PI : d;
}

// Angles measured with atan2 of (sin, cos) pairs, well conditioned at every angle; the law does a
// few dozen double-precision operations on unit vectors, so 1e-12 rad leaves ample margin.
const TOL = 1e-12;
const DEG = Math.PI / 180;
const ORIGIN: ReadonlyVec3 = [0, 0, 0];

// A heliocentric sail near 1 au on an inclined, slightly eccentric orbit (invented state).
const R_HELIO: ReadonlyVec3 = [1.3e11, 0.6e11, 0.05e11];
const V_HELIO: ReadonlyVec3 = [-1.2e4, 2.6e4, 1.5e3];

describe('sail cone/clock law', () => {
  it('cone and clock measured independently (atan2 in the r̂, θ̂, ĥ frame) equal α and δ on a heliocentric orbit', () => {
    const rHat = unit(R_HELIO);
    const hHat = unit(cross(R_HELIO, V_HELIO));
    const thetaHat = cross(hHat, rHat);
    for (const coneDeg of [0, 1e-6, 10, 35.26, 60, 89.9, 90]) {
      for (const clockDeg of [-170, -90, 0, 30, 90, 180, 270, 359]) {
        const law = createSailConeClockLaw({ normalAxisBody: [0, 0, 1], coneRad: coneDeg * DEG, clockRad: clockDeg * DEG });
        const q = sailConeClockAttitude(createQuat(), law, 0, R_HELIO, V_HELIO, ORIGIN);
        const n = bodyToInertial(q, [0, 0, 1]);
        const cone = Math.atan2(Math.hypot(...cross(n, rHat)), dot(n, rHat));
        expect(Math.abs(cone - coneDeg * DEG)).toBeLessThan(TOL);
        if (coneDeg >= 10) {
          // Clock is undefined at α = 0 and ill-conditioned (error ~1e-16/sin α) near it.
          const clock = Math.atan2(dot(n, thetaHat), dot(n, hHat));
          expect(Math.abs(angleDiff(clock, clockDeg * DEG))).toBeLessThan(TOL);
        }
        expect(Math.abs(Math.hypot(...q) - 1)).toBeLessThan(TOL);
      }
    }
  });

  it('the normal equals cos α r̂ + sin α sin δ θ̂ + sin α cos δ ĥ (source: Wie, AIAA 2005-3928, p. 11, as quoted by Princeton Satellite Systems)', () => {
    const alpha = 35.26 * DEG;
    const delta = 123 * DEG;
    const rHat = unit(R_HELIO);
    const hHat = unit(cross(R_HELIO, V_HELIO));
    const thetaHat = cross(hHat, rHat);
    const expected = [0, 1, 2].map(
      (i) => Math.cos(alpha) * rHat[i]! + Math.sin(alpha) * (Math.sin(delta) * thetaHat[i]! + Math.cos(delta) * hHat[i]!),
    ) as [number, number, number];
    const law = createSailConeClockLaw({ normalAxisBody: [1, 0, 0], coneRad: alpha, clockRad: delta });
    const q = sailConeClockAttitude(createQuat(), law, 0, R_HELIO, V_HELIO, ORIGIN);
    expectVec(bodyToInertial(q, [1, 0, 0]), expected, TOL);
  });

  it('a 90° clock tilts the normal (and the ideal-sail force) prograde, 270° retrograde', () => {
    const prograde = createSailConeClockLaw({ normalAxisBody: [0, 0, 1], coneRad: 35 * DEG, clockRad: 90 * DEG });
    const retro = createSailConeClockLaw({ normalAxisBody: [0, 0, 1], coneRad: 35 * DEG, clockRad: 270 * DEG });
    const nPro = bodyToInertial(sailConeClockAttitude(createQuat(), prograde, 0, R_HELIO, V_HELIO, ORIGIN), [0, 0, 1]);
    const nRetro = bodyToInertial(sailConeClockAttitude(createQuat(), retro, 0, R_HELIO, V_HELIO, ORIGIN), [0, 0, 1]);
    expect(dot(nPro, V_HELIO)).toBeGreaterThan(0);
    expect(dot(nRetro, V_HELIO)).toBeLessThan(0);
    expect(dot(nPro, R_HELIO)).toBeGreaterThan(0); // away from the Sun
  });

  it('at zero cone and clock the body (normal, secondary, third) axes are (r̂, θ̂, ĥ)', () => {
    const law = createSailConeClockLaw({ normalAxisBody: [0, 0, 1], secondaryAxisBody: [1, 0, 0], coneRad: 0, clockRad: 0 });
    const q = sailConeClockAttitude(createQuat(), law, 0, R_HELIO, V_HELIO, ORIGIN);
    const rHat = unit(R_HELIO);
    const hHat = unit(cross(R_HELIO, V_HELIO));
    expectVec(bodyToInertial(q, [0, 0, 1]), rHat, TOL);
    expectVec(bodyToInertial(q, [1, 0, 0]), cross(hHat, rHat), TOL);
    expectVec(bodyToInertial(q, [0, 1, 0]), hHat, TOL); // z × x = y
  });

  it('the secondary body axis stays in the sail plane and perpendicular to the Sun line', () => {
    const law = createSailConeClockLaw({ normalAxisBody: [0, 1, 0], secondaryAxisBody: [0, 0, 1], coneRad: 50 * DEG, clockRad: 200 * DEG });
    const q = sailConeClockAttitude(createQuat(), law, 0, R_HELIO, V_HELIO, ORIGIN);
    const secondary = bodyToInertial(q, [0, 0, 1]);
    expect(Math.abs(dot(secondary, unit(R_HELIO)))).toBeLessThan(TOL);
    expect(Math.abs(dot(secondary, bodyToInertial(q, [0, 1, 0])))).toBeLessThan(TOL);
  });

  it('around the Earth the cone is measured from the Sun-to-sail line and the clock from the projected orbit normal', () => {
    const r: ReadonlyVec3 = [6.9e6, 1.2e6, 0.8e6];
    const v: ReadonlyVec3 = [-1.0e3, 5.0e3, 5.5e3];
    const sun: ReadonlyVec3 = [1.2e11, -0.8e11, -0.3e11];
    const u = unit(sub(r, sun));
    const h = cross(r, v);
    const hAlong = dot(h, u);
    const e1 = unit([h[0] - hAlong * u[0], h[1] - hAlong * u[1], h[2] - hAlong * u[2]]);
    const e2 = cross(e1, u);
    const law = createAttitudeLaw({ law: 'sail-cone-clock', normalAxisBody: [0, 0, -1], coneRad: 42 * DEG, clockRad: -60 * DEG });
    const q = attitudeAt(createQuat(), law, 0, r, v, sun);
    const n = bodyToInertial(q, [0, 0, -1]);
    expect(Math.abs(Math.atan2(Math.hypot(...cross(n, u)), dot(n, u)) - 42 * DEG)).toBeLessThan(TOL);
    expect(Math.abs(angleDiff(Math.atan2(dot(n, e2), dot(n, e1)), -60 * DEG))).toBeLessThan(TOL);
  });

  it('an orbit normal and celestial north both along the Sun line fall back to the vernal equinox as clock reference and say so', () => {
    // Equatorial orbit (h = +z) with the Sun on the -z axis, far below: Sun-to-sail ≈ +z ∥ h.
    const r: ReadonlyVec3 = [7e6, 0, 0];
    const law = createSailConeClockLaw({ normalAxisBody: [0, 0, 1], coneRad: 30 * DEG, clockRad: 0 });
    const q = sailConeClockAttitude(createQuat(), law, 0, r, [0, 7.5e3, 0], [7e6, 0, -1.5e11]);
    expect(law.usedFallback).toBe(true);
    // North is parallel too, so the vernal equinox (+x) is the clock-0 direction.
    expectVec(bodyToInertial(q, [0, 0, 1]), [Math.sin(30 * DEG), 0, Math.cos(30 * DEG)], TOL);
  });

  it('a steering function sets the angles from the state at each call', () => {
    const steering = (out: ConeClockAngles, t: number): ConeClockAngles => {
      out.coneRad = (t / 1000) * DEG;
      out.clockRad = 90 * DEG;
      return out;
    };
    const law = createSailConeClockLaw({ normalAxisBody: [0, 0, 1], steering });
    const rHat = unit(R_HELIO);
    for (const t of [0, 20_000, 45_000]) {
      const n = bodyToInertial(sailConeClockAttitude(createQuat(), law, t, R_HELIO, V_HELIO, ORIGIN), [0, 0, 1]);
      expect(Math.abs(Math.atan2(Math.hypot(...cross(n, rHat)), dot(n, rHat)) - (t / 1000) * DEG)).toBeLessThan(TOL);
    }
    expect(() => sailConeClockAttitude(createQuat(), law, 100_000, R_HELIO, V_HELIO, ORIGIN)).toThrow(
      expect.objectContaining({ code: 'out_of_range', details: expect.objectContaining({ field: 'steering.coneRad' }) }),
    );
  });

  it('a cone above 90°, a NaN clock and angles given with a steering function are refused naming the field', () => {
    const fieldError = (code: string, field: string): unknown =>
      expect.objectContaining({ code, details: expect.objectContaining({ field }) });
    expect(() => createSailConeClockLaw({ normalAxisBody: [0, 0, 1], coneRad: 100 * DEG, clockRad: 0 })).toThrow(
      fieldError('out_of_range', 'attitude.coneRad'),
    );
    expect(() => createSailConeClockLaw({ normalAxisBody: [0, 0, 1], coneRad: 0.1, clockRad: Number.NaN })).toThrow(
      fieldError('invalid_input', 'attitude.clockRad'),
    );
    const both = { normalAxisBody: [0, 0, 1], coneRad: 0.1, clockRad: 0, steering: (o: ConeClockAngles) => o } as never;
    expect(() => createSailConeClockLaw(both)).toThrow(fieldError('invalid_input', 'attitude.steering'));
  });
});
