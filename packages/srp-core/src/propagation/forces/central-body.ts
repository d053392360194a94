import { requirePositive } from '../../errors';
import type { Vec3 } from '../../math/vec3';
import type { ForceModel } from './force-model';

/**
 * Point-mass gravity of the central body, a = −μ r / |r|³.
 * @param mu gravitational parameter of the central body (m³/s²), > 0 (EARTH_GM, SUN_GM)
 * @param name force name in outputs; default 'central-body'
 * @throws SrpError naming `mu`
 */
export function createCentralBodyForce(mu: number, name = 'central-body'): ForceModel {
  requirePositive(mu, 'mu', 'm^3/s^2');
  return {
    name,
    acceleration(out: Vec3, _t: number, y: Float64Array): Vec3 {
      const x = y[0]!;
      const yy = y[1]!;
      const z = y[2]!;
      const r2 = x * x + yy * yy + z * z;
      const k = -mu / (r2 * Math.sqrt(r2));
      out[0] = k * x;
      out[1] = k * yy;
      out[2] = k * z;
      return out;
    },
  };
}
