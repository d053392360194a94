import type { ReadonlyQuat } from '../attitude/quaternion';
import { rotateBodyToInertial, rotateInertialToBody } from '../attitude/quaternion';
import { SrpError } from '../errors';
import { interpolateCoefficientTable } from '../mesh/coefficient-table';
import type { ReadonlyVec3, Vec3 } from '../math/vec3';
import type { CompiledVehicle } from './compiled-vehicle';
import { UNIT_TOLERANCE } from './flat-plate';

/** Numbers per surface in a per-surface buffer: force x, y, z (N), then torque x, y, z (N·m). */
export const SURFACE_STRIDE = 6;

/** Where `evaluateSrp` writes its answer; made by `createSrpResult` and reused. */
export interface SrpResult {
  /** Total SRP force (N), body frame. */
  readonly forceBody: Vec3;
  /** Total SRP torque about the centre of mass (N·m), body frame. */
  readonly torqueBody: Vec3;
  /**
   * Per-surface force (N) and torque about the centre of mass (N·m), body frame, stride
   * SURFACE_STRIDE in surface order (`vehicle.surfaceNames`); empty when not requested.
   */
  readonly surfacesBody: Float64Array;
}

/** The same answer in the inertial frame (EQJ / J2000 equatorial), with the body-frame one it came from. */
export interface SrpInertialResult {
  /** Total SRP force (N), inertial frame. */
  readonly forceInertial: Vec3;
  /** Total SRP torque about the centre of mass (N·m), inertial-frame components. */
  readonly torqueInertial: Vec3;
  /** Per-surface force and torque, inertial frame, stride SURFACE_STRIDE; empty when not requested. */
  readonly surfacesInertial: Float64Array;
  /** The body-frame answer. */
  readonly body: SrpResult;
}

/** Options of `createSrpResult`. */
export interface SrpResultOptions {
  /** Allocate the per-surface buffer so that evaluations fill it (default false). */
  perSurface?: boolean;
}

/**
 * Allocates a result for `vehicle` (not for hot paths: make it once, reuse it).
 * @returns zeroed force (N) and torque (N·m), and a per-surface buffer if asked for
 */
export function createSrpResult(vehicle: CompiledVehicle, options: SrpResultOptions = {}): SrpResult {
  const n = options.perSurface ? SURFACE_STRIDE * vehicle.surfaceCount : 0;
  return { forceBody: [0, 0, 0], torqueBody: [0, 0, 0], surfacesBody: new Float64Array(n) };
}

/**
 * Allocates an inertial-frame result for `vehicle` (not for hot paths).
 * @returns zeroed force (N) and torque (N·m) in both frames, per-surface buffers if asked for
 */
export function createSrpInertialResult(
  vehicle: CompiledVehicle,
  options: SrpResultOptions = {},
): SrpInertialResult {
  const body = createSrpResult(vehicle, options);
  return {
    forceInertial: [0, 0, 0],
    torqueInertial: [0, 0, 0],
    surfacesInertial: new Float64Array(body.surfacesBody.length),
    body,
  };
}

function refuse(field: string, value: unknown, message: string, limit: string): never {
  const finite = typeof value === 'number' && Number.isFinite(value);
  throw new SrpError(finite ? 'out_of_range' : 'invalid_input', message, { field, value, limit });
}

/**
 * Solar radiation pressure force and torque on a compiled vehicle, body frame. One signature for
 * every vehicle kind; allocates nothing.
 *
 * - cannonball: F = -P Cr A s, no torque. Source: Montenbruck & Gill, Satellite Orbits
 *   (Springer, 2000), §3.4.1, eq. (3.75) (equation number from memory).
 * - plates: the sum over plates of the flat-plate force with Lambertian diffuse reflection and
 *   thermal re-emission, F_i = -P A cos θ [c0 s + (c1 cos θ + c2) m] with m the outward normal of
 *   the lit face, front or back (`flatPlateForce`; Montenbruck & Gill 2000, §3.4), each acting
 *   at the plate's centroid: τ = Σ (r_i - r_CoM) × F_i. Tracking plates first turn to the Sun
 *   (sun-tracking.ts). Each plate sees the full beam: plates do not shade one another, so model
 *   vehicles whose plates do not (a convex bus with wings beside it); self-shadowing is for
 *   the mesh model.
 * - mesh: force and torque about the body origin per unit pressure, interpolated bilinearly in
 *   the Sun direction's (θ, φ) from the vehicle's coefficient table (computed with
 *   self-shadowing by mesh/coefficient-table.ts), times P f; torque about the centre of mass
 *   τ = τ_origin - r_CoM × F. One surface, 'mesh'.
 * - sail: McInnes's optical model of a flat sail (`sailForceCoefficients`; McInnes, Solar Sailing,
 *   1999, §2.6), acting at the sail centroid; no force with the Sun behind the sail (the
 *   published coefficients describe light on the front only).
 *
 * @param out receives the result; its per-surface buffer, if not empty, must hold
 *   6 × vehicle.surfaceCount numbers
 * @param vehicle from `compileVehicle`
 * @param sunDirBody unit vector from the spacecraft to the Sun, body frame
 * @param pressurePa radiation pressure at the spacecraft (Pa = N/m²), ≥ 0, e.g. `radiationPressureAt`
 * @param illuminatedFraction fraction of the solar disc visible, in [0, 1] (1 in full Sun, 0 in umbra)
 * @returns `out`: force (N) and torque about the centre of mass (N·m), body frame
 * @throws SrpError naming `pressurePa`, `illuminatedFraction`, `sunDirBody` or `out.surfacesBody`
 */
export function evaluateSrp(
  out: SrpResult,
  vehicle: CompiledVehicle,
  sunDirBody: ReadonlyVec3,
  pressurePa: number,
  illuminatedFraction: number,
): SrpResult {
  if (!(pressurePa >= 0 && pressurePa < Infinity)) {
    refuse('pressurePa', pressurePa, `pressurePa must be a finite number (Pa) >= 0; got ${pressurePa}`, '>= 0');
  }
  if (!(illuminatedFraction >= 0 && illuminatedFraction <= 1)) {
    refuse(
      'illuminatedFraction',
      illuminatedFraction,
      `illuminatedFraction must be in [0, 1]; got ${illuminatedFraction}`,
      '[0, 1]',
    );
  }
  const sx = sunDirBody[0];
  const sy = sunDirBody[1];
  const sz = sunDirBody[2];
  const lengthSq = sx * sx + sy * sy + sz * sz;
  // 1e-6 is UNIT_TOLERANCE written as a literal: reading the imported binding here measured
  // ~20 ns per call, as much as two plates.
  if (!(Math.abs(lengthSq - 1) <= 1e-6)) {
    throw new SrpError(
      'invalid_input',
      `sunDirBody must be a unit vector; got [${sx}, ${sy}, ${sz}] with |v|² = ${lengthSq}`,
      { field: 'sunDirBody', value: [sx, sy, sz], limit: `|v|² = 1 ± ${UNIT_TOLERANCE}` },
    );
  }
  const n = vehicle.areaM2.length;
  const surfaces = out.surfacesBody;
  const perSurface = surfaces.length !== 0;
  if (perSurface && surfaces.length < SURFACE_STRIDE * n) {
    throw new SrpError(
      'invalid_input',
      `out.surfacesBody holds ${surfaces.length} numbers; vehicle '${vehicle.name}' needs ${SURFACE_STRIDE * n}: ` +
        'make the result with createSrpResult(vehicle, { perSurface: true })',
      { field: 'out.surfacesBody', value: surfaces.length, limit: `>= ${SURFACE_STRIDE * n}` },
    );
  }
  const force = out.forceBody;
  const torque = out.torqueBody;
  const pf = pressurePa * illuminatedFraction;

  const crArea = vehicle.cannonballCrAreaM2;
  if (crArea > 0) {
    const k = -pf * crArea;
    force[0] = k * sx;
    force[1] = k * sy;
    force[2] = k * sz;
    torque[0] = 0;
    torque[1] = 0;
    torque[2] = 0;
    if (perSurface) {
      surfaces[0] = force[0];
      surfaces[1] = force[1];
      surfaces[2] = force[2];
      surfaces[3] = 0;
      surfaces[4] = 0;
      surfaces[5] = 0;
    }
    return out;
  }

  const table = vehicle.meshTable;
  if (table !== null) {
    const m = interpolateCoefficientTable(meshScratch, table, sunDirBody);
    const fx = pf * m[0]!;
    const fy = pf * m[1]!;
    const fz = pf * m[2]!;
    const com = vehicle.centreOfMassM;
    const cx = com[0]!;
    const cy = com[1]!;
    const cz = com[2]!;
    force[0] = fx + 0;
    force[1] = fy + 0;
    force[2] = fz + 0;
    torque[0] = pf * m[3]! - (cy * fz - cz * fy) + 0;
    torque[1] = pf * m[4]! - (cz * fx - cx * fz) + 0;
    torque[2] = pf * m[5]! - (cx * fy - cy * fx) + 0;
    if (perSurface) {
      surfaces[0] = force[0];
      surfaces[1] = force[1];
      surfaces[2] = force[2];
      surfaces[3] = torque[0];
      surfaces[4] = torque[1];
      surfaces[5] = torque[2];
    }
    return out;
  }

  const rows = vehicle.hotRows;
  const tracking = vehicle.tracking;
  const k0 = -pf; // -P f (Pa), applied once to the sums below rather than per surface
  // Each surface's force is F_i = k0 (along_i s + np_i n_i) (see below), so the sums factor:
  //   Σ F_i = k0 [(Σ along_i) s + Σ np_i n_i],
  //   Σ r_i × F_i = k0 [(Σ along_i r_i) × s + Σ np_i (r_i × n_i)],
  // and r × n of a fixed surface is packed at compile time: no cross product per fixed surface.
  let sumAlong = 0;
  let fnx = 0;
  let fny = 0;
  let fnz = 0;
  let rax = 0;
  let ray = 0;
  let raz = 0;
  let tnx = 0;
  let tny = 0;
  let tnz = 0;
  // Row layout: see HOT_ROW_STRIDE (16) in compiled-vehicle.ts; literals keep the loop free of
  // module-variable loads.
  for (let i = 0, h = 0; i < n; i += 1, h += 16) {
    let nx: number;
    let ny: number;
    let nz: number;
    let rnx: number;
    let rny: number;
    let rnz: number;
    const rx = rows[h + 3]!;
    const ry = rows[h + 4]!;
    const rz = rows[h + 5]!;
    if (rows[h + 15] === 1) {
      // The drive's normal for this Sun direction: `trackNormalInto` (sun-tracking.ts) inlined.
      // A call that V8 does not inline boxes its three double arguments (allocation); and every
      // value is loaded before the branches, so that each path has type feedback from the first
      // call and the optimised code is not thrown away when the Sun first crosses a limit.
      const o = 18 * i; // TRACKING_STRIDE
      const ux = tracking[o + 3]!;
      const uy = tracking[o + 4]!;
      const uz = tracking[o + 5]!;
      const bx = tracking[o + 6]!;
      const by = tracking[o + 7]!;
      const bz = tracking[o + 8]!;
      const x = ux * sx + uy * sy + uz * sz;
      const y = bx * sx + by * sy + bz * sz;
      const r2 = x * x + y * y;
      const cosC = tracking[o + 9]!;
      const sinC = tracking[o + 10]!;
      const cosH = tracking[o + 11]!;
      const nearMax = y * cosC - x * sinC > 0;
      const cosMin = tracking[o + 12]!;
      const sinMin = tracking[o + 13]!;
      const cosMax = tracking[o + 14]!;
      const sinMax = tracking[o + 15]!;
      let cosPhi = tracking[o + 16]!;
      let sinPhi = tracking[o + 17]!;
      if (r2 > 1e-30) {
        const r = Math.sqrt(r2);
        if (x * cosC + y * sinC >= r * cosH) {
          cosPhi = x / r;
          sinPhi = y / r;
        } else if (nearMax) {
          cosPhi = cosMax;
          sinPhi = sinMax;
        } else {
          cosPhi = cosMin;
          sinPhi = sinMin;
        }
      }
      nx = tracking[o]! + cosPhi * ux + sinPhi * bx;
      ny = tracking[o + 1]! + cosPhi * uy + sinPhi * by;
      nz = tracking[o + 2]! + cosPhi * uz + sinPhi * bz;
      rnx = ry * nz - rz * ny;
      rny = rz * nx - rx * nz;
      rnz = rx * ny - ry * nx;
    } else {
      nx = rows[h]!;
      ny = rows[h + 1]!;
      nz = rows[h + 2]!;
      rnx = rows[h + 6]!;
      rny = rows[h + 7]!;
      rnz = rows[h + 8]!;
    }
    const cos = nx * sx + ny * sy + nz * sz;
    // Light on the back (cos < 0) uses the back's coefficients (zeros for a one-sided plate) and
    // the reversed normal m = -n; with a = |cos θ| both sides read
    //   F = -P f [a A c0 s + cos θ A (c1 a + c2) n]   (A folded into the packed coefficients),
    // i.e. along = a A c0 and np = cos θ A (c1 a + c2), times k0 = -P f.
    const front = h + 9;
    const back = h + 12;
    const c = cos < 0 ? back : front;
    const a = Math.abs(cos);
    const along = a * rows[c]!;
    const np = cos * (rows[c + 1]! * a + rows[c + 2]!);
    sumAlong += along;
    fnx += np * nx;
    fny += np * ny;
    fnz += np * nz;
    rax += along * rx;
    ray += along * ry;
    raz += along * rz;
    tnx += np * rnx;
    tny += np * rny;
    tnz += np * rnz;
    if (perSurface) {
      const o = 6 * i;
      const px = k0 * (along * sx + np * nx);
      const py = k0 * (along * sy + np * ny);
      const pz = k0 * (along * sz + np * nz);
      surfaces[o] = px;
      surfaces[o + 1] = py;
      surfaces[o + 2] = pz;
      surfaces[o + 3] = ry * pz - rz * py;
      surfaces[o + 4] = rz * px - rx * pz;
      surfaces[o + 5] = rx * py - ry * px;
    }
  }
  // `+ 0` turns the -0 of an unlit vehicle (k0 < 0 times 0) into 0 for tables and exports.
  force[0] = k0 * (sumAlong * sx + fnx) + 0;
  force[1] = k0 * (sumAlong * sy + fny) + 0;
  force[2] = k0 * (sumAlong * sz + fnz) + 0;
  torque[0] = k0 * (ray * sz - raz * sy + tnx) + 0;
  torque[1] = k0 * (raz * sx - rax * sz + tny) + 0;
  torque[2] = k0 * (rax * sy - ray * sx + tnz) + 0;
  return out;
}

// Scratch for the frame changes and the mesh table's interpolation, allocated once.
const meshScratch = new Float64Array(6);
const sunScratch: Vec3 = [0, 0, 0];
const vecScratch: Vec3 = [0, 0, 0];

/**
 * Rotates a body-frame result into the inertial frame: v_inertial = R(q) v_body with the
 * attitude convention of attitude/quaternion.ts (q carries the inertial axes onto the body axes).
 * Torque stays about the centre of mass; only its components change. Allocates nothing.
 * @param out receives the inertial-frame result (its `body` is not touched unless it is `body`)
 * @param body a body-frame result of the same vehicle
 * @param attitude unit attitude quaternion [w, x, y, z], inertial to body
 * @returns `out`: force (N) and torque (N·m), inertial frame
 */
export function srpResultToInertial(
  out: SrpInertialResult,
  body: SrpResult,
  attitude: ReadonlyQuat,
): SrpInertialResult {
  rotateBodyToInertial(out.forceInertial, attitude, body.forceBody);
  rotateBodyToInertial(out.torqueInertial, attitude, body.torqueBody);
  const src = body.surfacesBody;
  const dst = out.surfacesInertial;
  const count = Math.min(src.length, dst.length);
  for (let o = 0; o < count; o += 3) {
    vecScratch[0] = src[o]!;
    vecScratch[1] = src[o + 1]!;
    vecScratch[2] = src[o + 2]!;
    rotateBodyToInertial(vecScratch, attitude, vecScratch);
    dst[o] = vecScratch[0];
    dst[o + 1] = vecScratch[1];
    dst[o + 2] = vecScratch[2];
  }
  return out;
}

/**
 * `evaluateSrp` for a Sun direction given in the inertial frame, with the answer in both frames:
 * rotates the Sun direction into the body, evaluates into `out.body`, rotates back.
 * Allocates nothing.
 * @param out from `createSrpInertialResult`
 * @param vehicle from `compileVehicle`
 * @param attitude unit attitude quaternion [w, x, y, z], inertial to body (attitude/quaternion.ts)
 * @param sunDirInertial unit vector from the spacecraft to the Sun, inertial frame (EQJ)
 * @param pressurePa radiation pressure at the spacecraft (Pa), ≥ 0
 * @param illuminatedFraction fraction of the solar disc visible, in [0, 1]
 * @returns `out`: force (N) and torque about the centre of mass (N·m), inertial and body frames
 * @throws SrpError as `evaluateSrp` (the Sun direction is named `sunDirBody` after rotation)
 */
export function evaluateSrpInertial(
  out: SrpInertialResult,
  vehicle: CompiledVehicle,
  attitude: ReadonlyQuat,
  sunDirInertial: ReadonlyVec3,
  pressurePa: number,
  illuminatedFraction: number,
): SrpInertialResult {
  rotateInertialToBody(sunScratch, attitude, sunDirInertial);
  evaluateSrp(out.body, vehicle, sunScratch, pressurePa, illuminatedFraction);
  return srpResultToInertial(out, out.body, attitude);
}

/**
 * Centre of pressure: the point of the resultant's line of action closest to the centre of mass,
 *
 *   r_cp = r_CoM + (F × τ) / |F|²,
 *
 * chosen because it is the point that, with the total force, reproduces the torque the attitude
 * control must fight (τ = (r_cp - r_CoM) × F), unlike an area-weighted lit centroid, which ignores
 * how differently the surfaces push. When the surfaces' forces do not meet on one line a residual
 * torque along F remains (a couple, (τ · F) F / |F|²) that no point reproduces; it is not in r_cp.
 * Allocates nothing.
 * @param out receives the centre of pressure (m), body frame
 * @param result a body-frame result of `vehicle`
 * @param vehicle the vehicle evaluated
 * @returns `out`, or null when the force is zero (in shadow, or the Sun edge-on to a sail)
 */
export function centreOfPressureBody(out: Vec3, result: SrpResult, vehicle: CompiledVehicle): Vec3 | null {
  const f = result.forceBody;
  const t = result.torqueBody;
  const fx = f[0];
  const fy = f[1];
  const fz = f[2];
  const tx = t[0];
  const ty = t[1];
  const tz = t[2];
  const f2 = fx * fx + fy * fy + fz * fz;
  if (!(f2 > 0)) return null;
  const com = vehicle.centreOfMassM;
  out[0] = com[0]! + (fy * tz - fz * ty) / f2;
  out[1] = com[1]! + (fz * tx - fx * tz) / f2;
  out[2] = com[2]! + (fx * ty - fy * tx) / f2;
  return out;
}
