/**
 * Meshes built in code for the tests and the benchmark: boxes, parallelograms, a shallow dish, and
 * a box-wing spacecraft with an antenna dish that shades part of its bus. All counter-clockwise
 * seen from outside (front normal outward).
 */
import type { ReadonlyVec3, Vec3 } from '../math/vec3';
import type { PlateSpec } from '../vehicles/vehicle-spec';
import type { SurfaceOpticsInput } from '../vehicles/plate-optics';
import type { TriangleMesh } from './mesh-types';

/** A mesh being assembled: triangles with a group name each. */
export class MeshBuilder {
  private readonly positions: number[] = [];
  private readonly groups: number[] = [];
  private readonly names: string[] = [];

  triangle(group: string, a: ReadonlyVec3, b: ReadonlyVec3, c: ReadonlyVec3): this {
    let g = this.names.indexOf(group);
    if (g < 0) {
      g = this.names.length;
      this.names.push(group);
    }
    this.positions.push(a[0], a[1], a[2], b[0], b[1], b[2], c[0], c[1], c[2]);
    this.groups.push(g);
    return this;
  }

  /**
   * The parallelogram origin + [0, 1]·u + [0, 1]·v cut into ku × kv cells of two triangles, front
   * normal along u × v.
   */
  parallelogram(group: string, origin: ReadonlyVec3, u: ReadonlyVec3, v: ReadonlyVec3, ku = 1, kv = ku): this {
    const at = (i: number, j: number): ReadonlyVec3 => [
      origin[0] + (i / ku) * u[0] + (j / kv) * v[0],
      origin[1] + (i / ku) * u[1] + (j / kv) * v[1],
      origin[2] + (i / ku) * u[2] + (j / kv) * v[2],
    ];
    for (let i = 0; i < ku; i += 1) {
      for (let j = 0; j < kv; j += 1) {
        this.triangle(group, at(i, j), at(i + 1, j), at(i + 1, j + 1));
        this.triangle(group, at(i, j), at(i + 1, j + 1), at(i, j + 1));
      }
    }
    return this;
  }

  /** An axis-aligned box [min, max], each face k × k cells, normals outward; one group per face when `faceGroups`. */
  box(group: string, min: ReadonlyVec3, max: ReadonlyVec3, k = 1, faceGroups = false): this {
    const [x0, y0, z0] = min;
    const [x1, y1, z1] = max;
    const dx = x1 - x0;
    const dy = y1 - y0;
    const dz = z1 - z0;
    const name = (face: string) => (faceGroups ? `${group} ${face}` : group);
    this.parallelogram(name('+x'), [x1, y0, z0], [0, dy, 0], [0, 0, dz], k);
    this.parallelogram(name('-x'), [x0, y0, z0], [0, 0, dz], [0, dy, 0], k);
    this.parallelogram(name('+y'), [x0, y1, z0], [0, 0, dz], [dx, 0, 0], k);
    this.parallelogram(name('-y'), [x0, y0, z0], [dx, 0, 0], [0, 0, dz], k);
    this.parallelogram(name('+z'), [x0, y0, z1], [dx, 0, 0], [0, dy, 0], k);
    this.parallelogram(name('-z'), [x0, y0, z0], [0, dy, 0], [dx, 0, 0], k);
    return this;
  }

  /**
   * A shallow paraboloid dish of rim radius `radius` and depth `depth`, its vertex at `centre`,
   * opening along +x (the concave side's normal points to +x), `rings` × `segments` cells.
   */
  dishAlongX(group: string, centre: ReadonlyVec3, radius: number, depth: number, rings: number, segments: number): this {
    const at = (ring: number, seg: number): ReadonlyVec3 => {
      const r = (ring / rings) * radius;
      const a = (seg / segments) * 2 * Math.PI;
      const x = depth * (r / radius) ** 2;
      return [centre[0] + x, centre[1] + r * Math.cos(a), centre[2] + r * Math.sin(a)];
    };
    for (let ring = 0; ring < rings; ring += 1) {
      for (let seg = 0; seg < segments; seg += 1) {
        // Concave side towards +x: (b - a) × (c - a) has a +x component.
        if (ring === 0) {
          this.triangle(group, at(0, 0), at(1, seg + 1), at(1, seg));
          continue;
        }
        this.triangle(group, at(ring, seg), at(ring + 1, seg + 1), at(ring + 1, seg));
        this.triangle(group, at(ring, seg), at(ring, seg + 1), at(ring + 1, seg + 1));
      }
    }
    return this;
  }

  mesh(): TriangleMesh {
    return {
      positions: Float64Array.from(this.positions),
      groupOfTriangle: Uint32Array.from(this.groups),
      groupNames: [...this.names],
    };
  }
}

/** Detail of `boxWingMesh`. */
export interface BoxWingDetail {
  /** Cells per bus face edge. */
  bus: number;
  /** Cells along each wing's length (its width gets a third as many, at least 1). */
  wing: number;
  /** Dish rings; segments are 3× as many. */
  dish: number;
}

/**
 * A box-wing spacecraft: bus [-1, 1] × [-1, 1] × [-1.25, 1.25] m (groups 'bus'), two wings in the
 * plane x = 0 on booms along ±y (groups 'wing', thin sheets: give them back optics; 'boom'), and a
 * dish of radius 0.9 m in front of the +x face (group 'dish', two-sided) that shades part of it.
 */
export function boxWingMesh(detail: BoxWingDetail): TriangleMesh {
  const b = new MeshBuilder();
  b.box('bus', [-1, -1, -1.25], [1, 1, 1.25], detail.bus);
  const across = Math.max(1, Math.round(detail.wing / 3));
  for (const side of [1, -1]) {
    // Boom: a thin square rod from the bus to the wing.
    const y0 = side > 0 ? 1 : -1.4;
    b.box('boom', [-0.05, y0, -0.05], [0.05, y0 + 0.4, 0.05], 1);
    // Wing: 6 m × 2 m in the plane x = 0, front normal +x.
    b.parallelogram('wing', [0, side > 0 ? 1.4 : -7.4, -1], [0, 6, 0], [0, 0, 2], detail.wing, across);
  }
  b.dishAlongX('dish', [1.35, 0, 0.2], 0.9, 0.15, detail.dish, 3 * detail.dish);
  // A strut holding the dish off the +x face.
  b.box('boom', [1, -0.05, 0.15], [1.35, 0.05, 0.25], 1);
  return b.mesh();
}

/** The six faces of an axis-aligned box as one-sided plates with `front` optics: the flat-plate model a box mesh must reproduce. */
export function boxPlates(boxMin: Vec3, boxMax: Vec3, front: SurfaceOpticsInput): PlateSpec[] {
  const [x0, y0, z0] = boxMin;
  const [x1, y1, z1] = boxMax;
  const c: Vec3 = [(x0 + x1) / 2, (y0 + y1) / 2, (z0 + z1) / 2];
  const ax = (y1 - y0) * (z1 - z0);
  const ay = (x1 - x0) * (z1 - z0);
  const az = (x1 - x0) * (y1 - y0);
  const plate = (name: string, areaM2: number, normal: Vec3, centroidM: Vec3): PlateSpec => ({ name, areaM2, normal, centroidM, front });
  return [
    plate('+x', ax, [1, 0, 0], [x1, c[1], c[2]]),
    plate('-x', ax, [-1, 0, 0], [x0, c[1], c[2]]),
    plate('+y', ay, [0, 1, 0], [c[0], y1, c[2]]),
    plate('-y', ay, [0, -1, 0], [c[0], y0, c[2]]),
    plate('+z', az, [0, 0, 1], [c[0], c[1], z1]),
    plate('-z', az, [0, 0, -1], [c[0], c[1], z0]),
  ];
}
