/**
 * Sun tracking of a plate about one body axis (a solar-array drive).
 *
 * The plate's normal turns right-handedly about the unit drive axis a by the drive angle φ from
 * its reference normal n0:
 *
 *   n(φ) = p + cos φ u + sin φ b,   p = a (a · n0),  u = n0 - p,  b = a × n0.
 *
 * The drive brings the Sun as close to the normal as the angle limits allow: n · s =
 * p · s + R cos(φ - φ*), R = hypot(u · s, b · s), is largest at φ* = atan2(b · s, u · s); when φ*
 * lies outside [min, max] the drive stops at the limit nearer to φ* (on the circle), which is
 * where n · s is largest within the limits. With the Sun along the axis (R = 0) every angle is as
 * good and the drive rests at angle 0, or at the limit nearest 0.
 *
 * The drive axis runs through the plate's centroid (the centre line of the panel), so the
 * centroid does not move as the plate turns. The evaluation uses no trigonometry: cos φ*, sin φ*
 * are (u · s, b · s) / R and the limit test compares cosines against the window's half-width.
 */
import { SrpError } from '../errors';
import type { ReadonlyVec3, Vec3 } from '../math/vec3';
import { TRACKING_STRIDE } from './compiled-vehicle';
import type { CompiledVehicle } from './compiled-vehicle';

// Layout of one row of `CompiledVehicle.tracking`:
// 0-2 p, 3-5 u, 6-8 b, 9-10 cos/sin of the window centre c = (min + max)/2,
// 11 cos of the half-width h = (max - min)/2 (-2 when unlimited, so the test always passes),
// 12-13 cos/sin min, 14-15 cos/sin max, 16-17 cos/sin of the rest angle.

/** R² below this means the Sun is along the drive axis to ~1e-15 rad: any drive angle will do. */
const AXIS_ALIGNED_R2 = 1e-30;

/**
 * Fills one row of tracking geometry.
 * @param out the `tracking` array of the vehicle being compiled
 * @param row surface index
 * @param normal unit reference normal n0, body frame
 * @param axis unit drive axis a, body frame (not parallel to n0)
 * @param limitsRad [min, max] drive angles (rad), checked by the caller; undefined for no limits
 */
export function packSunTracking(
  out: Float64Array,
  row: number,
  normal: ReadonlyVec3,
  axis: ReadonlyVec3,
  limitsRad: readonly [number, number] | undefined,
): void {
  const o = row * TRACKING_STRIDE;
  const an = axis[0] * normal[0] + axis[1] * normal[1] + axis[2] * normal[2];
  for (let k = 0; k < 3; k += 1) {
    out[o + k] = axis[k]! * an;
    out[o + 3 + k] = normal[k]! - axis[k]! * an;
  }
  out[o + 6] = axis[1] * normal[2] - axis[2] * normal[1];
  out[o + 7] = axis[2] * normal[0] - axis[0] * normal[2];
  out[o + 8] = axis[0] * normal[1] - axis[1] * normal[0];
  if (limitsRad === undefined) {
    out[o + 9] = 1;
    out[o + 10] = 0;
    out[o + 11] = -2;
    out.fill(0, o + 12, o + 16);
    out[o + 16] = 1;
    out[o + 17] = 0;
    return;
  }
  const [min, max] = limitsRad;
  const centre = (min + max) / 2;
  const half = (max - min) / 2;
  const cosC = Math.cos(centre);
  const sinC = Math.sin(centre);
  const cosH = Math.cos(half);
  out[o + 9] = cosC;
  out[o + 10] = sinC;
  out[o + 11] = cosH;
  out[o + 12] = Math.cos(min);
  out[o + 13] = Math.sin(min);
  out[o + 14] = Math.cos(max);
  out[o + 15] = Math.sin(max);
  // Rest at 0 if the window holds it (cos(0 - c) ≥ cos h), else at the nearer limit.
  const rest = cosC >= cosH ? 0 : -sinC > 0 ? max : min;
  out[o + 16] = Math.cos(rest);
  out[o + 17] = Math.sin(rest);
}

/**
 * Writes the unit normal of a tracking surface for the Sun direction (sx, sy, sz) into
 * `out[0..2]`; no checks, no allocation. `evaluateSrp` carries an inlined copy of these lines
 * (a test holds the two to the same answers).
 */
export function trackNormalInto(
  out: Float64Array,
  g: Float64Array,
  row: number,
  sx: number,
  sy: number,
  sz: number,
): void {
  const o = row * TRACKING_STRIDE;
  const ux = g[o + 3]!;
  const uy = g[o + 4]!;
  const uz = g[o + 5]!;
  const bx = g[o + 6]!;
  const by = g[o + 7]!;
  const bz = g[o + 8]!;
  const x = ux * sx + uy * sy + uz * sz;
  const y = bx * sx + by * sy + bz * sz;
  const r2 = x * x + y * y;
  let cosPhi = g[o + 16]!;
  let sinPhi = g[o + 17]!;
  if (r2 > AXIS_ALIGNED_R2) {
    const r = Math.sqrt(r2);
    const cosC = g[o + 9]!;
    const sinC = g[o + 10]!;
    if (x * cosC + y * sinC >= r * g[o + 11]!) {
      cosPhi = x / r;
      sinPhi = y / r;
    } else if (y * cosC - x * sinC > 0) {
      // φ* lies counter-clockwise of the window centre: max is the nearer limit.
      cosPhi = g[o + 14]!;
      sinPhi = g[o + 15]!;
    } else {
      cosPhi = g[o + 12]!;
      sinPhi = g[o + 13]!;
    }
  }
  out[0] = g[o]! + cosPhi * ux + sinPhi * bx;
  out[1] = g[o + 1]! + cosPhi * uy + sinPhi * by;
  out[2] = g[o + 2]! + cosPhi * uz + sinPhi * bz;
}

const scratchNormal = new Float64Array(3);

/**
 * The front normal of a surface for a given Sun direction: the drive's normal for a tracking
 * plate (see the file comment), the fixed normal otherwise. For drawing and checks; allocates
 * nothing.
 * @param out receives the unit normal, body frame
 * @param vehicle a compiled vehicle
 * @param surface surface index, 0 ≤ surface < vehicle.surfaceCount
 * @param sunDirBody unit vector from the spacecraft to the Sun, body frame
 * @returns `out`
 */
export function surfaceNormalBody(
  out: Vec3,
  vehicle: CompiledVehicle,
  surface: number,
  sunDirBody: ReadonlyVec3,
): Vec3 {
  if (!(Number.isInteger(surface) && surface >= 0 && surface < vehicle.surfaceCount)) {
    throw new SrpError(
      'out_of_range',
      `surface must be an integer index in [0, ${vehicle.surfaceCount - 1}]; got ${surface}`,
      { field: 'surface', value: surface, limit: `[0, ${vehicle.surfaceCount - 1}]` },
    );
  }
  if (vehicle.tracks[surface] === 1) {
    trackNormalInto(scratchNormal, vehicle.tracking, surface, sunDirBody[0], sunDirBody[1], sunDirBody[2]);
    out[0] = scratchNormal[0]!;
    out[1] = scratchNormal[1]!;
    out[2] = scratchNormal[2]!;
    return out;
  }
  const n = vehicle.normal;
  out[0] = n[3 * surface]!;
  out[1] = n[3 * surface + 1]!;
  out[2] = n[3 * surface + 2]!;
  return out;
}
