/**
 * The shapes shared by the mesh reader, the self-shadowing SRP model and the coefficient table.
 * All coordinates are in the body frame, metres; triangles are wound counter-clockwise seen from
 * outside, so (v1 - v0) × (v2 - v0) is the outward normal of the front face.
 */
import type { SurfaceOpticsInput } from '../vehicles/plate-optics';

/** A triangle soup with a group per triangle (the unit optics are assigned by). */
export interface TriangleMesh {
  /** 9 numbers per triangle: v0, v1, v2 (m, body frame). */
  readonly positions: Float64Array;
  /** Group index of each triangle, into `groupNames`. */
  readonly groupOfTriangle: Uint32Array;
  /** Group names: OBJ `g`/`o`/`usemtl` names, the STL `solid` name; 'default' when unnamed. */
  readonly groupNames: readonly string[];
}

/** Optics of one group: the front face, and the back for a thin sheet lit from either side. */
export interface MeshGroupOpticsInput {
  front: SurfaceOpticsInput;
  /** Absent: light on the back does nothing (the inside of a closed body). */
  back?: SurfaceOpticsInput | undefined;
}

/** Optics by group name; groups not named use `default`. */
export interface MeshOpticsInput {
  default: MeshGroupOpticsInput;
  groups?: Readonly<Record<string, MeshGroupOpticsInput>> | undefined;
}

/** How a coefficient table is computed. */
export interface CoefficientTableSettings {
  /** Grid step (°), dividing 180. */
  stepDeg: number;
  /** Shadow-test samples per facet, n² for n = 1..8. */
  samplesPerFacet: number;
  /** Follow specular reflections onto other facets (one bounce). */
  specularBounce: boolean;
}

/**
 * SRP force and torque per unit pressure over a grid of Sun directions, body frame, full sunlight.
 * Node (i, j): polar angle θ_i = i·stepDeg from body +Z (i = 0..polarCount-1, polarCount =
 * 180/stepDeg + 1) and azimuth φ_j = j·stepDeg from +X toward +Y (j = 0..azimuthCount-1,
 * azimuthCount = 360/stepDeg); Sun direction s = (sin θ cos φ, sin θ sin φ, cos θ).
 * `values[6(i·azimuthCount + j) + k]`: k = 0..2 force per unit pressure (m², N/Pa), k = 3..5
 * torque about the body-frame origin per unit pressure (m³, N·m/Pa). Torque is about the origin
 * so that a change of centre of mass needs no new table: τ_CoM = τ_origin - r_CoM × F.
 */
export interface SrpCoefficientTable {
  readonly stepDeg: number;
  readonly polarCount: number;
  readonly azimuthCount: number;
  readonly values: Float64Array;
}
