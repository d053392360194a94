import { describe, expect, it } from 'vitest';
import { EARTH_GM } from '../bodies/body-constants';
import { SrpError } from '../errors';
import {
  cartesianToKeplerian,
  createKeplerianElements,
  keplerianToCartesian,
  meanToTrueAnomaly,
  orbitalPeriod,
  propagateKepler,
  solveKeplerEquation,
  trueToMeanAnomaly,
  type KeplerianElements,
} from './kepler';

const MU = EARTH_GM; // source: IERS Conventions 2010, Table 1.1
const DEG = Math.PI / 180;

/** Smallest signed difference of two angles (rad). */
function angleDiff(x: number, y: number): number {
  const d = (x - y) % (2 * Math.PI);
  return d > Math.PI ? d - 2 * Math.PI : d < -Math.PI ? d + 2 * Math.PI : d;
}

function elements(a: number, e: number, iDeg: number, raanDeg: number, argpDeg: number, nuDeg: number): KeplerianElements {
  return {
    semiMajorAxisM: a,
    eccentricity: e,
    inclinationRad: iDeg * DEG,
    raanRad: raanDeg * DEG,
    argPeriapsisRad: argpDeg * DEG,
    trueAnomalyRad: nuDeg * DEG,
  };
}

function stateDistance(s1: ArrayLike<number>, s2: ArrayLike<number>): { dr: number; dv: number } {
  return {
    dr: Math.hypot(s1[0]! - s2[0]!, s1[1]! - s2[1]!, s1[2]! - s2[2]!),
    dv: Math.hypot(s1[3]! - s2[3]!, s1[4]! - s2[4]!, s1[5]! - s2[5]!),
  };
}

// Angles recovered by atan2 from a state: a few ulp of the orbit size, i.e. ~1e-15 rad; 1e-11 rad
// (0.07 mm on a GEO orbit) leaves room for the conditioning of ω and ν at e = 1e-3, where they
// are individually worth 1/e less.
const ANGLE_TOL = 1e-11;

describe('keplerianToCartesian / cartesianToKeplerian round trip', () => {
  it.each([
    // label, elements, which angles are defined, and what the free ones become
    ['circular equatorial (true longitude)', elements(42_164_170, 0, 0, 0, 0, 123)],
    ['circular equatorial retrograde (true longitude)', elements(7_000_000, 0, 180, 0, 0, 200)],
    ['circular inclined (argument of latitude)', elements(6_778_000, 0, 51.6, 300, 0, 45)],
    ['eccentric equatorial (longitude of periapsis)', elements(24_396_000, 0.73, 0, 0, 178, 10)],
    ['eccentric equatorial retrograde (longitude of periapsis)', elements(24_396_000, 0.3, 180, 0, 60, 250)],
    ['general Molniya-like', elements(26_600_000, 0.74, 63.4, 80, 270, 33)],
    ['general near-circular (e = 1e-3)', elements(7_078_000, 1e-3, 98.2, 10, 90, 359)],
    ['hyperbolic', elements(-20_000_000, 1.5, 30, 40, 50, 60)],
  ])('%s: elements → state → elements returns the elements', (_label, el) => {
    const state = keplerianToCartesian(new Float64Array(6), el, MU);
    const back = cartesianToKeplerian(createKeplerianElements(), state, MU);
    // a from the energy: relative 1e-12 (energy cancellation v²/2 − μ/r loses ~3 digits at most).
    expect(Math.abs(back.semiMajorAxisM - el.semiMajorAxisM)).toBeLessThan(1e-12 * Math.abs(el.semiMajorAxisM));
    expect(Math.abs(back.eccentricity - el.eccentricity)).toBeLessThan(1e-12);
    expect(Math.abs(angleDiff(back.inclinationRad, el.inclinationRad))).toBeLessThan(ANGLE_TOL);
    expect(Math.abs(angleDiff(back.raanRad, el.raanRad))).toBeLessThan(ANGLE_TOL);
    expect(Math.abs(angleDiff(back.argPeriapsisRad, el.argPeriapsisRad))).toBeLessThan(ANGLE_TOL);
    expect(Math.abs(angleDiff(back.trueAnomalyRad, el.trueAnomalyRad))).toBeLessThan(ANGLE_TOL);
  });

  it('a circular inclined orbit puts the satellite at the ascending node when u = 0 and at the highest point when u = 90°', () => {
    // source: definition of the argument of latitude (by hand): u = 0 → on the node line
    // (RAAN direction, z = 0, moving north); u = 90° → z = r sin i.
    const r = 7_000_000;
    const node = keplerianToCartesian(new Float64Array(6), elements(r, 0, 30, 90, 0, 0), MU);
    expect(Math.abs(node[0]!)).toBeLessThan(1e-6);
    expect(Math.abs(node[1]! - r)).toBeLessThan(1e-6);
    expect(Math.abs(node[2]!)).toBeLessThan(1e-6);
    expect(node[5]!).toBeGreaterThan(0);
    const top = keplerianToCartesian(new Float64Array(6), elements(r, 0, 30, 90, 0, 90), MU);
    expect(Math.abs(top[2]! - r * Math.sin(30 * DEG))).toBeLessThan(1e-6);
  });

  it('speeds follow the vis-viva equation', () => {
    // source: vis-viva v² = μ (2/r − 1/a) (any orbital mechanics text); 1e-13 relative rounding
    const el = elements(26_600_000, 0.74, 63.4, 80, 270, 33);
    const s = keplerianToCartesian(new Float64Array(6), el, MU);
    const r = Math.hypot(s[0]!, s[1]!, s[2]!);
    const v2 = s[3]! ** 2 + s[4]! ** 2 + s[5]! ** 2;
    expect(Math.abs(v2 - MU * (2 / r - 1 / el.semiMajorAxisM)) / v2).toBeLessThan(1e-13);
  });

  it.each([
    ['e = 1e-14 (below the circular threshold)', elements(7_000_000, 1e-14, 40, 20, 77, 10)],
    ['i = 1e-14 rad (below the equatorial threshold)', elements(7_000_000, 0.1, 1e-12, 20, 77, 10)],
    ['e = 1e-9, i = 1e-9 rad (just above both)', elements(7_000_000, 1e-9, 1e-7, 20, 77, 10)],
  ])('near-singular %s: state → elements → state reproduces the state', (_label, el) => {
    // Angles there are individually ill-defined, but the state must survive: position to 1 µm,
    // velocity to 1 nm/s (≈ 1e-13 relative).
    const state = keplerianToCartesian(new Float64Array(6), el, MU);
    const back = keplerianToCartesian(new Float64Array(6), cartesianToKeplerian(createKeplerianElements(), state, MU), MU);
    const { dr, dv } = stateDistance(state, back);
    expect(dr).toBeLessThan(1e-6);
    expect(dv).toBeLessThan(1e-9);
  });

  it('refuses a parabola, an ellipse with a < 0 and a hyperbolic anomaly past the asymptote, naming the field', () => {
    const fieldOf = (el: KeplerianElements): string => {
      try {
        keplerianToCartesian(new Float64Array(6), el, MU);
      } catch (error) {
        expect(error).toBeInstanceOf(SrpError);
        return (error as SrpError).details.field;
      }
      return 'none';
    };
    expect(fieldOf(elements(7e6, 1, 0, 0, 0, 0))).toBe('eccentricity');
    expect(fieldOf(elements(-7e6, 0.5, 0, 0, 0, 0))).toBe('semiMajorAxisM');
    expect(fieldOf(elements(-7e6, 2, 0, 0, 0, 150))).toBe('trueAnomalyRad');
    expect(fieldOf(elements(7e6, 0.1, 190, 0, 0, 0))).toBe('inclinationRad');
    expect(() => cartesianToKeplerian(createKeplerianElements(), [7e6, 0, 0, 1000, 0, 0], MU)).toThrow(SrpError);
  });
});

describe("solveKeplerEquation", () => {
  it('solves M = E − e sin E for e up to 0.999 and every M, checked by substitution and by bisection', () => {
    // Independent route: bisection on the monotonic E − e sin E − M (60 halvings of [−π, π]).
    for (const e of [0, 1e-9, 0.1, 0.5, 0.9, 0.99, 0.999]) {
      for (let M = -Math.PI; M <= Math.PI; M += 0.01) {
        const E = solveKeplerEquation(M, e);
        expect(Math.abs(E - e * Math.sin(E) - M)).toBeLessThan(1e-14);
        let lo = -Math.PI;
        let hi = Math.PI;
        for (let k = 0; k < 60; k += 1) {
          const mid = (lo + hi) / 2;
          if (mid - e * Math.sin(mid) - M < 0) lo = mid;
          else hi = mid;
        }
        // Near M = 0 at e → 1, E is ill-conditioned (dE/dM = 1/(1 − e cos E) up to 1000): 1e-11.
        expect(Math.abs(E - (lo + hi) / 2)).toBeLessThan(1e-11);
      }
    }
  });

  it('matches Vallado Example 2-1: M = 235.4°, e = 0.4 gives E = 220.512 074 8°', () => {
    // source: Vallado, Fundamentals of Astrodynamics and Applications, Example 2-1 (from memory:
    // E = 3.848 7 rad = 220.512 074 767 522°); 1e-6° is beyond the digits remembered.
    const E = solveKeplerEquation(235.4 * DEG, 0.4);
    expect(Math.abs(((E / DEG + 360) % 360) - 220.512074767522)).toBeLessThan(1e-6);
  });

  it('solves the hyperbolic equation M = e sinh H − H by substitution', () => {
    for (const e of [1.0001, 1.5, 3, 10]) {
      for (const M of [-100, -5, -0.3, 0, 1e-6, 0.7, 12, 1000]) {
        const H = solveKeplerEquation(M, e);
        expect(Math.abs(e * Math.sinh(H) - H - M)).toBeLessThan(1e-12 * Math.max(1, Math.abs(M)));
      }
    }
  });

  it('true → mean → true anomaly is the identity (ellipse and hyperbola)', () => {
    for (const e of [0, 0.3, 0.95]) {
      for (let nu = -3.1; nu < 3.1; nu += 0.1) {
        expect(Math.abs(angleDiff(meanToTrueAnomaly(trueToMeanAnomaly(nu, e), e), nu))).toBeLessThan(1e-12);
      }
    }
    for (let nu = -1.5; nu < 1.5; nu += 0.1) {
      expect(Math.abs(meanToTrueAnomaly(trueToMeanAnomaly(nu, 2), 2) - nu)).toBeLessThan(1e-12);
    }
  });
});

describe('propagateKepler', () => {
  it.each([
    ['circular equatorial GEO', elements(42_164_170, 0, 0, 0, 0, 10)],
    ['circular inclined LEO', elements(6_778_000, 0, 51.6, 300, 0, 45)],
    ['eccentric equatorial', elements(24_396_000, 0.73, 0, 0, 178, 10)],
    ['general Molniya-like', elements(26_600_000, 0.74, 63.4, 80, 270, 33)],
  ])('%s: one period later the state is back where it started', (_label, el) => {
    // Mean anomaly + 2π and back through the elements: 1e-9 relative in position (≈ 7 mm
    // on GEO) and velocity, ample over rounding yet 1e6 times below any real propagation error.
    const start = keplerianToCartesian(new Float64Array(6), el, MU);
    const end = propagateKepler(new Float64Array(6), start, orbitalPeriod(el.semiMajorAxisM, MU), MU);
    const r = Math.hypot(start[0]!, start[1]!, start[2]!);
    const v = Math.hypot(start[3]!, start[4]!, start[5]!);
    const { dr, dv } = stateDistance(start, end);
    expect(dr / r).toBeLessThan(1e-9);
    expect(dv / v).toBeLessThan(1e-9);
  });

  it('GEO (a = 42 164.17 km) has a period of one sidereal day, 86 164.1 s', () => {
    // source: sidereal day 86 164.0905 s (common practice); GEO radius 42 164.17 km (common practice)
    expect(Math.abs(orbitalPeriod(42_164_170, MU) - 86_164.0905)).toBeLessThan(0.1);
  });

  it.each([
    ['eccentric inclined orbit, 1/3 period', elements(26_600_000, 0.74, 63.4, 80, 270, 200), 14_000],
    ['hyperbolic flyby, 3 hours', elements(-20_000_000, 1.5, 30, 40, 50, -60), 10_800],
  ])('%s: agrees with a numerical RK4 integration of r̈ = −μ r/r³ to 1 m', (_label, el, dt) => {
    // Independent route: classical Runge–Kutta 4 at 0.5 s steps (error ∝ h⁴, well below 1 m here).
    const start = keplerianToCartesian(new Float64Array(6), el, MU);
    const analytic = propagateKepler(new Float64Array(6), start, dt, MU);
    const y = Array.from(start);
    const f = (s: number[]): number[] => {
      const r3 = Math.hypot(s[0]!, s[1]!, s[2]!) ** 3;
      return [s[3]!, s[4]!, s[5]!, (-MU * s[0]!) / r3, (-MU * s[1]!) / r3, (-MU * s[2]!) / r3];
    };
    const h = 0.5;
    for (let t = 0; t < dt - 1e-9; t += h) {
      const k1 = f(y);
      const k2 = f(y.map((v, i) => v + (h / 2) * k1[i]!));
      const k3 = f(y.map((v, i) => v + (h / 2) * k2[i]!));
      const k4 = f(y.map((v, i) => v + h * k3[i]!));
      for (let i = 0; i < 6; i += 1) y[i]! += (h / 6) * (k1[i]! + 2 * k2[i]! + 2 * k3[i]! + k4[i]!);
    }
    const { dr, dv } = stateDistance(analytic, y);
    expect(dr).toBeLessThan(1);
    expect(dv).toBeLessThan(1e-3);
  });

  it('propagates backwards too, and out may alias the input', () => {
    const el = elements(7_078_000, 1e-3, 98.2, 10, 90, 0);
    const start = keplerianToCartesian(new Float64Array(6), el, MU);
    const s = Float64Array.from(start);
    propagateKepler(s, s, 5000, MU);
    propagateKepler(s, s, -5000, MU);
    const { dr } = stateDistance(start, s);
    expect(dr).toBeLessThan(1e-5); // 1e-12 relative of 7e6 m, twice
  });
});
