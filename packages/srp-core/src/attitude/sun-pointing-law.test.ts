import { describe, expect, it } from 'vitest';
import type { ReadonlyVec3 } from '../math/vec3';
import { attitudeAt, createAttitudeLaw } from './attitude-law';
import { createQuat } from './quaternion';
import type { ReadonlyQuat } from './quaternion';
import { secondaryReferences } from './reference-direction';
import type { SecondaryReference } from './reference-direction';
import { createSunPointingLaw, sunPointingAttitude } from './sun-pointing-law';
import { bodyToInertial, cross, unit, dot } from './attitude-test-helpers';

/** Reproducible pseudo-random numbers in [0, 1) (mulberry32; common practice for seeded tests). */
function rng(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function randomUnit(rand: () => number): [number, number, number] {
  for (;;) {
    const v: [number, number, number] = [2 * rand() - 1, 2 * rand() - 1, 2 * rand() - 1];
    const n = Math.hypot(...v);
    if (n > 0.1 && n <= 1) return [v[0] / n, v[1] / n, v[2] / n];
  }
}

interface State {
  r: [number, number, number];
  v: [number, number, number];
  sun: [number, number, number];
}

/** A low Earth orbit state (m, m/s) and a Sun 1 au away, in random directions. */
function randomState(rand: () => number): State {
  const r = randomUnit(rand).map((c) => c * 7.0e6) as State['r'];
  const v = randomUnit(rand).map((c) => c * 7.5e3) as State['v'];
  const sun = randomUnit(rand).map((c) => c * 1.495978707e11) as State['sun'];
  return { r, v, sun };
}

function referenceOf(ref: SecondaryReference, s: State): [number, number, number] {
  switch (ref) {
    case 'orbit-normal':
      return cross(s.r, s.v);
    case 'celestial-north':
      return [0, 0, 1];
    case 'nadir':
      return [-s.r[0], -s.r[1], -s.r[2]];
    case 'velocity':
      return s.v;
  }
}

// Tolerance 1e-12 on unit vectors: the law does a few dozen double-precision operations on
// unit-size values (each ~1e-16); 1e-12 leaves margin yet catches any wrong axis or sign.
const TOL = 1e-12;

describe('sun-pointing law', () => {
  it('the Sun axis points at the Sun to 1e-12 and the quaternion has unit norm, for every reference over random states', () => {
    const rand = rng(1);
    for (const secondaryReference of secondaryReferences) {
      for (let k = 0; k < 50; k += 1) {
        const sunAxisBody = randomUnit(rand);
        const secondaryAxisBody = randomUnit(rand);
        const law = createSunPointingLaw({ sunAxisBody, secondaryAxisBody, secondaryReference });
        const s = randomState(rand);
        const q = sunPointingAttitude(createQuat(), law, s.r, s.v, s.sun);
        const toSun = unit([s.sun[0] - s.r[0], s.sun[1] - s.r[1], s.sun[2] - s.r[2]]);
        const axisInertial = bodyToInertial(q, sunAxisBody);
        for (let i = 0; i < 3; i += 1) expect(Math.abs(axisInertial[i]! - toSun[i]!)).toBeLessThan(TOL);
        expect(Math.abs(Math.hypot(...q) - 1)).toBeLessThan(TOL);
        expect(law.usedFallback).toBe(false);
      }
    }
  });

  it('the secondary axis lies in the plane of the Sun line and the reference, on the reference side', () => {
    const rand = rng(2);
    for (const secondaryReference of secondaryReferences) {
      for (let k = 0; k < 50; k += 1) {
        const sunAxisBody = randomUnit(rand);
        const secondaryAxisBody = randomUnit(rand);
        const law = createSunPointingLaw({ sunAxisBody, secondaryAxisBody, secondaryReference });
        const s = randomState(rand);
        const q = sunPointingAttitude(createQuat(), law, s.r, s.v, s.sun);
        const toSun = unit([s.sun[0] - s.r[0], s.sun[1] - s.r[1], s.sun[2] - s.r[2]]);
        const ref = unit(referenceOf(secondaryReference, s));
        const secondaryInertial = bodyToInertial(q, secondaryAxisBody);
        const planeNormal = unit(cross(toSun, ref));
        expect(Math.abs(dot(secondaryInertial, planeNormal))).toBeLessThan(TOL);
        // On the reference side: its component across the Sun line has a positive projection on ref.
        const along = dot(secondaryInertial, toSun);
        const across: ReadonlyVec3 = [
          secondaryInertial[0] - along * toSun[0],
          secondaryInertial[1] - along * toSun[1],
          secondaryInertial[2] - along * toSun[2],
        ];
        expect(dot(across, ref)).toBeGreaterThan(0);
      }
    }
  });

  it('no rotation about the Sun line brings the secondary axis closer to the reference (brute-force scan)', () => {
    // Independent method: turn the law's attitude about the Sun line in 0.1° steps and check that
    // none gives a larger cosine between secondary axis and reference. Margin 1e-12 for rounding.
    const rand = rng(3);
    for (let k = 0; k < 10; k += 1) {
      const sunAxisBody = randomUnit(rand);
      const secondaryAxisBody = randomUnit(rand);
      const law = createSunPointingLaw({ sunAxisBody, secondaryAxisBody, secondaryReference: 'orbit-normal' });
      const s = randomState(rand);
      const q = sunPointingAttitude(createQuat(), law, s.r, s.v, s.sun);
      const toSun = unit([s.sun[0] - s.r[0], s.sun[1] - s.r[1], s.sun[2] - s.r[2]]);
      const ref = unit(cross(s.r, s.v));
      const best = dot(bodyToInertial(q, unit(secondaryAxisBody)), ref);
      let bestOfScan = -Infinity;
      for (let step = 1; step < 3600; step += 1) {
        const half = (step * Math.PI) / 3600; // half of step × 0.1°
        // Turn about the inertial Sun line: q' = (cos, sin·toSun) ⊗ q.
        const c = Math.cos(half);
        const sn = Math.sin(half);
        const [w, x, y, z] = q;
        const ax = sn * toSun[0];
        const ay = sn * toSun[1];
        const az = sn * toSun[2];
        const turned: ReadonlyQuat = [
          c * w - ax * x - ay * y - az * z,
          c * x + ax * w + ay * z - az * y,
          c * y - ax * z + ay * w + az * x,
          c * z + ax * y - ay * x + az * w,
        ];
        bestOfScan = Math.max(bestOfScan, dot(bodyToInertial(turned, unit(secondaryAxisBody)), ref));
      }
      expect(bestOfScan).toBeLessThanOrEqual(best + 1e-12);
      expect(bestOfScan).toBeGreaterThan(best - 1e-5); // the scan's finest step lands near the optimum
    }
  });

  it('Sun along EQJ +x, body +z to the Sun and body +x to celestial north gives the 180° turn about (x + z)/√2', () => {
    // source: by hand. Body x → inertial z, body z → inertial x, body y = z × x → inertial -y;
    // R = [[0,0,1],[0,-1,0],[1,0,0]] = 2uuᵀ - I with u = (1,0,1)/√2, i.e. q = ±(0, 1/√2, 0, 1/√2).
    const law = createSunPointingLaw({ sunAxisBody: [0, 0, 1], secondaryAxisBody: [1, 0, 0], secondaryReference: 'celestial-north' });
    const q = sunPointingAttitude(createQuat(), law, [7e6, 0, 0], [0, 7.5e3, 0], [1.5e11, 0, 0]);
    const sign = Math.sign(q[1]);
    const expected = [0, Math.SQRT1_2, 0, Math.SQRT1_2];
    q.forEach((c, i) => expect(Math.abs(sign * c - expected[i]!)).toBeLessThan(TOL));
  });

  it('a heliocentric spacecraft (Sun at the origin) points its Sun axis along -r', () => {
    const law = createSunPointingLaw({ sunAxisBody: [0, 0, -1], secondaryAxisBody: [0, 1, 0], secondaryReference: 'orbit-normal' });
    const r: ReadonlyVec3 = [1.2e11, -0.4e11, 0.1e11];
    const q = sunPointingAttitude(createQuat(), law, r, [1e4, 2.9e4, 0], [0, 0, 0]);
    const expected = unit([-r[0], -r[1], -r[2]]);
    bodyToInertial(q, [0, 0, -1]).forEach((c, i) => expect(Math.abs(c - expected[i]!)).toBeLessThan(TOL));
  });

  it('an orbit normal and celestial north both along the Sun line fall back to the vernal equinox and say so', () => {
    // Orbit in the EQJ x-y plane (h along +z) with the Sun on the +z axis: the reference is degenerate.
    const law = createSunPointingLaw({ sunAxisBody: [1, 0, 0], secondaryAxisBody: [0, 0, 1], secondaryReference: 'orbit-normal' });
    const r: ReadonlyVec3 = [7e6, 0, 0];
    const sun: ReadonlyVec3 = [7e6, 0, 1.5e11]; // directly "above" the spacecraft: Sun line = +z
    const q = sunPointingAttitude(createQuat(), law, r, [0, 7.5e3, 0], sun);
    expect(law.usedFallback).toBe(true);
    // North is parallel too (Sun line = +z), so the second fallback, the vernal equinox +x, applies.
    bodyToInertial(q, [0, 0, 1]).forEach((c, i) => expect(Math.abs(c - [1, 0, 0][i]!)).toBeLessThan(TOL));
    bodyToInertial(q, [1, 0, 0]).forEach((c, i) => expect(Math.abs(c - [0, 0, 1][i]!)).toBeLessThan(TOL));
  });

  it('an orbit normal parallel to a Sun line off the pole falls back to celestial north', () => {
    // Orbit in the EQJ x-z plane: h along -y; Sun along -y from the spacecraft.
    const law = createSunPointingLaw({ sunAxisBody: [1, 0, 0], secondaryAxisBody: [0, 1, 0], secondaryReference: 'orbit-normal' });
    const r: ReadonlyVec3 = [7e6, 0, 0];
    const q = sunPointingAttitude(createQuat(), law, r, [0, 0, 7.5e3], [7e6, -1.5e11, 0]);
    expect(law.usedFallback).toBe(true);
    bodyToInertial(q, [1, 0, 0]).forEach((c, i) => expect(Math.abs(c - [0, -1, 0][i]!)).toBeLessThan(TOL));
    bodyToInertial(q, [0, 1, 0]).forEach((c, i) => expect(Math.abs(c - [0, 0, 1][i]!)).toBeLessThan(TOL));
    // The next evaluation with a usable reference clears the flag.
    sunPointingAttitude(createQuat(), law, r, [0, 7.5e3, 0], [1e11, -1e11, 0]);
    expect(law.usedFallback).toBe(false);
  });

  it('a secondary axis parallel to the Sun axis is refused naming secondaryAxisBody', () => {
    expect(() =>
      createSunPointingLaw({ sunAxisBody: [0, 0, 1], secondaryAxisBody: [0, 0, -2], secondaryReference: 'nadir' }),
    ).toThrow(expect.objectContaining({ code: 'invalid_input', details: expect.objectContaining({ field: 'attitude.secondaryAxisBody' }) }));
  });

  it('a zero Sun axis and an unknown reference are refused naming the field', () => {
    expect(() =>
      createSunPointingLaw({ sunAxisBody: [0, 0, 0], secondaryAxisBody: [1, 0, 0], secondaryReference: 'nadir' }),
    ).toThrow(expect.objectContaining({ details: expect.objectContaining({ field: 'attitude.sunAxisBody' }) }));
    expect(() =>
      createAttitudeLaw({
        law: 'sun-pointing',
        sunAxisBody: [0, 0, 1],
        secondaryAxisBody: [1, 0, 0],
        secondaryReference: 'zenith' as SecondaryReference,
      }),
    ).toThrow(expect.objectContaining({ details: expect.objectContaining({ field: 'attitude.secondaryReference' }) }));
  });

  it('a spacecraft at the Sun position and a NaN velocity are refused naming sunPosEci and vSatEci', () => {
    const law = createAttitudeLaw({ law: 'sun-pointing', sunAxisBody: [0, 0, 1], secondaryAxisBody: [1, 0, 0], secondaryReference: 'velocity' });
    expect(() => attitudeAt(createQuat(), law, 0, [1, 2, 3], [0, 1, 0], [1, 2, 3])).toThrow(
      expect.objectContaining({ code: 'invalid_input', details: expect.objectContaining({ field: 'sunPosEci' }) }),
    );
    expect(() => attitudeAt(createQuat(), law, 0, [7e6, 0, 0], [Number.NaN, 1, 0], [1.5e11, 0, 0])).toThrow(
      expect.objectContaining({ code: 'invalid_input', details: expect.objectContaining({ field: 'vSatEci' }) }),
    );
  });
});
