/**
 * A 3-vector of SI quantities. The frame is named by the variable that holds it (`sunDirBody`).
 * Functions take the output first and return it; only `createVec3` allocates.
 */
export type Vec3 = [x: number, y: number, z: number];

/** A 3-vector the callee only reads. */
export type ReadonlyVec3 = readonly [x: number, y: number, z: number];

/** Allocates a new vector (not for hot paths). */
export function createVec3(x = 0, y = 0, z = 0): Vec3 {
  return [x, y, z];
}

/** Writes the components into `out`. */
export function setVec3(out: Vec3, x: number, y: number, z: number): Vec3 {
  out[0] = x;
  out[1] = y;
  out[2] = z;
  return out;
}

/** Scalar product a · b (product of the operands' units). */
export function dotVec3(a: ReadonlyVec3, b: ReadonlyVec3): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

/** Euclidean norm |a| (unit of a). */
export function normVec3(a: ReadonlyVec3): number {
  return Math.hypot(a[0], a[1], a[2]);
}

/** out = a + b. */
export function addVec3(out: Vec3, a: ReadonlyVec3, b: ReadonlyVec3): Vec3 {
  out[0] = a[0] + b[0];
  out[1] = a[1] + b[1];
  out[2] = a[2] + b[2];
  return out;
}

/** out = a - b. */
export function subVec3(out: Vec3, a: ReadonlyVec3, b: ReadonlyVec3): Vec3 {
  out[0] = a[0] - b[0];
  out[1] = a[1] - b[1];
  out[2] = a[2] - b[2];
  return out;
}

/** out = a · k. */
export function scaleVec3(out: Vec3, a: ReadonlyVec3, k: number): Vec3 {
  out[0] = a[0] * k;
  out[1] = a[1] * k;
  out[2] = a[2] * k;
  return out;
}

/** out = a × b (safe when out aliases a or b). */
export function crossVec3(out: Vec3, a: ReadonlyVec3, b: ReadonlyVec3): Vec3 {
  const x = a[1] * b[2] - a[2] * b[1];
  const y = a[2] * b[0] - a[0] * b[2];
  const z = a[0] * b[1] - a[1] * b[0];
  out[0] = x;
  out[1] = y;
  out[2] = z;
  return out;
}

/** out = a / |a|; leaves a zero vector zero (callers that must refuse it check the norm first). */
export function normalizeVec3(out: Vec3, a: ReadonlyVec3): Vec3 {
  const n = Math.hypot(a[0], a[1], a[2]);
  const k = n > 0 ? 1 / n : 0;
  out[0] = a[0] * k;
  out[1] = a[1] * k;
  out[2] = a[2] * k;
  return out;
}

/** Copies a into out. */
export function copyVec3(out: Vec3, a: ReadonlyVec3): Vec3 {
  out[0] = a[0];
  out[1] = a[1];
  out[2] = a[2];
  return out;
}
