import type { Vec3 } from '../../math/vec3';
import type { ForceDerivative, ForceModel } from './force-model';

/**
 * The equations of motion of a point mass under a sum of forces, as the integrator's Derivative:
 * dr/dt = v, dv/dt = Σ aᵢ(t, y). Allocates the scratch vector once; evaluation allocates nothing.
 * @param forces the force models to sum (in any order; the central body's point mass is one of them)
 * @returns f(dydt, t, y) writing [vx, vy, vz, ax, ay, az] (m/s, m/s²) into dydt
 */
export function createDynamics(forces: readonly ForceModel[]): ForceDerivative {
  const list = forces.slice();
  const n = list.length;
  const a: Vec3 = [0, 0, 0];
  return (dydt: Float64Array, t: number, y: Float64Array): void => {
    let ax = 0;
    let ay = 0;
    let az = 0;
    for (let i = 0; i < n; i += 1) {
      list[i]!.acceleration(a, t, y);
      ax += a[0];
      ay += a[1];
      az += a[2];
    }
    dydt[0] = y[3]!;
    dydt[1] = y[4]!;
    dydt[2] = y[5]!;
    dydt[3] = ax;
    dydt[4] = ay;
    dydt[5] = az;
  };
}
