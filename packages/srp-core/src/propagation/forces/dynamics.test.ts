import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../../math/vec3';
import { createCentralBodyForce } from './central-body';
import { createDynamics } from './dynamics';
import type { ForceModel } from './force-model';

const constant = (name: string, a: Vec3): ForceModel => ({
  name,
  acceleration(out: Vec3): Vec3 {
    out[0] = a[0];
    out[1] = a[1];
    out[2] = a[2];
    return out;
  },
});

describe('createDynamics', () => {
  it('writes the velocity and the sum of the forces into dydt', () => {
    const f = createDynamics([constant('a', [1, 2, 3]), constant('b', [0.5, -2, 10])]);
    const dydt = new Float64Array(6);
    f(dydt, 0, Float64Array.of(1, 2, 3, 4, 5, 6));
    expect([...dydt]).toEqual([4, 5, 6, 1.5, 0, 13]);
  });

  it('with the central body alone gives −μ r/|r|³ (Newton)', () => {
    // 3-4-5 triangle: |r| = 5e6 m; exact up to rounding, 1e-15 relative.
    const mu = 3.986004418e14;
    const f = createDynamics([createCentralBodyForce(mu)]);
    const dydt = new Float64Array(6);
    f(dydt, 0, Float64Array.of(3e6, 4e6, 0, 0, 0, 0));
    expect(dydt[3]! / ((-mu * 3e6) / 1.25e20) - 1).toBeCloseTo(0, 15);
    expect(dydt[4]! / ((-mu * 4e6) / 1.25e20) - 1).toBeCloseTo(0, 15);
  });

  it('with no forces is free flight', () => {
    const dydt = new Float64Array(6).fill(9);
    createDynamics([])(dydt, 0, Float64Array.of(1, 2, 3, 4, 5, 6));
    expect([...dydt]).toEqual([4, 5, 6, 0, 0, 0]);
  });
});
