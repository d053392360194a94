/**
 * Helpers for the vehicle tests (not exported from the package). Reference constants are
 * written out from their published sources, not taken from the code under test.
 */
import { expect } from 'vitest';
import type { ReadonlyVec3 } from '../math/vec3';

/** source: IAU 2012 Resolution B2 */
export const AU_M = 149_597_870_700;
/** source: IAU 2015 Resolution B3 */
export const S0 = 1361;
/** source: SI Brochure, 9th edition (exact) */
export const C = 299_792_458;
/** Radiation pressure at 1 au (Pa), S0 / c ≈ 4.5398e-6. */
export const P_1AU = S0 / C;
export const DEG = Math.PI / 180;

/** Each component within `relTol` × |expected| (or `absFloor` when expected is zero). */
export function expectVecClose(
  actual: ArrayLike<number>,
  expected: ReadonlyVec3,
  relTol: number,
  absFloor = 0,
): void {
  const bound = Math.max(relTol * Math.hypot(expected[0], expected[1], expected[2]), absFloor);
  for (let k = 0; k < 3; k += 1) {
    expect(Math.abs(actual[k]! - expected[k]!), `component ${k}: ${actual[k]} vs ${expected[k]}`).toBeLessThanOrEqual(
      bound,
    );
  }
}

/** Matches an SrpError with this code whose details name `field`. */
export function srpErrorFor(code: string, field: string): unknown {
  return expect.objectContaining({ name: 'SrpError', code, details: expect.objectContaining({ field }) });
}

/** Unit vector at angle `theta` (rad) from +z towards +x. */
export function inXz(theta: number): [number, number, number] {
  return [Math.sin(theta), 0, Math.cos(theta)];
}

export function norm(v: ArrayLike<number>): number {
  return Math.hypot(v[0]!, v[1]!, v[2]!);
}

export function dot(a: ArrayLike<number>, b: ArrayLike<number>): number {
  return a[0]! * b[0]! + a[1]! * b[1]! + a[2]! * b[2]!;
}

export function cross(a: ArrayLike<number>, b: ArrayLike<number>): [number, number, number] {
  return [a[1]! * b[2]! - a[2]! * b[1]!, a[2]! * b[0]! - a[0]! * b[2]!, a[0]! * b[1]! - a[1]! * b[0]!];
}
