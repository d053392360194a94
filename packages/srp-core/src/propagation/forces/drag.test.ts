import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../../math/vec3';
import { createDragForce, exponentialDensity, EXPONENTIAL_ATMOSPHERE_TABLE } from './drag';

/** source: WGS 84 (NIMA TR8350.2) */
const R = 6_378_137;
/** source: IERS Conventions 2010 Table 1.1 */
const OMEGA = 7.292115e-5;

describe('exponentialDensity (Vallado 2013, Table 8-4)', () => {
  it('gives the tabulated base density at the base altitudes', () => {
    // Values from Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013),
    // Table 8-4 (from memory, written out here independently of the code's table).
    // exp(−0) = 1 exactly: 1e-15 relative.
    const rows: [number, number][] = [
      [0, 1.225],
      [100, 5.297e-7],
      [200, 2.789e-10],
      [400, 3.725e-12],
      [500, 6.967e-13],
      [800, 1.17e-14],
      [1000, 3.019e-15],
    ];
    for (const [hKm, rho] of rows) expect(exponentialDensity(hKm * 1000) / rho - 1).toBeCloseTo(0, 14);
  });

  it('interpolates exponentially inside a band: 425 km with ρ0 = 3.725e-12 kg/m³, H = 58.515 km', () => {
    const want = 3.725e-12 * Math.exp(-25 / 58.515);
    expect(exponentialDensity(425_000) / want - 1).toBeCloseTo(0, 13);
    expect(exponentialDensity(425_000)).toBeLessThan(3.725e-12);
    expect(exponentialDensity(425_000)).toBeGreaterThan(1.585e-12);
  });

  it("each band's scale height carries its base density onto the next base within 0.15 %", () => {
    // The table is built continuous (source: Vallado 2013 Table 8-4 construction); a typo in a
    // transcribed digit of ρ0 or H shows up here as a jump. Measured: ≤ 1e-4 except 25 km (0.14 %).
    const table = EXPONENTIAL_ATMOSPHERE_TABLE;
    for (let i = 0; i + 1 < table.length; i += 1) {
      const [h0, rho0, H] = table[i]!;
      const [h1, rho1] = table[i + 1]!;
      expect(Math.abs((rho0 * Math.exp(-(h1 - h0) / H)) / rho1 - 1)).toBeLessThan(1.5e-3);
    }
  });

  it('is zero above the table top (1000 km)', () => {
    expect(exponentialDensity(1_000_001)).toBe(0);
    expect(exponentialDensity(35_786_000)).toBe(0);
  });
});

describe('createDragForce', () => {
  it('opposes the velocity relative to the co-rotating atmosphere with ½ ρ Cd A/m v_rel²', () => {
    // Equatorial prograde circular orbit at 400 km: v_rel = v − ω r along the velocity.
    // Source for the drag law: Vallado (2013) §8.6.2 (from memory). Same arithmetic: 1e-13.
    const r = R + 400_000;
    const v = Math.sqrt(3.986004418e14 / r);
    const force = createDragForce({ cd: 2.2, areaM2: 10, massKg: 500 });
    const a: Vec3 = [0, 0, 0];
    force.acceleration(a, 0, Float64Array.of(r, 0, 0, 0, v, 0));
    const vRel = v - OMEGA * r;
    const want = -0.5 * 3.725e-12 * ((2.2 * 10) / 500) * vRel * vRel;
    expect(a[1] / want - 1).toBeCloseTo(0, 12);
    expect(Math.abs(a[0])).toBe(0);
    expect(Math.abs(a[2])).toBe(0);
    expect(want).toBeCloseTo(-4.22e-6, 8); // ~4e-6 m/s² for Cd A/m = 0.044 m²/kg at 400 km
  });

  it('includes the cross-track wind of the rotating atmosphere on a polar orbit', () => {
    // Polar orbit over the equator: v along +z, the atmosphere moves at ω r along +y there, so
    // v_rel = (0, −ω r, v) and the drag, along −v_rel = (0, ω r, −v), has a +y component of
    // ω r / v times the along-track one.
    const r = R + 300_000;
    const v = 7700;
    const a: Vec3 = [0, 0, 0];
    createDragForce({ cd: 2, areaM2: 1, massKg: 100 }).acceleration(a, 0, Float64Array.of(r, 0, 0, 0, 0, v));
    expect(a[1] / a[2]).toBeCloseTo(-(OMEGA * r) / v, 12);
    expect(a[1]).toBeGreaterThan(0);
  });

  it('is zero at GEO (above the atmosphere model)', () => {
    const a: Vec3 = [1, 1, 1];
    createDragForce({ cd: 2.2, areaM2: 10, massKg: 500 }).acceleration(a, 0, Float64Array.of(42_164_000, 0, 0, 0, 3075, 0));
    expect(a).toEqual([0, 0, 0]);
  });

  it('refuses a non-positive area, naming areaM2', () => {
    expect(() => createDragForce({ cd: 2.2, areaM2: 0, massKg: 1 })).toThrow(
      expect.objectContaining({ details: expect.objectContaining({ field: 'areaM2' }) }),
    );
  });
});
