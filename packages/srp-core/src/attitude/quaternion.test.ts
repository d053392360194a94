import { describe, expect, it } from 'vitest';
import * as math from 'mathjs';
import {
  createQuat,
  multiplyQuat,
  quatFromAxisAngle,
  quatFromBodyAxes,
  rotateBodyToInertial,
  rotateInertialToBody,
  slerpQuat,
} from './quaternion';
import type { Vec3 } from '../math/vec3';

// Tolerance 1e-12: a handful of double-precision operations on unit-size values.
const TOL = 12;

describe('quaternion convention', () => {
  it('a 90° turn about inertial z puts the body x axis along inertial y', () => {
    const q = quatFromAxisAngle(createQuat(), [0, 0, 1], Math.PI / 2);
    const xBodyInInertial = rotateBodyToInertial([0, 0, 0], q, [1, 0, 0]);
    expect(xBodyInInertial[0]).toBeCloseTo(0, TOL);
    expect(xBodyInInertial[1]).toBeCloseTo(1, TOL);
    // The inertial y axis seen from the body is then body +x.
    const yInertialInBody = rotateInertialToBody([0, 0, 0], q, [0, 1, 0]);
    expect(yInertialInBody[0]).toBeCloseTo(1, TOL);
  });

  it('rotations agree with the rotation matrix built by mathjs (source: general-purpose reference library)', () => {
    const axis: Vec3 = [0.3, -0.5, 0.8];
    const n = Math.hypot(...axis);
    const u = axis.map((c) => c / n) as Vec3;
    const angle = 1.234;
    const q = quatFromAxisAngle(createQuat(), u, angle);
    // Rodrigues' rotation matrix R = I cos θ + sin θ [u]x + (1 - cos θ) u uᵀ, built with mathjs.
    const ux = math.matrix([[0, -u[2], u[1]], [u[2], 0, -u[0]], [-u[1], u[0], 0]]);
    const uuT = math.multiply(math.matrix([[u[0]], [u[1]], [u[2]]]), math.matrix([u]));
    const R = math.add(
      math.add(math.multiply(math.identity(3), Math.cos(angle)), math.multiply(ux, Math.sin(angle))),
      math.multiply(uuT, 1 - Math.cos(angle)),
    ) as math.Matrix;
    const v: Vec3 = [1.5, -2, 0.25];
    const expected = (math.multiply(R, v) as math.Matrix).toArray() as number[];
    const got = rotateBodyToInertial([0, 0, 0], q, v);
    got.forEach((c, i) => expect(c).toBeCloseTo(expected[i]!, TOL));
    const back = rotateInertialToBody([0, 0, 0], q, got);
    back.forEach((c, i) => expect(c).toBeCloseTo(v[i]!, TOL));
  });

  it('building from body axes gives back the quaternion that produced them, for all four Shepperd branches', () => {
    for (const [axis, angle] of [
      [[0, 0, 1], 0.2],
      [[1, 0, 0], 3.0],
      [[0, 1, 0], 3.0],
      [[0, 0, 1], 3.0],
    ] as [Vec3, number][]) {
      const q = quatFromAxisAngle(createQuat(), axis, angle);
      const x = rotateBodyToInertial([0, 0, 0], q, [1, 0, 0]);
      const y = rotateBodyToInertial([0, 0, 0], q, [0, 1, 0]);
      const z = rotateBodyToInertial([0, 0, 0], q, [0, 0, 1]);
      const r = quatFromBodyAxes(createQuat(), x, y, z);
      const sign = Math.sign(r[0] * q[0] + r[1] * q[1] + r[2] * q[2] + r[3] * q[3]);
      r.forEach((c, i) => expect(sign * c).toBeCloseTo(q[i]!, TOL));
    }
  });

  it('composition q1 ⊗ q2 applies q1 then q2 about the already-turned axes', () => {
    const q1 = quatFromAxisAngle(createQuat(), [0, 0, 1], Math.PI / 2);
    const q2 = quatFromAxisAngle(createQuat(), [1, 0, 0], Math.PI / 2);
    const q = multiplyQuat(createQuat(), q1, q2);
    const zBody = rotateBodyToInertial([0, 0, 0], q, [0, 0, 1]);
    // Body z after q1 is inertial z; rotating about body x (= inertial y) by +90° sends z to +x.
    expect(zBody[0]).toBeCloseTo(1, TOL);
    expect(zBody[2]).toBeCloseTo(0, TOL);
  });

  it('slerp halfway between identity and a 120° turn is the 60° turn, and takes the short arc for -q', () => {
    const a = createQuat();
    const b = quatFromAxisAngle(createQuat(), [0, 1, 0], (2 * Math.PI) / 3);
    const mid = slerpQuat(createQuat(), a, b, 0.5);
    const expected = quatFromAxisAngle(createQuat(), [0, 1, 0], Math.PI / 3);
    mid.forEach((c, i) => expect(c).toBeCloseTo(expected[i]!, TOL));
    const negB = b.map((c) => -c) as typeof b;
    const mid2 = slerpQuat(createQuat(), a, negB, 0.5);
    mid2.forEach((c, i) => expect(c).toBeCloseTo(expected[i]!, TOL));
  });
});
