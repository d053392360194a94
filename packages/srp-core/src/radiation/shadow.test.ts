import { describe, expect, it } from 'vitest';
import { EARTH_EQUATORIAL_RADIUS, MOON_RADIUS, SUN_RADIUS } from '../bodies/body-constants';
import type { ReadonlyVec3, Vec3 } from '../math/vec3';
import {
  apparentDiscs,
  conicalShadowFraction,
  createApparentDiscs,
  cylindricalShadowFraction,
  earthMoonShadowFraction,
  twoBodyConicalShadowFraction,
  twoDiscOccultedFraction,
  visibleSolarDiscFraction,
} from './shadow';

const AU = 149_597_870_700; // source: IAU 2012 Resolution B2
const ORIGIN: Vec3 = [0, 0, 0];
const SUN: Vec3 = [AU, 0, 0];
/** Apparent solar radius from the origin with the Sun at 1 au (rad). */
const A_SUN = Math.asin(SUN_RADIUS / AU);

/** A point at `distance` from the origin, `angle` (rad) from +x, turned by `azimuth` (rad) about +x. */
function direction(angle: number, azimuth: number, distance: number): Vec3 {
  return [
    distance * Math.cos(angle),
    distance * Math.sin(angle) * Math.cos(azimuth),
    distance * Math.sin(angle) * Math.sin(azimuth),
  ];
}

/** A body of radius R placed so that, from the origin, it subtends `b` at `c` from the Sun. */
function bodyAt(radius: number, b: number, c: number, azimuth = 0): Vec3 {
  return direction(c, azimuth, radius / Math.sin(b));
}

/**
 * Covered fraction of a disc of radius a (centre 0) by a disc of radius b (centre (c, 0)), by
 * composite Simpson integration of the covered chord length over x — a different route from the
 * closed-form lens area. The chord is 2 min(√(a²−x²), √(b²−(x−c)²)) where both exist.
 */
function coveredBySlices(a: number, b: number, c: number, n = 200_000): number {
  const lo = Math.max(-a, c - b);
  const hi = Math.min(a, c + b);
  if (hi <= lo) return 0;
  // x = mid + half·sin θ removes the square-root ends so Simpson converges fast.
  const mid = (lo + hi) / 2;
  const half = (hi - lo) / 2;
  const g = (theta: number): number => {
    const x = mid + half * Math.sin(theta);
    const ws = Math.sqrt(Math.max(0, a * a - x * x));
    const wb = Math.sqrt(Math.max(0, b * b - (x - c) * (x - c)));
    return 2 * Math.min(ws, wb) * half * Math.cos(theta);
  };
  const h = Math.PI / n;
  let sum = g(-Math.PI / 2) + g(Math.PI / 2);
  for (let i = 1; i < n; i += 1) sum += (i % 2 === 1 ? 4 : 2) * g(-Math.PI / 2 + i * h);
  return ((sum * h) / 3) / (Math.PI * a * a);
}

/**
 * Visible fraction of the solar disc by ray casting: n directions spread evenly (sunflower pattern,
 * equal solid angle) over the cone that the Sun's sphere fills, each tested against every occulting
 * sphere. Exact 3-D geometry, no plane-circle approximation.
 */
function rayCastVisible(rSat: ReadonlyVec3, sunPos: ReadonlyVec3, bodies: { pos: ReadonlyVec3; radius: number }[], n = 200_000): number {
  const sx = sunPos[0] - rSat[0];
  const sy = sunPos[1] - rSat[1];
  const sz = sunPos[2] - rSat[2];
  const ds = Math.hypot(sx, sy, sz);
  const s: Vec3 = [sx / ds, sy / ds, sz / ds];
  const a = Math.asin(SUN_RADIUS / ds);
  // e1, e2 complete an orthonormal basis with s.
  const t: Vec3 = Math.abs(s[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0];
  const e1: Vec3 = [s[1] * t[2] - s[2] * t[1], s[2] * t[0] - s[0] * t[2], s[0] * t[1] - s[1] * t[0]];
  const n1 = Math.hypot(...e1);
  e1[0] /= n1;
  e1[1] /= n1;
  e1[2] /= n1;
  const e2: Vec3 = [s[1] * e1[2] - s[2] * e1[1], s[2] * e1[0] - s[0] * e1[2], s[0] * e1[1] - s[1] * e1[0]];
  const golden = Math.PI * (3 - Math.sqrt(5));
  const oneMinusCosA = 2 * Math.sin(a / 2) ** 2;
  let visible = 0;
  for (let k = 0; k < n; k += 1) {
    const u = (k + 0.5) / n;
    const cosRho = 1 - u * oneMinusCosA;
    const sinRho = Math.sqrt(Math.max(0, 1 - cosRho * cosRho));
    const psi = k * golden;
    const cp = Math.cos(psi);
    const sp = Math.sin(psi);
    const d = [0, 1, 2].map((i) => cosRho * s[i]! + sinRho * (cp * e1[i]! + sp * e2[i]!));
    let blocked = false;
    for (const body of bodies) {
      const w = [0, 1, 2].map((i) => body.pos[i]! - rSat[i]!);
      const along = w[0]! * d[0]! + w[1]! * d[1]! + w[2]! * d[2]!;
      if (along <= 0) continue;
      const perp2 = w[0]! ** 2 + w[1]! ** 2 + w[2]! ** 2 - along * along;
      if (perp2 < body.radius * body.radius) {
        blocked = true;
        break;
      }
    }
    if (!blocked) visible += 1;
  }
  return visible / n;
}

describe('visibleSolarDiscFraction and conicalShadowFraction', () => {
  it('two equal discs one radius apart leave 1/3 + √3/(2π) of the Sun visible', () => {
    // source: by hand: the lens of two circles of radius r at distance r has area
    // r² (2π/3 − √3/2), so ν = 1 − (2π/3 − √3/2)/π = 1/3 + √3/(2π) = 0.608998…
    const expected = 1 / 3 + Math.sqrt(3) / (2 * Math.PI);
    expect(Math.abs(visibleSolarDiscFraction(1e-3, 1e-3, 1e-3) - expected)).toBeLessThan(1e-14);
    // The same geometry built in 3-D: a body subtending exactly the Sun's radius, one radius off.
    const body = bodyAt(MOON_RADIUS, A_SUN, A_SUN);
    // asin/atan2 of the geometry round at ~1e-16 relative to a; ν moves by ~1/a per radian: 1e-11.
    expect(Math.abs(conicalShadowFraction(ORIGIN, SUN, body, MOON_RADIUS) - expected)).toBeLessThan(1e-11);
  });

  it('a body half the Sun\'s apparent size inside the disc leaves 3/4 visible (antumbra)', () => {
    // source: by hand, area ratio 1 − (b/a)² = 1 − 1/4
    const body = bodyAt(MOON_RADIUS, A_SUN / 2, 0.2 * A_SUN, 1);
    expect(Math.abs(conicalShadowFraction(ORIGIN, SUN, body, MOON_RADIUS) - 0.75)).toBeLessThan(1e-12);
  });

  it.each([
    ['GEO Earth, limb a third into the Sun', 0.1516, 0.1516 + (1 / 3) * 4.65e-3],
    ['GEO Earth, Sun mostly covered', 0.1516, 0.1516 - 0.8 * 4.65e-3],
    ['LEO Earth (b = 70°)', 1.2217, 1.2217 + 0.05 * 4.65e-3],
    ['Moon from the Earth, nearly central', 4.5e-3, 1e-3],
    ['Moon from the Earth, grazing', 4.5e-3, 4.65e-3 + 4.4e-3],
  ])('%s: the closed form matches slice-by-slice integration of the overlap to 1e-8', (_label, b, c) => {
    // Independent route: Simpson over the covered chord (2e5 intervals after a sin substitution)
    // converges far below 1e-8; the closed form loses ~1e-12 to cancellation when b ≫ a.
    const a = 4.65e-3;
    const nu = visibleSolarDiscFraction(a, b, c);
    expect(Math.abs(nu - (1 - coveredBySlices(a, b, c)))).toBeLessThan(1e-8);
    expect(nu).toBeGreaterThan(0);
    expect(nu).toBeLessThan(1);
  });

  it('is exactly 1 beyond first contact and exactly 0 beyond second contact', () => {
    const a = A_SUN;
    const b = 0.15;
    expect(conicalShadowFraction(ORIGIN, SUN, bodyAt(EARTH_EQUATORIAL_RADIUS, b, b + a + 1e-9), EARTH_EQUATORIAL_RADIUS)).toBe(1);
    expect(conicalShadowFraction(ORIGIN, SUN, bodyAt(EARTH_EQUATORIAL_RADIUS, b, b - a - 1e-9), EARTH_EQUATORIAL_RADIUS)).toBe(0);
    const justInside = conicalShadowFraction(ORIGIN, SUN, bodyAt(EARTH_EQUATORIAL_RADIUS, b, b + a - 1e-7), EARTH_EQUATORIAL_RADIUS);
    expect(justInside).toBeLessThan(1);
    expect(justInside).toBeGreaterThan(0.999);
  });

  it('is 0 for a spacecraft inside the body', () => {
    expect(conicalShadowFraction([1000, 0, 0], SUN, ORIGIN, EARTH_EQUATORIAL_RADIUS)).toBe(0);
  });

  it('falls monotonically from 1 to 0 across the penumbra of a GEO satellite', () => {
    let previous = 1;
    for (let k = 0; k <= 400; k += 1) {
      // Walk the satellite through the anti-sun region on the GEO ring.
      const theta = Math.PI - 0.16 + (k / 400) * 0.02;
      const nu = conicalShadowFraction([42_164_000 * Math.cos(theta), 42_164_000 * Math.sin(theta), 0], SUN, ORIGIN, EARTH_EQUATORIAL_RADIUS);
      expect(nu).toBeLessThanOrEqual(previous + 1e-15);
      previous = nu;
    }
    expect(previous).toBe(0);
  });
});

describe('cylindricalShadowFraction against conicalShadowFraction', () => {
  it('agree on a GEO ring deep in the umbra and far in sunlight', () => {
    // Away from the band |c − b| < 2a around the shadow edge the two models must agree (the
    // cylinder edge lies between the umbra and penumbra edges).
    const discs = createApparentDiscs();
    let compared = 0;
    for (let k = 0; k < 3600; k += 1) {
      const theta = (2 * Math.PI * k) / 3600;
      const r: Vec3 = [42_164_000 * Math.cos(theta), 42_164_000 * Math.sin(theta), 1_000_000 * Math.sin(3 * theta)];
      apparentDiscs(discs, r, SUN, ORIGIN, EARTH_EQUATORIAL_RADIUS);
      if (Math.abs(discs.separationRad - discs.bodyRadiusRad) < 2 * discs.sunRadiusRad) continue;
      expect(cylindricalShadowFraction(r, SUN, ORIGIN, EARTH_EQUATORIAL_RADIUS)).toBe(
        conicalShadowFraction(r, SUN, ORIGIN, EARTH_EQUATORIAL_RADIUS),
      );
      compared += 1;
    }
    expect(compared).toBeGreaterThan(3500);
  });

  it('on the shadow axis both give 0, on the day side both give 1', () => {
    for (const r of [
      [-7_000_000, 0, 0],
      [-42_164_000, 0, 0],
    ] as Vec3[]) {
      expect(cylindricalShadowFraction(r, SUN, ORIGIN, EARTH_EQUATORIAL_RADIUS)).toBe(0);
      expect(conicalShadowFraction(r, SUN, ORIGIN, EARTH_EQUATORIAL_RADIUS)).toBe(0);
    }
    const day: Vec3 = [7_000_000, 100, 0];
    expect(cylindricalShadowFraction(day, SUN, ORIGIN, EARTH_EQUATORIAL_RADIUS)).toBe(1);
    expect(conicalShadowFraction(day, SUN, ORIGIN, EARTH_EQUATORIAL_RADIUS)).toBe(1);
  });
});

describe('twoBodyConicalShadowFraction (Earth and Moon together)', () => {
  const EARTH_DISTANCE = 384_400_000;
  const MOON_DISTANCE = 2_000_000; // a lunar orbiter 263 km above the surface
  const bE = Math.asin(EARTH_EQUATORIAL_RADIUS / EARTH_DISTANCE);
  const bM = Math.asin(MOON_RADIUS / MOON_DISTANCE);

  function lunarOrbiterCase(earthDepth: number, moonDepth: number, moonAzimuth: number) {
    // depth: how far the body's limb reaches into the solar disc, in solar radii (c = b + a − depth·a).
    const earth = bodyAt(EARTH_EQUATORIAL_RADIUS, bE, bE + A_SUN - earthDepth * A_SUN);
    const moon = bodyAt(MOON_RADIUS, bM, bM + A_SUN - moonDepth * A_SUN, moonAzimuth);
    return { earth, moon };
  }

  it.each([
    ['limbs overlapping on the Sun', 0.7, 0.5, 0.3],
    ['limbs overlapping, deep', 1.3, 1.1, 0.0],
    ['the bodies on opposite sides of the Sun', 0.7, 0.5, Math.PI],
    ['the bodies at right angles about the Sun', 0.9, 0.9, Math.PI / 2],
  ])('a lunar orbiter with %s stays in [0, 1] and matches ray casting within 1e-3', (_label, dE, dM, az) => {
    // Tolerance: the plane-circle model puts the Moon's limb (b = 60°) with curvature 1/b instead
    // of cot b, ≲ 6e-4 of the disc; the 2e5-ray sunflower sampling adds ≲ 1e-4. Measured: 6e-6 to 1.4e-4.
    const { earth, moon } = lunarOrbiterCase(dE, dM, az);
    const nu = twoBodyConicalShadowFraction(ORIGIN, SUN, earth, EARTH_EQUATORIAL_RADIUS, moon, MOON_RADIUS);
    const nuE = conicalShadowFraction(ORIGIN, SUN, earth, EARTH_EQUATORIAL_RADIUS);
    const nuM = conicalShadowFraction(ORIGIN, SUN, moon, MOON_RADIUS);
    expect(nuE).toBeGreaterThan(0);
    expect(nuE).toBeLessThan(1);
    expect(nuM).toBeGreaterThan(0);
    expect(nuM).toBeLessThan(1);
    expect(nu).toBeGreaterThanOrEqual(0);
    expect(nu).toBeLessThanOrEqual(Math.min(nuE, nuM));
    const reference = rayCastVisible(ORIGIN, SUN, [
      { pos: earth, radius: EARTH_EQUATORIAL_RADIUS },
      { pos: moon, radius: MOON_RADIUS },
    ]);
    expect(Math.abs(nu - reference)).toBeLessThan(1e-3);
  });

  it('where the Earth and the Moon each hide about 70% of the Sun on the same side, the naive sum goes negative but ours does not', () => {
    const { earth, moon } = lunarOrbiterCase(1.4, 1.3, 0);
    const nuE = conicalShadowFraction(ORIGIN, SUN, earth, EARTH_EQUATORIAL_RADIUS);
    const nuM = conicalShadowFraction(ORIGIN, SUN, moon, MOON_RADIUS);
    expect(1 - (1 - nuE) - (1 - nuM)).toBeLessThan(0);
    const nu = twoBodyConicalShadowFraction(ORIGIN, SUN, earth, EARTH_EQUATORIAL_RADIUS, moon, MOON_RADIUS);
    expect(nu).toBeGreaterThan(0);
    const reference = rayCastVisible(ORIGIN, SUN, [
      { pos: earth, radius: EARTH_EQUATORIAL_RADIUS },
      { pos: moon, radius: MOON_RADIUS },
    ]);
    expect(Math.abs(nu - reference)).toBeLessThan(1e-3); // as above; measured 5e-5 (ν = 0.276)
  });

  it('a spacecraft beyond the Earth (1.5 million km) seeing the Earth and the Moon cross the Sun together matches ray casting within 3e-4', () => {
    // Both discs small (0.24° and 0.07°), so the plane-circle model is exact to ~1e-6; the
    // tolerance is the sampling error of 2e5 rays. Measured: 4.6e-5 to 7.1e-5.
    // The spacecraft sits 1.5e9 m behind the plane x = 0 that holds both bodies (the Moon is
    // moved into that plane for a clean construction).
    const D = 1_500_000_000;
    const r: Vec3 = [-D, 0, 0];
    const earthAngle = Math.asin(EARTH_EQUATORIAL_RADIUS / D);
    const moonAngle = Math.asin(MOON_RADIUS / D);
    const aHere = Math.asin(SUN_RADIUS / (AU + D));
    // Earth's disc centred 0.6 a off the Sun's centre; the Moon in three places around it.
    const earth: Vec3 = [0, D * Math.tan(0.6 * aHere), 0];
    for (const [dy, dz] of [
      [0.6 * aHere - earthAngle, 0.1 * aHere], // straddling the Earth's limb
      [-0.6 * aHere, 0.5 * aHere], // apart from the Earth
      [0.6 * aHere - earthAngle + moonAngle / 2, 0], // half inside the Earth's disc
    ] as const) {
      const moon: Vec3 = [0, D * Math.tan(dy), D * Math.tan(dz)];
      const nu = twoBodyConicalShadowFraction(r, SUN, earth, EARTH_EQUATORIAL_RADIUS, moon, MOON_RADIUS);
      const reference = rayCastVisible(r, SUN, [
        { pos: earth, radius: EARTH_EQUATORIAL_RADIUS },
        { pos: moon, radius: MOON_RADIUS },
      ]);
      expect(nu).toBeGreaterThanOrEqual(0);
      expect(nu).toBeLessThanOrEqual(1);
      expect(Math.abs(nu - reference)).toBeLessThan(3e-4);
    }
  });

  it('the union equals the sum for discs apart and the larger disc for discs nested, to 1e-12', () => {
    // source: set algebra; 1e-12 covers the closed form's rounding when b ≫ a.
    const a = 4.65e-3;
    const cover = (b: number, c: number): number => 1 - visibleSolarDiscFraction(a, b, c);
    expect(Math.abs(twoDiscOccultedFraction(a, 2e-3, 4e-3, 1.5e-3, 3.5e-3, Math.PI) - (cover(2e-3, 4e-3) + cover(1.5e-3, 3.5e-3)))).toBeLessThan(1e-12);
    expect(Math.abs(twoDiscOccultedFraction(a, 1.2, 1.2 + 2e-3, 1e-3, 4e-3, 2.5) - (cover(1.2, 1.2 + 2e-3) + cover(1e-3, 4e-3)))).toBeLessThan(1e-12);
    expect(Math.abs(twoDiscOccultedFraction(a, 0.01, 0.011, 1e-3, 4e-3, 0.2) - cover(0.01, 0.011))).toBeLessThan(1e-12);
  });

  it.each([
    ['two small discs overlapping on the Sun', 2e-3, 3e-3, 2.5e-3, 3e-3, 0.8],
    ['a large and a small disc overlapping', 1.0, 1.0 + 1e-3, 2e-3, 2e-3, 0.3],
    ['two large discs crossing inside the Sun', 1.01, 1.01 + 3.3e-3, 0.70, 0.70 + 2.4e-3, 2.13],
    ['two large discs apart inside the Sun', 1.01, 1.01 + 3.3e-3, 0.70, 0.70 + 2.4e-3, 2.6],
    ['a disc nearly tangent inside another', 0.02, 0.02 + 1e-3, 3e-3, 3e-3 + 0.9e-3, 1e-4],
  ])('%s: the union matches slice-by-slice integration within 1e-6', (_label, b1, c1, b2, c2, phi) => {
    // Independent route: composite Simpson of the covered chord length over x = a sin θ
    // (4e5 intervals). Kinks and square-root ends inside the interval limit it to ~1e-7.
    const a = 4.65e-3;
    const x2 = c2 * Math.cos(phi);
    const y2 = c2 * Math.sin(phi);
    const chord = (x: number, cx: number, cy: number, r: number, ws: number): [number, number] => {
      const dx = x - cx;
      if (dx * dx >= r * r) return [0, 0];
      const w = Math.sqrt(r * r - dx * dx);
      const lo = Math.max(-ws, cy - w);
      const hi = Math.min(ws, cy + w);
      return hi > lo ? [lo, hi] : [0, 0];
    };
    const g = (theta: number): number => {
      const x = a * Math.sin(theta);
      const ws = a * Math.cos(theta);
      const [l1, h1] = chord(x, c1, 0, b1, ws);
      const [l2, h2] = chord(x, x2, y2, b2, ws);
      const overlap = Math.max(0, Math.min(h1, h2) - Math.max(l1, l2));
      return (h1 - l1 + h2 - l2 - overlap) * a * Math.cos(theta);
    };
    const n = 400_000;
    const h = Math.PI / n;
    let sum = g(-Math.PI / 2) + g(Math.PI / 2);
    for (let i = 1; i < n; i += 1) sum += (i % 2 === 1 ? 4 : 2) * g(-Math.PI / 2 + i * h);
    const reference = (sum * h) / 3 / (Math.PI * a * a);
    expect(Math.abs(twoDiscOccultedFraction(a, b1, c1, b2, c2, phi) - reference)).toBeLessThan(1e-6);
  });

  it('stays within [max(0, ν₁+ν₂−1), min(ν₁, ν₂)] for 20 000 random geometries', () => {
    // source: set algebra (union area ≥ each area, ≤ their sum); deterministic pseudo-random draws
    let seed = 12345;
    const rand = (): number => {
      seed = (seed * 1_103_515_245 + 12_345) % 2_147_483_648;
      return seed / 2_147_483_648;
    };
    for (let i = 0; i < 20_000; i += 1) {
      const a = 4.65e-3;
      const b1 = a * (0.1 + 300 * rand() ** 3);
      const b2 = a * (0.1 + 300 * rand() ** 3);
      const c1 = Math.max(0, b1 + a * (2.4 * rand() - 1.2));
      const c2 = Math.max(0, b2 + a * (2.4 * rand() - 1.2));
      const body1 = bodyAt(EARTH_EQUATORIAL_RADIUS, Math.min(b1, 1.5), c1);
      const body2 = bodyAt(MOON_RADIUS, Math.min(b2, 1.5), c2, 2 * Math.PI * rand());
      const nu1 = conicalShadowFraction(ORIGIN, SUN, body1, EARTH_EQUATORIAL_RADIUS);
      const nu2 = conicalShadowFraction(ORIGIN, SUN, body2, MOON_RADIUS);
      const nu = twoBodyConicalShadowFraction(ORIGIN, SUN, body1, EARTH_EQUATORIAL_RADIUS, body2, MOON_RADIUS);
      // The union is clamped to these bounds by construction; 1e-15 only absorbs the test's own
      // rounding of ν₁ + ν₂ − 1 (e.g. ν₁ + 1 − 1 ≠ ν₁ in floating point).
      expect(nu).toBeGreaterThanOrEqual(Math.max(0, nu1 + nu2 - 1) - 1e-15);
      expect(nu).toBeLessThanOrEqual(Math.min(nu1, nu2));
    }
  });
});

describe('earthMoonShadowFraction', () => {
  it('is 1 under the none model even in the umbra, and follows the chosen model otherwise', () => {
    const r: Vec3 = [-42_164_000, 0, 0];
    const moonFar: Vec3 = [0, 384_400_000, 0];
    expect(earthMoonShadowFraction('none', r, SUN, moonFar)).toBe(1);
    expect(earthMoonShadowFraction('cylindrical', r, SUN, moonFar)).toBe(0);
    expect(earthMoonShadowFraction('conical', r, SUN, null)).toBe(0);
    const lit: Vec3 = [42_164_000, 0, 0];
    expect(earthMoonShadowFraction('conical', lit, SUN, moonFar)).toBe(1);
  });

  it('sees a Moon between a GEO satellite and the Sun as a partial eclipse', () => {
    const r: Vec3 = [42_164_000, 0, 0];
    // Moon 384 400 km sunward of the satellite, 1500 km off the line (inside its cylinder).
    const moon: Vec3 = [42_164_000 + 384_400_000, 1_500_000, 0];
    const nu = earthMoonShadowFraction('conical', r, SUN, moon);
    expect(nu).toBeGreaterThan(0);
    expect(nu).toBeLessThan(1);
    expect(earthMoonShadowFraction('cylindrical', r, SUN, moon)).toBe(0);
  });
});
