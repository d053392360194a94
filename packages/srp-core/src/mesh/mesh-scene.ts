/**
 * A triangle mesh made ready for self-shadowed SRP: per-facet geometry, flat-plate coefficients
 * from each group's optics, the ray-casting hierarchy, and which facet sides nothing can shade.
 */
import { SrpError } from '../errors';
import { resolvePlateOptics } from '../vehicles/plate-optics';
import { surfaceForceCoefficients } from '../vehicles/surface-optics';
import { anyVertexInFront, buildMeshBvh, type MeshBvh } from './mesh-bvh';
import type { MeshGroupOpticsInput, MeshOpticsInput, TriangleMesh } from './mesh-types';

/** Bit of `MeshScene.unshadowable`: nothing lies in front of the front face. */
export const FRONT_UNSHADOWABLE = 1;
/** Bit of `MeshScene.unshadowable`: nothing lies in front of the back face. */
export const BACK_UNSHADOWABLE = 2;

/**
 * Distance (relative to the mesh's bounding-box diagonal) that a shadow ray's origin is lifted off
 * its facet, so that rounding cannot make the ray hit the facet's coplanar neighbours; also the
 * tolerance of the "nothing in front" pre-pass. 1e-9 of a 10 m craft is 10 nm, far below any
 * feature, and far above the rounding of coordinates (~1e-15 relative).
 */
export const RAY_OFFSET_RELATIVE = 1e-9;

/** A mesh with its optics resolved; made by `createMeshScene`, read-only afterwards. */
export interface MeshScene {
  /** Number of triangles (facets). */
  readonly triangleCount: number;
  /** The mesh's group names. */
  readonly groupNames: readonly string[];
  /** The input positions, 9 per triangle (m). */
  readonly positions: Float64Array;
  /** Area of each facet (m²). */
  readonly area: Float64Array;
  /** Unit front normal of each facet (stride 3), from the counter-clockwise winding. */
  readonly normal: Float64Array;
  /** Centroid of each facet (m, stride 3). */
  readonly centroid: Float64Array;
  /**
   * Flat-plate coefficients c0, c1, c2 of the front then the back of each facet (stride 6,
   * `surfaceForceCoefficients`); zeros for a back without optics.
   */
  readonly coefficients: Float64Array;
  /** Specular fraction of the front then the back of each facet (stride 2), for the bounce. */
  readonly specular: Float64Array;
  /** 1 where the facet's back takes light (its group has `back` optics). */
  readonly hasBack: Uint8Array;
  /** FRONT_UNSHADOWABLE | BACK_UNSHADOWABLE bits: sides no other part of the mesh lies in front of. */
  readonly unshadowable: Uint8Array;
  /** The ray-casting hierarchy. */
  readonly bvh: MeshBvh;
  /** Bounding-box diagonal (m). */
  readonly sizeM: number;
  /** Shadow-ray origin lift (m): RAY_OFFSET_RELATIVE × sizeM. */
  readonly rayOffsetM: number;
}

/**
 * Prepares a mesh for `illuminateMesh` (allocates; once per mesh and optics). Each facet is a
 * one-sided flat plate with its group's front optics, two-sided when the group gives `back`;
 * optics are resolved as for plates (`resolvePlateOptics`), so presets and thermal re-emission
 * mean the same. Degenerate (zero-area) triangles are kept but never lit.
 * @throws SrpError naming `mesh.positions`, `mesh.groupOfTriangle`, `optics.groups.<name>` (a group
 *   the mesh does not have) or the offending optics field (`optics.default.front.specular`)
 */
export function createMeshScene(mesh: TriangleMesh, optics: MeshOpticsInput): MeshScene {
  const positions = mesh.positions;
  if (!(positions instanceof Float64Array) || positions.length % 9 !== 0 || positions.length === 0) {
    throw new SrpError('invalid_input', 'mesh.positions must be a non-empty Float64Array of 9 numbers per triangle', {
      field: 'mesh.positions',
      value: positions?.length,
    });
  }
  const count = positions.length / 9;
  for (let i = 0; i < positions.length; i += 1) {
    if (!Number.isFinite(positions[i])) {
      throw new SrpError('invalid_input', `mesh.positions.${i} must be a finite number (m); got ${positions[i]}`, {
        field: `mesh.positions.${i}`,
        value: positions[i],
      });
    }
  }
  const groups = mesh.groupOfTriangle;
  if (groups.length !== count) {
    throw new SrpError('invalid_input', `mesh.groupOfTriangle must hold one group per triangle (${count}); got ${groups.length}`, {
      field: 'mesh.groupOfTriangle',
      value: groups.length,
    });
  }
  const groupNames = mesh.groupNames;
  for (let t = 0; t < count; t += 1) {
    if (groups[t]! >= groupNames.length) {
      throw new SrpError('invalid_input', `mesh.groupOfTriangle.${t} is ${groups[t]}, past the ${groupNames.length} group names`, {
        field: `mesh.groupOfTriangle.${t}`,
        value: groups[t],
      });
    }
  }

  // Optics of each group: its own entry if named, else the default.
  const named = optics.groups ?? {};
  for (const name of Object.keys(named)) {
    if (!groupNames.includes(name)) {
      throw new SrpError(
        'invalid_input',
        `optics.groups.${name}: the mesh has no group '${name}'; its groups are ${groupNames.map((g) => `'${g}'`).join(', ')}`,
        { field: `optics.groups.${name}`, value: name, limit: groupNames.join(' | ') },
      );
    }
  }
  const resolveGroup = (input: MeshGroupOpticsInput, field: string) => {
    if (typeof input !== 'object' || input === null) {
      throw new SrpError('invalid_input', `${field} must be {front, back?}; got ${String(input)}`, { field, value: input });
    }
    const plate = resolvePlateOptics(input.front, input.back, field);
    const c = new Float64Array(6);
    surfaceForceCoefficients(c, 0, plate.front);
    if (plate.back) surfaceForceCoefficients(c, 3, plate.back);
    return { coefficients: c, back: plate.back !== null, specFront: plate.front.specular, specBack: plate.back?.specular ?? 0 };
  };
  const fallback = resolveGroup(optics.default, 'optics.default');
  const byGroup = groupNames.map((name) => {
    const own = Object.prototype.hasOwnProperty.call(named, name) ? named[name] : undefined;
    return own === undefined ? fallback : resolveGroup(own, `optics.groups.${name}`);
  });

  const area = new Float64Array(count);
  const normal = new Float64Array(3 * count);
  const centroid = new Float64Array(3 * count);
  const coefficients = new Float64Array(6 * count);
  const specular = new Float64Array(2 * count);
  const hasBack = new Uint8Array(count);
  let minX = Infinity;
  let minY = Infinity;
  let minZ = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  let maxZ = -Infinity;
  for (let t = 0; t < count; t += 1) {
    const p = 9 * t;
    const e1x = positions[p + 3]! - positions[p]!;
    const e1y = positions[p + 4]! - positions[p + 1]!;
    const e1z = positions[p + 5]! - positions[p + 2]!;
    const e2x = positions[p + 6]! - positions[p]!;
    const e2y = positions[p + 7]! - positions[p + 1]!;
    const e2z = positions[p + 8]! - positions[p + 2]!;
    const cx = e1y * e2z - e1z * e2y;
    const cy = e1z * e2x - e1x * e2z;
    const cz = e1x * e2y - e1y * e2x;
    const twice = Math.sqrt(cx * cx + cy * cy + cz * cz);
    area[t] = twice / 2;
    if (twice > 0) {
      normal[3 * t] = cx / twice;
      normal[3 * t + 1] = cy / twice;
      normal[3 * t + 2] = cz / twice;
    }
    for (let k = 0; k < 3; k += 1) {
      centroid[3 * t + k] = (positions[p + k]! + positions[p + 3 + k]! + positions[p + 6 + k]!) / 3;
    }
    for (let v = 0; v < 9; v += 3) {
      const x = positions[p + v]!;
      const y = positions[p + v + 1]!;
      const z = positions[p + v + 2]!;
      if (x < minX) minX = x;
      if (y < minY) minY = y;
      if (z < minZ) minZ = z;
      if (x > maxX) maxX = x;
      if (y > maxY) maxY = y;
      if (z > maxZ) maxZ = z;
    }
    const g = byGroup[groups[t]!]!;
    coefficients.set(g.coefficients, 6 * t);
    specular[2 * t] = g.specFront;
    specular[2 * t + 1] = g.specBack;
    hasBack[t] = g.back ? 1 : 0;
  }
  const sizeM = Math.hypot(maxX - minX, maxY - minY, maxZ - minZ);
  const tolerance = RAY_OFFSET_RELATIVE * sizeM;
  const bvh = buildMeshBvh(positions);

  // Exact pre-pass: a ray leaving a face towards its front half-space can only meet geometry in
  // front of the face's plane; a side with no vertex in front can never be shaded.
  const unshadowable = new Uint8Array(count);
  for (let t = 0; t < count; t += 1) {
    if (!(area[t]! > 0)) continue;
    const nx = normal[3 * t]!;
    const ny = normal[3 * t + 1]!;
    const nz = normal[3 * t + 2]!;
    const d = nx * centroid[3 * t]! + ny * centroid[3 * t + 1]! + nz * centroid[3 * t + 2]!;
    let bits = 0;
    if (!anyVertexInFront(bvh, nx, ny, nz, d, tolerance)) bits |= FRONT_UNSHADOWABLE;
    if (hasBack[t] === 1 && !anyVertexInFront(bvh, -nx, -ny, -nz, -d, tolerance)) bits |= BACK_UNSHADOWABLE;
    unshadowable[t] = bits;
  }

  return {
    triangleCount: count,
    groupNames: [...groupNames],
    positions,
    area,
    normal,
    centroid,
    coefficients,
    specular,
    hasBack,
    unshadowable,
    bvh,
    sizeM,
    rayOffsetM: tolerance,
  };
}
