/**
 * Test-only vector helpers for the attitude tests, written independently of the code under test.
 */
import { expect } from 'vitest';
import type { ReadonlyVec3 } from '../math/vec3';
import type { ReadonlyQuat } from './quaternion';

/**
 * Independent check of the product convention (quaternion.ts header): v_inertial = q ⊗ (0, v) ⊗ conj(q),
 * written out with the Hamilton product rather than calling the code under test.
 */
export function bodyToInertial(q: ReadonlyQuat, v: ReadonlyVec3): [number, number, number] {
  const [w, x, y, z] = q;
  // p = q ⊗ (0, v)
  const pw = -x * v[0] - y * v[1] - z * v[2];
  const px = w * v[0] + y * v[2] - z * v[1];
  const py = w * v[1] - x * v[2] + z * v[0];
  const pz = w * v[2] + x * v[1] - y * v[0];
  // p ⊗ conj(q), vector part
  return [
    -pw * x + px * w - py * z + pz * y,
    -pw * y + px * z + py * w - pz * x,
    -pw * z - px * y + py * x + pz * w,
  ];
}
export const cross = (a: ReadonlyVec3, b: ReadonlyVec3): [number, number, number] => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];
export const unit = (a: ReadonlyVec3): [number, number, number] => {
  const n = Math.hypot(a[0], a[1], a[2]);
  return [a[0] / n, a[1] / n, a[2] / n];
};
export const dot = (a: ReadonlyVec3, b: ReadonlyVec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
export const sub = (a: ReadonlyVec3, b: ReadonlyVec3): [number, number, number] => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
/** Each component within `tol` of the expected one. */
export function expectVec(actual: ReadonlyVec3, expected: ReadonlyVec3, tol: number): void {
  for (let i = 0; i < 3; i += 1) expect(Math.abs(actual[i]! - expected[i]!)).toBeLessThan(tol);
}
