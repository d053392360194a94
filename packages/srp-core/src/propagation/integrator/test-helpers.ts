/**
 * Test and benchmark systems for the integrator (not library code: the purity test skips
 * `test-helpers` files).
 */
import type { Derivative } from './dop853';

/** Two-body point-mass gravity: y = [r (m), v (m/s)], dy/dt = [v, −μ r/|r|³]. */
export function twoBody(mu: number): Derivative {
  return (dydt, _t, y) => {
    const x = y[0]!;
    const yy = y[1]!;
    const z = y[2]!;
    const r2 = x * x + yy * yy + z * z;
    const k = -mu / (r2 * Math.sqrt(r2));
    dydt[0] = y[3]!;
    dydt[1] = y[4]!;
    dydt[2] = y[5]!;
    dydt[3] = k * x;
    dydt[4] = k * yy;
    dydt[5] = k * z;
  };
}

/** Specific orbital energy v²/2 − μ/r (J/kg). */
export function orbitalEnergy(y: Float64Array, mu: number): number {
  const r = Math.hypot(y[0]!, y[1]!, y[2]!);
  return 0.5 * (y[3]! ** 2 + y[4]! ** 2 + y[5]! ** 2) - mu / r;
}

/** Specific angular momentum r × v (m²/s). */
export function angularMomentum(y: Float64Array): [number, number, number] {
  return [y[1]! * y[5]! - y[2]! * y[4]!, y[2]! * y[3]! - y[0]! * y[5]!, y[0]! * y[4]! - y[1]! * y[3]!];
}

/** Distance between the positions of two states (m). */
export function positionDistance(a: ArrayLike<number>, b: ArrayLike<number>): number {
  return Math.hypot(a[0]! - b[0]!, a[1]! - b[1]!, a[2]! - b[2]!);
}

/** State at periapsis of an orbit (a, e) whose plane is tilted by `inclinationRad` about x (m, m/s). */
export function periapsisState(mu: number, semiMajorAxisM: number, eccentricity: number, inclinationRad: number): Float64Array {
  const rp = semiMajorAxisM * (1 - eccentricity);
  const vp = Math.sqrt((mu * (1 + eccentricity)) / rp);
  return new Float64Array([rp, 0, 0, 0, vp * Math.cos(inclinationRad), vp * Math.sin(inclinationRad)]);
}
