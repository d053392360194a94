/*
 * The binary geometry of a mesh as `GET .../meshes/:meshId/geometry` answers it (api-meshes.ts):
 * little-endian, triangleCount × 9 float32 coordinates (m, body frame, v0 v1 v2 per triangle,
 * counter-clockwise seen from outside), then triangleCount uint32 group indices.
 */

/** A mesh's triangles, ready for the 3D view and for srp-core. */
export interface MeshGeometry {
  triangleCount: number;
  /** 9 per triangle (m, body frame). */
  positions: Float32Array;
  /** Group index of each triangle. */
  groupOfTriangle: Uint32Array;
}

/** Bytes per triangle: 9 float32 and one uint32. */
const BYTES_PER_TRIANGLE = 9 * 4 + 4;

/**
 * Reads the binary geometry; `expectedCount` (the X-Triangle-Count header), when given, must agree
 * with the length. Copies into aligned arrays, read little-endian whatever the platform.
 * @throws Error when the length does not fit the layout
 */
export function parseMeshGeometry(buffer: ArrayBuffer, expectedCount?: number): MeshGeometry {
  if (buffer.byteLength % BYTES_PER_TRIANGLE !== 0) {
    throw new Error(`${buffer.byteLength} bytes is not a whole number of triangles (${BYTES_PER_TRIANGLE} bytes each)`);
  }
  const triangleCount = buffer.byteLength / BYTES_PER_TRIANGLE;
  if (expectedCount !== undefined && Number.isFinite(expectedCount) && expectedCount !== triangleCount) {
    throw new Error(`the header says ${expectedCount} triangles but the body holds ${triangleCount}`);
  }
  const view = new DataView(buffer);
  const positions = new Float32Array(triangleCount * 9);
  for (let i = 0; i < positions.length; i += 1) positions[i] = view.getFloat32(4 * i, true);
  const groupOfTriangle = new Uint32Array(triangleCount);
  const offset = 36 * triangleCount;
  for (let i = 0; i < triangleCount; i += 1) groupOfTriangle[i] = view.getUint32(offset + 4 * i, true);
  return { triangleCount, positions, groupOfTriangle };
}

/** Writes geometry in the API's layout (for tests and fixtures). */
export function encodeMeshGeometry(positions: ArrayLike<number>, groups: ArrayLike<number>): ArrayBuffer {
  const count = groups.length;
  const buffer = new ArrayBuffer(count * BYTES_PER_TRIANGLE);
  const view = new DataView(buffer);
  for (let i = 0; i < count * 9; i += 1) view.setFloat32(4 * i, positions[i] ?? 0, true);
  for (let i = 0; i < count; i += 1) view.setUint32(36 * count + 4 * i, groups[i] ?? 0, true);
  return buffer;
}

/** Unit front normal of each triangle (stride 3; zeros for a degenerate one), from the winding. */
export function facetNormals(positions: ArrayLike<number>, triangleCount: number): Float32Array {
  const out = new Float32Array(triangleCount * 3);
  for (let t = 0; t < triangleCount; t += 1) {
    const o = 9 * t;
    const ax = positions[o + 3]! - positions[o]!;
    const ay = positions[o + 4]! - positions[o + 1]!;
    const az = positions[o + 5]! - positions[o + 2]!;
    const bx = positions[o + 6]! - positions[o]!;
    const by = positions[o + 7]! - positions[o + 1]!;
    const bz = positions[o + 8]! - positions[o + 2]!;
    const nx = ay * bz - az * by;
    const ny = az * bx - ax * bz;
    const nz = ax * by - ay * bx;
    const len = Math.hypot(nx, ny, nz);
    if (len > 0) {
      out[3 * t] = nx / len;
      out[3 * t + 1] = ny / len;
      out[3 * t + 2] = nz / len;
    }
  }
  return out;
}

/** Axis-aligned bounds of the positions (m). */
export function geometryBounds(positions: ArrayLike<number>): { min: [number, number, number]; max: [number, number, number] } {
  const min: [number, number, number] = [Infinity, Infinity, Infinity];
  const max: [number, number, number] = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < positions.length; i += 3) {
    for (let k = 0; k < 3; k += 1) {
      const v = positions[i + k]!;
      if (v < min[k]!) min[k] = v;
      if (v > max[k]!) max[k] = v;
    }
  }
  return { min, max };
}
