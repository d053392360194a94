/**
 * Self-shadowed SRP on a triangle mesh for one Sun direction, by ray casting: which facets are
 * lit and how much of each, and the force and torque per unit pressure from the lit parts.
 */
import { SrpError } from '../errors';
import type { ReadonlyVec3, Vec3 } from '../math/vec3';
import { anyHit, closestHit, createMeshRay, createMeshSweep, rayHitsRow, sweptPrismMeetsAny } from './mesh-bvh';
import { BACK_UNSHADOWABLE, FRONT_UNSHADOWABLE, type MeshScene } from './mesh-scene';

/** Options of `illuminateMesh`. */
export interface IlluminateOptions {
  /** Shadow-test samples per facet, n² for n = 1..8: each facet is cut into n² equal sub-triangles. */
  samplesPerFacet: number;
  /** Follow the specular reflection of each lit sample onto the facet it meets (one bounce). */
  specularBounce: boolean;
  /**
   * Skip the shadow rays of a facet when an exact test shows nothing can shade it (default true):
   * the scene's pre-pass (no vertex in front of the facet's plane), then, per Sun direction, the
   * facet swept towards the Sun meeting no triangle (`sweptPrismMeetsAny`). False casts every ray:
   * for tests of the ray casting itself.
   */
  prePass?: boolean | undefined;
}

/** Where `illuminateMesh` writes; made by `createMeshIllumination` and reused. */
export interface MeshIllumination {
  /** Lit fraction of each facet, [0, 1] (0 for a facet whose lit side has no optics or faces away). */
  readonly litFraction: Float64Array;
  /** Force per unit pressure (m² = N/Pa), body frame. */
  readonly forcePerPressure: Vec3;
  /** Torque about the body-frame origin per unit pressure (m³ = N·m/Pa), body frame. */
  readonly torquePerPressure: Vec3;
  /** Rays cast by the last call (shadow rays plus bounce rays). */
  rays: number;
  /** Swept-prism tests made by the last call. */
  sweeps: number;
  /**
   * Per facet, how many more calls to skip its swept-prism test after one found a possible
   * occluder (the next Sun direction, a few degrees on, usually finds it again): a speed hint
   * only, as both the test and the rays are exact.
   */
  readonly sweepHold: Uint8Array;
  /**
   * Per facet, the row (in the hierarchy's triangles) that last blocked one of its shadow rays,
   * or -1: tried first by the next ray (a speed hint only: a hit on it is a hit).
   */
  readonly lastBlocker: Int32Array;
}

/** Allocates an illumination result for `scene` (not for hot paths). */
export function createMeshIllumination(scene: MeshScene): MeshIllumination {
  return {
    litFraction: new Float64Array(scene.triangleCount),
    forcePerPressure: [0, 0, 0],
    torquePerPressure: [0, 0, 0],
    rays: 0,
    sweeps: 0,
    sweepHold: new Uint8Array(scene.triangleCount),
    lastBlocker: new Int32Array(scene.triangleCount).fill(-1),
  };
}

/** Largest n of the n² samples per facet. */
export const MAX_SAMPLES_PER_SIDE = 8;

/** Calls a facet skips its swept-prism test after the test found a possible occluder. */
const SWEEP_HOLD_CALLS = 6;

const samplePatterns: Float64Array[] = [];

/**
 * Barycentric coordinates (a, b) along e1 and e2 of the centroids of the n² sub-triangles of the
 * regular n-subdivision: n(n+1)/2 upright ones and n(n-1)/2 inverted ones, all of equal area, so
 * each sample stands for 1/n² of the facet and their mean is the facet's centroid.
 */
export function samplePattern(n: number): Float64Array {
  const cached = samplePatterns[n];
  if (cached) return cached;
  const out = new Float64Array(2 * n * n);
  let k = 0;
  for (let i = 0; i < n; i += 1) {
    for (let j = 0; i + j < n; j += 1) {
      out[k] = (i + 1 / 3) / n;
      out[k + 1] = (j + 1 / 3) / n;
      k += 2;
      if (i + j < n - 1) {
        out[k] = (i + 2 / 3) / n;
        out[k + 1] = (j + 2 / 3) / n;
        k += 2;
      }
    }
  }
  samplePatterns[n] = out;
  return out;
}

/** Checks samplesPerFacet = n², n in 1..8; returns n. */
export function samplesPerSide(samplesPerFacet: number, field = 'samplesPerFacet'): number {
  const n = Math.round(Math.sqrt(samplesPerFacet));
  if (!Number.isInteger(samplesPerFacet) || n * n !== samplesPerFacet || n < 1 || n > MAX_SAMPLES_PER_SIDE) {
    throw new SrpError('invalid_input', `${field} must be n² for n = 1..${MAX_SAMPLES_PER_SIDE} (1, 4, 9, ..., 64); got ${samplesPerFacet}`, {
      field,
      value: samplesPerFacet,
      limit: '1 | 4 | 9 | 16 | 25 | 36 | 49 | 64',
    });
  }
  return n;
}

const shadowRay = createMeshRay();
const bounceRay = createMeshRay();
const sweep = createMeshSweep();

/**
 * Force and torque per unit pressure on a mesh in full sunlight from unit Sun direction
 * `sunDirBody`, with self-shadowing.
 *
 * A facet side is a candidate when it faces the Sun and has optics (the front always; the back
 * when its group gives `back`). Each candidate is cut into n² equal sub-triangles; a sample (a
 * sub-triangle centroid, lifted by `scene.rayOffsetM` along the lit side's normal) is lit when a
 * ray towards the Sun meets no other triangle. The facet then pushes like a flat plate of its lit
 * area A f (f the lit fraction), with the plate model's formula and coefficients
 * (evaluate-srp.ts; Montenbruck & Gill, Satellite Orbits, 2000, §3.4):
 *
 *   F / P = -A f cos θ [c0 s + (c1 cos θ + c2) m],
 *
 * acting at the mean of its lit samples (its centroid when fully lit); torque r × F about the
 * body-frame origin.
 *
 * Specular bounce (option): the light a lit sample of facet i reflects specularly travels along
 * u' = u - 2 (u · m) m (u = -s) with pressure ρs,i P and cross-section A_i cos θ_i / n² (a
 * reflection keeps the beam's cross-section); the first facet j it meets, on a side with optics,
 * takes it as a flat plate lit from -u', F = -ρs,i P (A_i cos θ_i / n²) [c0 s' + (c1 cos θ_j + c2) m_j]
 * with s' = -u', acting at the hit point. One bounce only: j's own reflection of it is not followed.
 *
 * Allocates nothing.
 * @param scene from `createMeshScene`
 * @param sunDirBody unit vector towards the Sun, body frame
 * @param out from `createMeshIllumination(scene)`
 * @returns `out`
 * @throws SrpError naming `sunDirBody` or `samplesPerFacet`
 */
export function illuminateMesh(
  scene: MeshScene,
  sunDirBody: ReadonlyVec3,
  options: IlluminateOptions,
  out: MeshIllumination,
): MeshIllumination {
  const sx = sunDirBody[0];
  const sy = sunDirBody[1];
  const sz = sunDirBody[2];
  const lengthSq = sx * sx + sy * sy + sz * sz;
  if (!(Math.abs(lengthSq - 1) <= 1e-6)) {
    throw new SrpError('invalid_input', `sunDirBody must be a unit vector; got [${sx}, ${sy}, ${sz}] with |v|² = ${lengthSq}`, {
      field: 'sunDirBody',
      value: [sx, sy, sz],
      limit: '|v|² = 1 ± 1e-6',
    });
  }
  const n = samplesPerSide(options.samplesPerFacet);
  const samples = n * n;
  const pattern = samplePattern(n);
  const bounce = options.specularBounce;
  const prePass = options.prePass !== false;
  const { area, normal, centroid, coefficients, specular, hasBack, unshadowable, positions, bvh } = scene;
  const rowOfTriangle = bvh.rowOfTriangle;
  const triangleIds = bvh.triangleIds;
  const offset = scene.rayOffsetM;
  const lit = out.litFraction;
  const blockers = out.lastBlocker;
  shadowRay[3] = sx;
  shadowRay[4] = sy;
  shadowRay[5] = sz;
  shadowRay[6] = Infinity;
  bounceRay[6] = Infinity;
  sweep[6] = sx;
  sweep[7] = sy;
  sweep[8] = sz;
  let rays = 0;
  let sweeps = 0;
  let fx = 0;
  let fy = 0;
  let fz = 0;
  let tx = 0;
  let ty = 0;
  let tz = 0;

  for (let t = 0, count = scene.triangleCount; t < count; t += 1) {
    lit[t] = 0;
    const nx = normal[3 * t]!;
    const ny = normal[3 * t + 1]!;
    const nz = normal[3 * t + 2]!;
    let cos = nx * sx + ny * sy + nz * sz;
    let mx = nx;
    let my = ny;
    let mz = nz;
    let c = 6 * t;
    let side = FRONT_UNSHADOWABLE;
    let rhoS = specular[2 * t]!;
    if (!(cos > 0)) {
      if (!(cos < 0) || hasBack[t] !== 1) continue;
      cos = -cos;
      mx = -nx;
      my = -ny;
      mz = -nz;
      c += 3;
      side = BACK_UNSHADOWABLE;
      rhoS = specular[2 * t + 1]!;
    }
    const a = area[t]!;
    if (!(a > 0)) continue;
    const p = 9 * t;
    const v0x = positions[p]!;
    const v0y = positions[p + 1]!;
    const v0z = positions[p + 2]!;
    const e1x = positions[p + 3]! - v0x;
    const e1y = positions[p + 4]! - v0y;
    const e1z = positions[p + 5]! - v0z;
    const e2x = positions[p + 6]! - v0x;
    const e2y = positions[p + 7]! - v0y;
    const e2z = positions[p + 8]! - v0z;
    const ox = v0x + offset * mx;
    const oy = v0y + offset * my;
    const oz = v0z + offset * mz;
    const reflects = bounce && rhoS > 0;
    // Reflected direction u' = -s + 2 cos m, and the beam it carries per sample (m²).
    const ux = 2 * cos * mx - sx;
    const uy = 2 * cos * my - sy;
    const uz = 2 * cos * mz - sz;
    const beam = (rhoS * a * cos) / samples;
    const row = rowOfTriangle[t]!;
    let shadowFree = prePass && (unshadowable[t]! & side) !== 0;
    const hold = out.sweepHold[t]!;
    if (hold > 0) out.sweepHold[t] = hold - 1;
    if (prePass && !shadowFree && samples > 1 && hold === 0) {
      // One swept-prism test instead of n² rays when nothing can shade the facet (with one
      // sample, the ray itself is cheaper). The box holds the lifted sample points; the plane
      // level sits half a lift above the facet, below every ray (which starts a full lift above
      // it) and above the rounding of coplanar neighbours.
      const v1x = v0x + e1x;
      const v1y = v0y + e1y;
      const v1z = v0z + e1z;
      const v2x = v0x + e2x;
      const v2y = v0y + e2y;
      const v2z = v0z + e2z;
      const loX = Math.min(v0x, v1x, v2x);
      const loY = Math.min(v0y, v1y, v2y);
      const loZ = Math.min(v0z, v1z, v2z);
      const hiX = Math.max(v0x, v1x, v2x);
      const hiY = Math.max(v0y, v1y, v2y);
      const hiZ = Math.max(v0z, v1z, v2z);
      sweep[0] = (loX + hiX) / 2;
      sweep[1] = (loY + hiY) / 2;
      sweep[2] = (loZ + hiZ) / 2;
      sweep[3] = (hiX - loX) / 2 + offset;
      sweep[4] = (hiY - loY) / 2 + offset;
      sweep[5] = (hiZ - loZ) / 2 + offset;
      sweep[9] = mx;
      sweep[10] = my;
      sweep[11] = mz;
      sweep[12] = mx * v0x + my * v0y + mz * v0z + offset / 2;
      sweep[13] = ox;
      sweep[14] = oy;
      sweep[15] = oz;
      sweep[16] = ox + e1x;
      sweep[17] = oy + e1y;
      sweep[18] = oz + e1z;
      sweep[19] = ox + e2x;
      sweep[20] = oy + e2y;
      sweep[21] = oz + e2z;
      sweep[22] = offset;
      sweeps += 1;
      shadowFree = !sweptPrismMeetsAny(bvh, sweep, row);
      if (!shadowFree) out.sweepHold[t] = SWEEP_HOLD_CALLS;
    }

    let litCount = 0;
    let px = 0;
    let py = 0;
    let pz = 0;
    if (shadowFree && !reflects) {
      litCount = samples;
    } else {
      for (let k = 0; k < 2 * samples; k += 2) {
        const ba = pattern[k]!;
        const bb = pattern[k + 1]!;
        const qx = ox + ba * e1x + bb * e2x;
        const qy = oy + ba * e1y + bb * e2y;
        const qz = oz + ba * e1z + bb * e2z;
        if (!shadowFree) {
          shadowRay[0] = qx;
          shadowRay[1] = qy;
          shadowRay[2] = qz;
          rays += 1;
          const cached = blockers[t]!;
          if (cached >= 0 && rayHitsRow(bvh, shadowRay, cached)) continue;
          if (anyHit(bvh, shadowRay, row)) {
            blockers[t] = shadowRay[8]!;
            continue;
          }
        }
        litCount += 1;
        px += qx;
        py += qy;
        pz += qz;
        if (!reflects) continue;
        bounceRay[0] = qx;
        bounceRay[1] = qy;
        bounceRay[2] = qz;
        bounceRay[3] = ux;
        bounceRay[4] = uy;
        bounceRay[5] = uz;
        rays += 1;
        const hitRow = closestHit(bvh, bounceRay, row);
        if (hitRow < 0) continue;
        const j = triangleIds[hitRow]!;
        // The beam arrives from s' = -u'.
        const jx = normal[3 * j]!;
        const jy = normal[3 * j + 1]!;
        const jz = normal[3 * j + 2]!;
        let cj = -(jx * ux + jy * uy + jz * uz);
        let mjx = jx;
        let mjy = jy;
        let mjz = jz;
        let cc = 6 * j;
        if (!(cj > 0)) {
          if (!(cj < 0) || hasBack[j] !== 1) continue; // the beam ends on a side without optics
          cj = -cj;
          mjx = -jx;
          mjy = -jy;
          mjz = -jz;
          cc += 3;
        }
        const alongBeam = -beam * coefficients[cc]!; // along s' = -u'
        const alongNormal = -beam * (coefficients[cc + 1]! * cj + coefficients[cc + 2]!);
        const bx = -alongBeam * ux + alongNormal * mjx;
        const by = -alongBeam * uy + alongNormal * mjy;
        const bz = -alongBeam * uz + alongNormal * mjz;
        const hitT = bounceRay[7]!;
        const hx = qx + hitT * ux;
        const hy = qy + hitT * uy;
        const hz = qz + hitT * uz;
        fx += bx;
        fy += by;
        fz += bz;
        tx += hy * bz - hz * by;
        ty += hz * bx - hx * bz;
        tz += hx * by - hy * bx;
      }
    }
    if (litCount === 0) continue;
    const fraction = litCount / samples;
    lit[t] = fraction;
    // The lit samples' mean; the centroid itself when all are lit (exactly the plate's lever arm).
    let rx: number;
    let ry: number;
    let rz: number;
    if (litCount === samples) {
      rx = centroid[3 * t]!;
      ry = centroid[3 * t + 1]!;
      rz = centroid[3 * t + 2]!;
    } else {
      rx = px / litCount - offset * mx;
      ry = py / litCount - offset * my;
      rz = pz / litCount - offset * mz;
    }
    // Flat plate, as in evaluate-srp.ts: F/P = -[a A c0 s + cos A (c1 a + c2) m] with a = cos.
    const litArea = a * fraction;
    const along = -cos * litArea * coefficients[c]!;
    const np = -cos * litArea * (coefficients[c + 1]! * cos + coefficients[c + 2]!);
    const gx = along * sx + np * mx;
    const gy = along * sy + np * my;
    const gz = along * sz + np * mz;
    fx += gx;
    fy += gy;
    fz += gz;
    tx += ry * gz - rz * gy;
    ty += rz * gx - rx * gz;
    tz += rx * gy - ry * gx;
  }
  const f = out.forcePerPressure;
  const tq = out.torquePerPressure;
  f[0] = fx + 0;
  f[1] = fy + 0;
  f[2] = fz + 0;
  tq[0] = tx + 0;
  tq[1] = ty + 0;
  tq[2] = tz + 0;
  out.rays = rays;
  out.sweeps = sweeps;
  return out;
}
