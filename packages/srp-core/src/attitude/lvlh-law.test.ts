import { describe, expect, it } from 'vitest';
import type { ReadonlyVec3 } from '../math/vec3';
import { attitudeAt, createAttitudeLaw } from './attitude-law';
import { createLvlhLaw, lvlhAttitude, lvlhQuat } from './lvlh-law';
import { createQuat } from './quaternion';
import { bodyToInertial, cross, unit, dot, expectVec } from './attitude-test-helpers';

// Tolerance 1e-12 on unit vectors: a few dozen double-precision operations on unit-size values.
const TOL = 1e-12;
const MU_EARTH = 3.986004418e14; // m³/s², source: IERS Conventions (2010), Table 1.1 (GM⊕)

/** Position (m) and velocity (m/s) on a circular orbit of radius a, inclination i, at argument u. */
function circular(a: number, inc: number, raan: number, u: number): { r: ReadonlyVec3; v: ReadonlyVec3 } {
  const speed = Math.sqrt(MU_EARTH / a);
  const cO = Math.cos(raan);
  const sO = Math.sin(raan);
  const ci = Math.cos(inc);
  const si = Math.sin(inc);
  // Perifocal unit vectors P (node) and Q (90° ahead in the orbit plane), rotated into EQJ.
  const P: ReadonlyVec3 = [cO, sO, 0];
  const Q: ReadonlyVec3 = [-sO * ci, cO * ci, si];
  const cu = Math.cos(u);
  const su = Math.sin(u);
  return {
    r: [a * (cu * P[0] + su * Q[0]), a * (cu * P[1] + su * Q[1]), a * (cu * P[2] + su * Q[2])],
    v: [speed * (-su * P[0] + cu * Q[0]), speed * (-su * P[1] + cu * Q[1]), speed * (-su * P[2] + cu * Q[2])],
  };
}

describe('LVLH law', () => {
  it('on circular orbits body z points to -r, y along -h and x along the velocity, to 1e-12', () => {
    const law = createLvlhLaw();
    for (const [inc, raan, u] of [
      [0.1, 0.3, 0.0],
      [0.9, 2.0, 1.7],
      [1.7, -1.0, 4.0],
      [Math.PI / 2, 0.5, 3.0],
    ] as const) {
      const { r, v } = circular(7.0e6, inc, raan, u);
      const q = lvlhAttitude(createQuat(), law, r, v);
      expectVec(bodyToInertial(q, [0, 0, 1]), unit([-r[0], -r[1], -r[2]]), TOL);
      const h = unit(cross(r, v));
      expectVec(bodyToInertial(q, [0, 1, 0]), [-h[0], -h[1], -h[2]], TOL);
      expectVec(bodyToInertial(q, [1, 0, 0]), unit(v), TOL);
      expect(Math.abs(Math.hypot(...q) - 1)).toBeLessThan(TOL);
    }
  });

  it('an equatorial orbit at r = +x gives the hand-derived quaternion (0.5, -0.5, -0.5, 0.5)', () => {
    // source: by hand. z = -x̂, y = -ẑ (h = +z), x = y × z = +ŷ: R = [[0,0,-1],[1,0,0],[0,-1,0]],
    // w = √(1 + trace)/2 = 1/2, (x, y, z) = (R21 - R12, R02 - R20, R10 - R01) / (4w) = (-1, -1, 1)/2.
    const q = lvlhQuat(createQuat(), [7e6, 0, 0], [0, 7.5e3, 0]);
    const sign = Math.sign(q[0]);
    [0.5, -0.5, -0.5, 0.5].forEach((c, i) => expect(Math.abs(sign * q[i]! - c)).toBeLessThan(TOL));
  });

  it('on an eccentric orbit x is along-track (⊥ r, in the orbit plane, prograde), not along v', () => {
    const r: ReadonlyVec3 = [7.0e6, 1.0e6, -0.5e6];
    const v: ReadonlyVec3 = [1.5e3, 8.5e3, 1.0e3]; // flight-path angle ≠ 0
    const q = lvlhQuat(createQuat(), r, v);
    const x = bodyToInertial(q, [1, 0, 0]);
    expect(Math.abs(dot(x, unit(r)))).toBeLessThan(TOL);
    expect(Math.abs(dot(x, unit(cross(r, v))))).toBeLessThan(TOL);
    expect(dot(x, v)).toBeGreaterThan(0);
    expect(Math.abs(dot(x, unit(v)) - 1)).toBeGreaterThan(1e-3);
    // Right-handed: x × y = z.
    expectVec(cross(x, bodyToInertial(q, [0, 1, 0])), bodyToInertial(q, [0, 0, 1]), TOL);
  });

  it('a 90° offset about LVLH z puts body x along LVLH y (-h) and body y along LVLH -x', () => {
    const s = Math.SQRT1_2;
    const law = createAttitudeLaw({ law: 'lvlh', offsetQuaternion: [s, 0, 0, s] });
    const { r, v } = circular(7.2e6, 0.6, 1.1, 2.2);
    const q = attitudeAt(createQuat(), law, 0, r, v, [1.5e11, 0, 0]);
    const h = unit(cross(r, v));
    expectVec(bodyToInertial(q, [1, 0, 0]), [-h[0], -h[1], -h[2]], TOL);
    const vHat = unit(v);
    expectVec(bodyToInertial(q, [0, 1, 0]), [-vHat[0], -vHat[1], -vHat[2]], TOL);
    expectVec(bodyToInertial(q, [0, 0, 1]), unit([-r[0], -r[1], -r[2]]), TOL);
  });

  it('a radial trajectory, a zero position and a non-unit offset are refused naming the field', () => {
    const fieldError = (field: string): unknown =>
      expect.objectContaining({ code: 'invalid_input', details: expect.objectContaining({ field }) });
    expect(() => lvlhQuat(createQuat(), [7e6, 0, 0], [3e3, 0, 0])).toThrow(fieldError('vSatEci'));
    expect(() => lvlhQuat(createQuat(), [0, 0, 0], [0, 7e3, 0])).toThrow(fieldError('rSatEci'));
    expect(() => createLvlhLaw({ offsetQuaternion: [1, 0, 0, 0.1] })).toThrow(fieldError('attitude.offsetQuaternion'));
  });
});
