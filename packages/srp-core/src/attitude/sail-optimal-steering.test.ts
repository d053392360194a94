import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../math/vec3';
import { createSrpForce } from '../propagation/forces/srp-force';
import { compileVehicle } from '../vehicles/compile-vehicle';
import { AU_M, C, DEG, S0 } from '../vehicles/vehicle-test-helpers';
import { createSailConeClockLaw } from './sail-cone-clock-law';
import { createLocallyOptimalSteering, optimalConeAngle } from './sail-optimal-steering';

/** source: JPL DE405 (Standish 1998), from memory */
const MU_SUN = 1.32712440018e20;

const sail = compileVehicle({
  kind: 'sail',
  name: 'ideal sail',
  massKg: 100,
  centreOfMassM: [0, 0, 0],
  areaM2: 1600,
  normal: [1, 0, 0],
  centroidM: [0, 0, 0],
  optics: 'ideal',
});
/** Ideal-sail characteristic acceleration 2 P A / m at 1 au (m/s²): 2 × 4.54e-6 × 16 = 1.45e-4. */
const A_C = (2 * (S0 / C) * 1600) / 100;

function sailForce(law: ReturnType<typeof createSailConeClockLaw>) {
  return createSrpForce({ vehicle: sail, attitude: law, shadowModel: 'none', centralBody: 'sun', ephemeris: null });
}

/** A circular heliocentric orbit at 1 au, in the EQJ plane tilted by 23.4° about x (like the ecliptic). */
const ecl = 23.4 * DEG;
const V_CIRC = Math.sqrt(MU_SUN / AU_M);
const Y0 = Float64Array.of(AU_M, 0, 0, 0, V_CIRC * Math.cos(ecl), V_CIRC * Math.sin(ecl));

describe('optimalConeAngle (ideal sail)', () => {
  it('is 35.26° for a direction perpendicular to the Sun line', () => {
    // tan α* = √8/4 = 1/√2 at θ = 90°. Source: McInnes, Solar Sailing (1999), §4.4 (from memory);
    // 35.26° is the classical value quoted with it.
    expect(optimalConeAngle(90 * DEG)).toBeCloseTo(Math.atan(Math.SQRT1_2), 15);
    expect(optimalConeAngle(90 * DEG) / DEG).toBeCloseTo(35.26, 2);
  });

  it('maximises cos²α cos(θ − α) over a brute-force scan of cone angles, for every θ', () => {
    // Scan step 1e-5 rad: the scan's best α is within half a step of α*, and its value at most
    // ~f''·(5e-6)² ≈ 1e-11 below the true maximum; α* must be at least as good (−1e-15 rounding).
    for (const thetaDeg of [1, 10, 30, 60, 90, 120, 150, 170, 179]) {
      const theta = thetaDeg * DEG;
      const f = (a: number): number => Math.cos(a) ** 2 * Math.cos(theta - a);
      const star = optimalConeAngle(theta);
      let best = -Infinity;
      let bestAlpha = 0;
      for (let a = 0; a <= Math.PI / 2; a += 1e-5) {
        const v = f(a);
        if (v > best) {
          best = v;
          bestAlpha = a;
        }
      }
      expect(f(star)).toBeGreaterThanOrEqual(best - 1e-15);
      expect(Math.abs(star - bestAlpha)).toBeLessThan(1e-5);
      // And it satisfies the stationarity condition tan(θ − α) = 2 tan α.
      expect(Math.tan(theta - star) - 2 * Math.tan(star)).toBeCloseTo(0, 9);
    }
  });

  it('is 0 towards the anti-Sun line and 90° (edge-on) towards the Sun', () => {
    expect(optimalConeAngle(0)).toBe(0);
    expect(optimalConeAngle(Math.PI)).toBeCloseTo(Math.PI / 2, 15);
  });
});

describe('createLocallyOptimalSteering', () => {
  it('on a circular heliocentric orbit tilts the sail 35.26° prograde to raise and retrograde to lower', () => {
    const angles = { coneRad: 0, clockRad: 0 };
    const r: Vec3 = [Y0[0]!, Y0[1]!, Y0[2]!];
    const v: Vec3 = [Y0[3]!, Y0[4]!, Y0[5]!];
    createLocallyOptimalSteering({ goal: 'raise' })(angles, 0, r, v, [0, 0, 0]);
    expect(angles.coneRad / DEG).toBeCloseTo(35.2644, 4);
    expect(angles.clockRad).toBeCloseTo(Math.PI / 2, 12); // δ = 90°: prograde (sail-cone-clock-law.ts)
    createLocallyOptimalSteering({ goal: 'lower', along: 'transverse' })(angles, 0, r, v, [0, 0, 0]);
    expect(angles.coneRad / DEG).toBeCloseTo(35.2644, 4);
    expect(angles.clockRad).toBeCloseTo(-Math.PI / 2, 12);
  });

  it("gives the largest acceleration along the velocity of any cone and clock angle (scan)", () => {
    // Scan: cone 0 … 90° by 0.25°, clock 0 … 360° by 2°; the law's component must be at least
    // the scan's best (less 1e-12 relative: rounding) and the scan's best within 1e-4 of it
    // (second order in the 0.125° and 1° half-steps).
    const vHat = [Y0[3]! / V_CIRC, Y0[4]! / V_CIRC, Y0[5]! / V_CIRC];
    const a: Vec3 = [0, 0, 0];
    const along = (force: ReturnType<typeof sailForce>, y: Float64Array): number => {
      force.acceleration(a, 0, y);
      return a[0] * vHat[0]! + a[1] * vHat[1]! + a[2] * vHat[2]!;
    };
    const optimal = along(sailForce(createSailConeClockLaw({ normalAxisBody: [1, 0, 0], steering: createLocallyOptimalSteering({ goal: 'raise' }) })), Y0);
    let best = -Infinity;
    for (let cone = 0; cone <= 90; cone += 0.25) {
      for (let clock = 0; clock < 360; clock += 2) {
        const law = createSailConeClockLaw({ normalAxisBody: [1, 0, 0], coneRad: cone * DEG, clockRad: clock * DEG });
        best = Math.max(best, along(sailForce(law), Y0));
      }
    }
    expect(optimal).toBeGreaterThanOrEqual(best * (1 - 1e-12));
    expect(optimal / best).toBeLessThan(1 + 1e-4);
    // Value: a_c cos²α* sin α* = a_c (2/3)(1/√3) = 0.3849 a_c at 1 au.
    expect(optimal / A_C).toBeCloseTo((2 / 3) / Math.sqrt(3), 12);
  });

  it("its semi-major-axis rate on a circular orbit equals the analytical 2β√(μ/r) cos²α* sin α*", () => {
    // Gauss: da/dt = 2 a² (v · f)/μ (Vallado 2013 §9.4 / McInnes 1999 §4.3, from memory). With the
    // ideal sail f = β (μ/r²) cos²α n, on a circular orbit v · f = β (μ/r²) v cos²α sin α*, so
    // da/dt = 2 β √(μ/r) cos²α* sin α* with cos²α* sin α* = 2/(3√3) (McInnes 1999, §4.4 locally
    // optimal rate; from memory). Rounding only: 1e-12 relative.
    const beta = A_C / (MU_SUN / AU_M ** 2);
    const analytic = 2 * beta * Math.sqrt(MU_SUN / AU_M) * (2 / (3 * Math.sqrt(3)));
    for (const goal of ['raise', 'lower'] as const) {
      const force = sailForce(createSailConeClockLaw({ normalAxisBody: [1, 0, 0], steering: createLocallyOptimalSteering({ goal }) }));
      const a: Vec3 = [0, 0, 0];
      force.acceleration(a, 0, Y0);
      const vDotF = a[0] * Y0[3]! + a[1] * Y0[4]! + a[2] * Y0[5]!;
      const dadt = (2 * AU_M * AU_M * vDotF) / MU_SUN;
      expect(dadt / (goal === 'raise' ? analytic : -analytic)).toBeCloseTo(1, 12);
    }
    // 1.45e-4 m/s² sail (β = 0.0245): 2β × 0.385 × 29.8 km/s ≈ 0.56 km/s of semi-major-axis rate.
    expect(analytic).toBeGreaterThan(500);
    expect(analytic).toBeLessThan(600);
  });

  it("refuses an unknown goal, naming goal", () => {
    expect(() => createLocallyOptimalSteering({ goal: 'up' as 'raise' })).toThrow(
      expect.objectContaining({ details: expect.objectContaining({ field: 'goal' }) }),
    );
  });
});
