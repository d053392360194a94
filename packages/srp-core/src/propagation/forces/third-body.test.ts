import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../../math/vec3';
import { parseUtcEpoch } from '../../time/epoch';
import { createGeocentricEphemeris } from '../../bodies/geocentric-ephemeris';
import { createHeliocentricEphemeris } from '../../bodies/heliocentric-ephemeris';
import { createPositionMemo } from './ephemeris-cache';
import {
  createMoonThirdBodyForce,
  createPlanetThirdBodyForce,
  createSunThirdBodyForce,
  createThirdBodyForce,
  thirdBodyAcceleration,
} from './third-body';

// Reference constants, from their sources.
/** source: JPL DE405 (Standish 1998), from memory */
const MU_SUN = 1.32712440018e20;
/** source: JPL DE430 (Folkner et al. 2014), from memory */
const MU_MOON = 4.9028e12;
/** source: IAU 2012 Resolution B2 */
const AU = 149_597_870_700;
/** GEO radius (m): 42 164 km, source: common practice (the radius of a sidereal-day circular orbit). */
const R_GEO = 42_164_000;
const MOON_DISTANCE = 384_400_000; // mean Earth–Moon distance (m), common practice

/** The plain difference of the two point-mass pulls, μ[(s − r)/|s − r|³ − s/|s|³]. */
function plainDifference(mu: number, r: readonly number[], s: readonly number[]): number[] {
  const d = [s[0]! - r[0]!, s[1]! - r[1]!, s[2]! - r[2]!];
  const dn = Math.hypot(d[0]!, d[1]!, d[2]!);
  const sn = Math.hypot(s[0]!, s[1]!, s[2]!);
  return [0, 1, 2].map((k) => mu * (d[k]! / dn ** 3 - s[k]! / sn ** 3));
}

describe('thirdBodyAcceleration (Battin F(q) form)', () => {
  it('equals the plain difference of the two point-mass accelerations', () => {
    // Moon: mild cancellation, the plain difference is good to ~1e-14 relative; Sun at GEO: the
    // terms are 1.8e3 × the result, so the plain difference carries ~1e-13 relative rounding.
    // 1e-11 relative of |a| covers both.
    const cases: [number, number[], number[]][] = [
      [MU_MOON, [R_GEO, 0, 0], [MOON_DISTANCE * 0.8, MOON_DISTANCE * 0.6, 1e7]],
      [MU_MOON, [-7e6, 1e6, 2e6], [MOON_DISTANCE, 0, 0]],
      [MU_SUN, [R_GEO * 0.6, -R_GEO * 0.8, 0], [AU * 0.9, AU * 0.4, AU * 0.17]],
      [MU_SUN, [7e6, 0, 0], [-AU, 0, 0]],
    ];
    const a: Vec3 = [0, 0, 0];
    for (const [mu, r, s] of cases) {
      thirdBodyAcceleration(a, mu, r, s as Vec3);
      const want = plainDifference(mu, r, s);
      const scale = Math.hypot(want[0]!, want[1]!, want[2]!);
      for (let k = 0; k < 3; k += 1) expect(Math.abs(a[k]! - want[k]!)).toBeLessThan(1e-11 * scale);
    }
  });

  it('at GEO on the Sun line the Sun pulls 3.3e-6 m/s², the exact collinear value', () => {
    // Collinear, spacecraft between the Earth and the Sun: a = μ [1/(d − r)² − 1/d²]
    //   = μ r (2d − r) / (d² (d − r)²), written without cancellation. ≈ 2μr/d³ = 3.34e-6 m/s².
    // The brief's "≈ 3.5e-6" is the order (common practice); the exact bound at 1 au is this.
    const d = AU;
    const r = R_GEO;
    const want = (MU_SUN * r * (2 * d - r)) / (d * d * (d - r) ** 2);
    const a: Vec3 = [0, 0, 0];
    thirdBodyAcceleration(a, MU_SUN, [r, 0, 0], [d, 0, 0]);
    expect(a[0] / want - 1).toBeCloseTo(0, 12);
    expect(want).toBeGreaterThan(3.3e-6);
    expect(want).toBeLessThan(3.4e-6);
    // Perpendicular to the Sun line it is about half as large and points to the Earth:
    // a_y = −μ r / (d² + r²)^{3/2} exactly (the indirect term has no y component).
    thirdBodyAcceleration(a, MU_SUN, [0, r, 0], [d, 0, 0]);
    expect(a[1] / (-(MU_SUN * r) / (d * d + r * r) ** 1.5)).toBeCloseTo(1, 12);
  });

  it('at GEO the Moon pulls 6.2e-6 … 8.7e-6 m/s² along its line, the exact collinear values', () => {
    // Near side μ r (2d − r)/(d² (d − r)²) = 8.68e-6, far side μ r (2d + r)/(d² (d + r)²) = 6.24e-6
    // (their mean is the tidal estimate 2μr/d³ ≈ 7.3e-6, the brief's "≈ 7e-6", common practice).
    const d = MOON_DISTANCE;
    const r = R_GEO;
    const near = (MU_MOON * r * (2 * d - r)) / (d * d * (d - r) ** 2);
    const far = (MU_MOON * r * (2 * d + r)) / (d * d * (d + r) ** 2);
    const a: Vec3 = [0, 0, 0];
    thirdBodyAcceleration(a, MU_MOON, [r, 0, 0], [d, 0, 0]);
    expect(a[0] / near).toBeCloseTo(1, 12);
    thirdBodyAcceleration(a, MU_MOON, [-r, 0, 0], [d, 0, 0]);
    expect(-a[0] / far).toBeCloseTo(1, 12);
    expect(near).toBeCloseTo(8.68e-6, 8);
    expect(far).toBeCloseTo(6.24e-6, 8);
  });
});

describe('Sun, Moon and planet third-body forces', () => {
  const epoch = parseUtcEpoch('2026-03-20T00:00:00Z');

  it('the Sun and Moon forces use the ephemeris positions and the published GMs', () => {
    // Same formula on the same positions: 1e-15 relative (bit-identical in practice).
    const eph = createGeocentricEphemeris(epoch, 0, 86_400);
    const y = Float64Array.of(R_GEO, 1e6, -2e6, 0, 3070, 0);
    const a: Vec3 = [0, 0, 0];
    const s: Vec3 = [0, 0, 0];
    const want: Vec3 = [0, 0, 0];
    for (const [force, mu, at] of [
      [createSunThirdBodyForce(eph), MU_SUN, eph.sunPositionAt] as const,
      [createMoonThirdBodyForce(eph), MU_MOON, eph.moonPositionAt] as const,
    ]) {
      force.acceleration(a, 3600, y);
      at(s, 3600);
      thirdBodyAcceleration(want, mu, y, s);
      for (let k = 0; k < 3; k += 1) expect(Math.abs(a[k]! - want[k]!)).toBeLessThanOrEqual(1e-15 * Math.hypot(...want));
    }
  });

  it('Jupiter pulls a sail at 1 au by 2e-7 … 5e-7 m/s² relative to the Sun', () => {
    // Jupiter at 4.95–5.46 au: the direct term μ_J/d² is 1.9e-7 … 3.8e-7 m/s² at 1 au and the
    // indirect term 1.5e-7 … 2.2e-7 (source for the orbit: common knowledge); their difference
    // lies within these bounds whatever the geometry.
    const helio = createHeliocentricEphemeris(epoch, 0, 86_400, { planets: ['jupiter', 'earth'] });
    const earth: Vec3 = [0, 0, 0];
    helio.planetPositionAt(earth, 'earth', 0);
    const a: Vec3 = [0, 0, 0];
    createPlanetThirdBodyForce('jupiter', helio).acceleration(a, 0, Float64Array.of(...earth, 0, 0, 0));
    const norm = Math.hypot(...a);
    expect(norm).toBeGreaterThan(5e-8);
    expect(norm).toBeLessThan(6e-7);
  });

  it('a planet not in the heliocentric ephemeris is refused, naming planet', () => {
    const helio = createHeliocentricEphemeris(epoch, 0, 86_400, { planets: ['venus'] });
    expect(() => createPlanetThirdBodyForce('mars', helio)).toThrow(
      expect.objectContaining({ code: 'invalid_input', details: expect.objectContaining({ field: 'planet' }) }),
    );
  });

  it('a generic third body with a fixed position gives the Battin acceleration', () => {
    const s: Vec3 = [AU, 0, 0];
    const force = createThirdBodyForce('test', MU_SUN, createPositionMemo((out) => ((out[0] = s[0]), (out[1] = 0), (out[2] = 0), out)));
    const a: Vec3 = [0, 0, 0];
    force.acceleration(a, 0, Float64Array.of(1e7, 0, 0, 0, 0, 0));
    expect(a[0] / ((MU_SUN * 1e7 * (2 * AU - 1e7)) / (AU * AU * (AU - 1e7) ** 2))).toBeCloseTo(1, 10);
  });
});
