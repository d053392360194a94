/**
 * The quaternion convention of Photon Ledger, written once here and used everywhere.
 *
 * - Layout `[w, x, y, z]`: the scalar part FIRST, then the vector part.
 * - Hamilton algebra (i² = j² = k² = ijk = -1), unit norm.
 * - An attitude quaternion `q` is the rotation that carries the inertial axes onto the body axes.
 *   Components transform as
 *       v_body     = conj(q) ⊗ v_inertial ⊗ q      (`rotateInertialToBody`)
 *       v_inertial = q ⊗ v_body ⊗ conj(q)          (`rotateBodyToInertial`)
 *   so the matrix R(q) whose columns are the body axes expressed in the inertial frame gives
 *   v_inertial = R v_body. The identity quaternion means body axes = inertial axes.
 * - Composition: if q1 carries frame A onto B and q2 carries B onto C (q2 expressed in B),
 *   then q1 ⊗ q2 carries A onto C.
 * - Interpolation: `slerpQuat` takes the shorter arc (q and -q are the same attitude).
 *
 * Source: the Hamilton convention and the frame-rotation formulas as in Sola, "Quaternion
 * kinematics for the error-state Kalman filter" (2017), sections 1-2 (from memory).
 */
import type { ReadonlyVec3, Vec3 } from '../math/vec3';

/** A quaternion `[w, x, y, z]`, scalar first. */
export type Quat = [w: number, x: number, y: number, z: number];
/** A quaternion the callee only reads. */
export type ReadonlyQuat = readonly [w: number, x: number, y: number, z: number];

/** Allocates a quaternion (the identity by default); not for hot paths. */
export function createQuat(w = 1, x = 0, y = 0, z = 0): Quat {
  return [w, x, y, z];
}

/** out = a ⊗ b (Hamilton product; safe when out aliases a or b). */
export function multiplyQuat(out: Quat, a: ReadonlyQuat, b: ReadonlyQuat): Quat {
  // Indexed reads, not array destructuring: V8 (Node 20) allocates an iterator for the latter.
  const aw = a[0], ax = a[1], ay = a[2], az = a[3];
  const bw = b[0], bx = b[1], by = b[2], bz = b[3];
  out[0] = aw * bw - ax * bx - ay * by - az * bz;
  out[1] = aw * bx + ax * bw + ay * bz - az * by;
  out[2] = aw * by - ax * bz + ay * bw + az * bx;
  out[3] = aw * bz + ax * by - ay * bx + az * bw;
  return out;
}

/** out = conj(q). */
export function conjugateQuat(out: Quat, q: ReadonlyQuat): Quat {
  out[0] = q[0];
  out[1] = -q[1];
  out[2] = -q[2];
  out[3] = -q[3];
  return out;
}

/** out = q / |q|; returns the identity for a zero quaternion (callers that must refuse it check first). */
export function normalizeQuat(out: Quat, q: ReadonlyQuat): Quat {
  // sqrt of the sum of squares, not Math.hypot (~20× slower in V8): no overflow below 1e150.
  const n = Math.sqrt(q[0] * q[0] + q[1] * q[1] + q[2] * q[2] + q[3] * q[3]);
  if (!(n > 0)) {
    out[0] = 1;
    out[1] = out[2] = out[3] = 0;
    return out;
  }
  out[0] = q[0] / n;
  out[1] = q[1] / n;
  out[2] = q[2] / n;
  out[3] = q[3] / n;
  return out;
}

/**
 * Body-frame components of an inertial vector: out = conj(q) ⊗ v ⊗ q, i.e. R(q)ᵀ v.
 * Allocates nothing; safe when out aliases v.
 */
export function rotateInertialToBody(out: Vec3, q: ReadonlyQuat, vInertial: ReadonlyVec3): Vec3 {
  return rotate(out, q[0], -q[1], -q[2], -q[3], vInertial);
}

/**
 * Inertial components of a body vector: out = q ⊗ v ⊗ conj(q), i.e. R(q) v.
 * Allocates nothing; safe when out aliases v.
 */
export function rotateBodyToInertial(out: Vec3, q: ReadonlyQuat, vBody: ReadonlyVec3): Vec3 {
  return rotate(out, q[0], q[1], q[2], q[3], vBody);
}

/** out = p ⊗ v ⊗ conj(p) for unit p = (w, x, y, z), via v + 2w (u × v) + 2 u × (u × v). */
function rotate(out: Vec3, w: number, x: number, y: number, z: number, v: ReadonlyVec3): Vec3 {
  const vx = v[0];
  const vy = v[1];
  const vz = v[2];
  // t = 2 (u × v)
  const tx = 2 * (y * vz - z * vy);
  const ty = 2 * (z * vx - x * vz);
  const tz = 2 * (x * vy - y * vx);
  out[0] = vx + w * tx + (y * tz - z * ty);
  out[1] = vy + w * ty + (z * tx - x * tz);
  out[2] = vz + w * tz + (x * ty - y * tx);
  return out;
}

/** The rotation by `angle` (rad) about the unit `axis` (right-handed). */
export function quatFromAxisAngle(out: Quat, axis: ReadonlyVec3, angle: number): Quat {
  const h = angle / 2;
  const s = Math.sin(h);
  out[0] = Math.cos(h);
  out[1] = axis[0] * s;
  out[2] = axis[1] * s;
  out[3] = axis[2] * s;
  return out;
}

/**
 * The attitude whose body x, y, z axes have the given inertial components (the columns of R).
 * The axes must be orthonormal and right-handed. Shepperd's method: pick the largest of the
 * four squared components to avoid dividing by a small number.
 * Source: Shepperd, "Quaternion from rotation matrix", J. Guidance and Control 1(3), 1978 (from memory).
 */
export function quatFromBodyAxes(out: Quat, xAxis: ReadonlyVec3, yAxis: ReadonlyVec3, zAxis: ReadonlyVec3): Quat {
  // R = [x y z] (columns); Rij = row i, column j.
  const r00 = xAxis[0], r10 = xAxis[1], r20 = xAxis[2];
  const r01 = yAxis[0], r11 = yAxis[1], r21 = yAxis[2];
  const r02 = zAxis[0], r12 = zAxis[1], r22 = zAxis[2];
  const trace = r00 + r11 + r22;
  if (trace >= r00 && trace >= r11 && trace >= r22) {
    const s = 2 * Math.sqrt(1 + trace);
    out[0] = s / 4;
    out[1] = (r21 - r12) / s;
    out[2] = (r02 - r20) / s;
    out[3] = (r10 - r01) / s;
  } else if (r00 >= r11 && r00 >= r22) {
    const s = 2 * Math.sqrt(1 + r00 - r11 - r22);
    out[0] = (r21 - r12) / s;
    out[1] = s / 4;
    out[2] = (r01 + r10) / s;
    out[3] = (r02 + r20) / s;
  } else if (r11 >= r22) {
    const s = 2 * Math.sqrt(1 + r11 - r00 - r22);
    out[0] = (r02 - r20) / s;
    out[1] = (r01 + r10) / s;
    out[2] = s / 4;
    out[3] = (r12 + r21) / s;
  } else {
    const s = 2 * Math.sqrt(1 + r22 - r00 - r11);
    out[0] = (r10 - r01) / s;
    out[1] = (r02 + r20) / s;
    out[2] = (r12 + r21) / s;
    out[3] = s / 4;
  }
  return normalizeQuat(out, out);
}

/**
 * Spherical linear interpolation between unit quaternions, t in [0, 1], along the shorter arc.
 * Falls back to normalised linear interpolation when the two are within ~1e-6 rad.
 * Source: Shoemake, "Animating rotation with quaternion curves", SIGGRAPH 1985 (from memory).
 */
export function slerpQuat(out: Quat, a: ReadonlyQuat, b: ReadonlyQuat, t: number): Quat {
  let cos = a[0] * b[0] + a[1] * b[1] + a[2] * b[2] + a[3] * b[3];
  let sign = 1;
  if (cos < 0) {
    cos = -cos;
    sign = -1;
  }
  let wa: number;
  let wb: number;
  if (cos > 1 - 1e-12) {
    wa = 1 - t;
    wb = t;
  } else {
    // cos < 1 here, so acos and the division are safe.
    const theta = Math.acos(cos);
    const sin = Math.sin(theta);
    wa = Math.sin((1 - t) * theta) / sin;
    wb = Math.sin(t * theta) / sin;
  }
  wb *= sign;
  out[0] = wa * a[0] + wb * b[0];
  out[1] = wa * a[1] + wb * b[1];
  out[2] = wa * a[2] + wb * b[2];
  out[3] = wa * a[3] + wb * b[3];
  return normalizeQuat(out, out);
}
