import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../../math/vec3';
import { createZonalForce, EARTH_ZONAL_J } from './earth-zonal';

// Reference constants written out from their sources, not taken from the code under test.
/** source: IERS Conventions 2010, Table 1.1 */
const MU = 3.986004418e14;
/** source: WGS 84 (NIMA TR8350.2) */
const R = 6_378_137;
/** JGM-3 J2 … J6, source: Vallado (2013) / Montenbruck & Gill (2000) tables (from memory). */
const J = [1.08262668355e-3, -2.53265648533e-6, -1.61962159137e-6, -2.27296082869e-7, 5.40681239107e-7];

/** Legendre polynomials P2 … P6 written out (any table of Legendre polynomials). */
const legendre: Record<number, (u: number) => number> = {
  2: (u) => (3 * u * u - 1) / 2,
  3: (u) => (5 * u ** 3 - 3 * u) / 2,
  4: (u) => (35 * u ** 4 - 30 * u * u + 3) / 8,
  5: (u) => (63 * u ** 5 - 70 * u ** 3 + 15 * u) / 8,
  6: (u) => (231 * u ** 6 - 315 * u ** 4 + 105 * u * u - 5) / 16,
};

/**
 * The degree-n zonal term of the gravitational potential V = (μ/r) [1 − Σ J_n (R/r)ⁿ P_n(z/r)],
 * V_n = −(μ/r) J_n (R/r)ⁿ P_n(z/r) (m²/s²), whose gradient is the acceleration, a_n = +∇V_n.
 * Source: Vallado (2013) §8.6.1 / Montenbruck & Gill (2000) §3.2 (from memory).
 */
function zonalPotential(n: number, x: number, y: number, z: number): number {
  const r = Math.hypot(x, y, z);
  return -(MU / r) * J[n - 2]! * (R / r) ** n * legendre[n]!(z / r);
}

const points: Vec3[] = [
  [7_000_000, 0, 0], // equatorial LEO
  [3_000_000, -4_000_000, 5_100_000], // mid latitude
  [200_000, 100_000, -6_900_000], // near the south pole
  [30_000_000, 25_000_000, 8_000_000], // near GEO radius
  [-5_000_000, 4_500_000, 2_000_000],
];

function onlyDegree(n: number): number[] {
  return J.map((j, i) => (i === n - 2 ? j : 0));
}

describe('createZonalForce', () => {
  it('uses the JGM-3 coefficients J2 … J6', () => {
    expect([...EARTH_ZONAL_J]).toEqual(J);
  });

  it.each([2, 3, 4, 5, 6])('J%i alone equals the numerical gradient of its potential', (n) => {
    // Central differences with step h = 1 m: truncation h² V'''/6 ~ 1e-12 of |a|; rounding of
    // V (a dozen operations, ~1e-15 |V|) over 2h is ~3e-9 of |a| (measured: 1.5e-9 … 2.6e-9
    // for J2 … J6). 1e-7 of |a| leaves a margin and still catches any wrong factor or sign (O(1)).
    const force = createZonalForce({ degree: 6, coefficients: onlyDegree(n) });
    const a: Vec3 = [0, 0, 0];
    const h = 1;
    for (const p of points) {
      force.acceleration(a, 0, Float64Array.of(p[0], p[1], p[2], 0, 0, 0));
      const g = [0, 1, 2].map((k) => {
        const plus = [...p];
        const minus = [...p];
        plus[k]! += h;
        minus[k]! -= h;
        return (zonalPotential(n, plus[0]!, plus[1]!, plus[2]!) - zonalPotential(n, minus[0]!, minus[1]!, minus[2]!)) / (2 * h);
      });
      const scale = Math.hypot(g[0]!, g[1]!, g[2]!);
      for (let k = 0; k < 3; k += 1) expect(Math.abs(a[k]! - g[k]!)).toBeLessThan(1e-7 * scale);
    }
  });

  it('J2 … J6 together are the sum of the single-degree forces', () => {
    // Exact in arithmetic; 1e-14 relative covers the different summation order.
    const all = createZonalForce();
    const a: Vec3 = [0, 0, 0];
    const one: Vec3 = [0, 0, 0];
    for (const p of points) {
      const y = Float64Array.of(p[0], p[1], p[2], 0, 0, 0);
      all.acceleration(a, 0, y);
      const sum = [0, 0, 0];
      for (let n = 2; n <= 6; n += 1) {
        createZonalForce({ coefficients: onlyDegree(n) }).acceleration(one, 0, y);
        for (let k = 0; k < 3; k += 1) sum[k]! += one[k]!;
      }
      const scale = Math.hypot(a[0], a[1], a[2]);
      for (let k = 0; k < 3; k += 1) expect(Math.abs(a[k]! - sum[k]!)).toBeLessThan(1e-14 * scale);
    }
  });

  it('degree 2 matches the closed-form J2 acceleration', () => {
    // a = −(3/2) J2 μ R²/r⁵ [x (1 − 5z²/r²), y (1 − 5z²/r²), z (3 − 5z²/r²)].
    // Source: Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), §8.6.1
    // (equation number from memory). Same quantity by different arithmetic: 1e-13 relative.
    const force = createZonalForce({ degree: 2 });
    const a: Vec3 = [0, 0, 0];
    for (const [x, y, z] of points) {
      force.acceleration(a, 0, Float64Array.of(x, y, z, 0, 0, 0));
      const r = Math.hypot(x, y, z);
      const k = (-1.5 * J[0]! * MU * R * R) / r ** 5;
      const u2 = (z * z) / (r * r);
      const want = [k * x * (1 - 5 * u2), k * y * (1 - 5 * u2), k * z * (3 - 5 * u2)];
      const scale = Math.hypot(want[0]!, want[1]!, want[2]!);
      for (let c = 0; c < 3; c += 1) expect(Math.abs(a[c]! - want[c]!)).toBeLessThan(1e-13 * scale);
    }
  });

  it('J2 at 700 km altitude over the equator is about 1e-3 of the central gravity', () => {
    // On the equator |a_J2| = (3/2) J2 (R/r)² μ/r² exactly (from the closed form with z = 0).
    const r = R + 700_000;
    const a: Vec3 = [0, 0, 0];
    createZonalForce({ degree: 2 }).acceleration(a, 0, Float64Array.of(r, 0, 0, 0, 0, 0));
    expect(a[0] / (MU / (r * r))).toBeCloseTo(-1.5 * J[0]! * (R / r) ** 2, 15);
    expect(Math.abs(a[1])).toBe(0);
    expect(Math.abs(a[2])).toBe(0);
  });

  it('refuses a degree outside 2 … 6, naming it', () => {
    expect(() => createZonalForce({ degree: 7 })).toThrow(
      expect.objectContaining({ code: 'out_of_range', details: expect.objectContaining({ field: 'degree' }) }),
    );
  });
});
