/**
 * Mesh import: an OBJ or STL file (bytes in, no file access here) into a triangle mesh in the body
 * frame, metres, with its groups, area and bounds. Format rules are in read-obj.ts and read-stl.ts.
 *
 * Format detection, by content first:
 * 1. binary STL when byteLength = 84 + 50 × (uint32 LE at offset 80), even when the header starts
 *    with `solid`;
 * 2. otherwise a file holding a NUL byte is binary: a binary STL of the wrong size (refused with
 *    the expected and actual sizes);
 * 3. ASCII STL when the text starts (after blanks) with `solid` and holds `facet`;
 * 4. OBJ when a line starts with a vertex `v `;
 * 5. left undecided by content: a `.stl` file name gives ASCII STL (text starting with `solid`)
 *    or binary STL (so a damaged STL gets an STL message), any other name OBJ.
 */
import { SrpError } from '../errors';
import type { TriangleMesh } from './mesh-types';
import { failFile } from './read-mesh-common';
import type { MeshFileFormat, RawTriangles } from './read-mesh-common';
import { readObj } from './read-obj';
import { hasBinaryStlSize, readAsciiStl, readBinaryStl } from './read-stl';

export type { MeshFileFormat, MeshFileErrorDetails } from './read-mesh-common';

/** Length units a mesh file may be written in. */
export type MeshLengthUnit = 'm' | 'mm';


/**
 * Triangles whose area is below this fraction of the squared bounding-box diagonal are dropped as
 * degenerate (repeated or collinear corners): they carry no force and have no usable normal.
 */
export const DEGENERATE_AREA_FRACTION = 1e-12;

/** Options of `readMesh`. */
export interface ReadMeshOptions {
  /** The uploaded file's name: for messages, and a hint when the content is ambiguous. */
  fileName: string;
  /** Units of the file's coordinates. */
  units: MeshLengthUnit;
  /** Rotation into the body frame (°): about X, then Y, then Z, fixed axes, right-handed (R = Rz·Ry·Rx). */
  rotationDeg: readonly [number, number, number];
  /** Translation into the body frame (m), applied after scaling and rotating. */
  translationM: readonly [number, number, number];
  /** Most triangles accepted, counted after polygons are fanned and before degenerate ones are dropped. */
  maxTriangles: number;
}

/** One group of the imported mesh. */
export interface MeshGroupSummary {
  name: string;
  triangleCount: number;
  /** Sum of the group's triangle areas (m²). */
  areaM2: number;
}

/** An imported mesh with what the upload summary shows. */
export interface MeshImport {
  /** Triangles in the body frame (m), counter-clockwise seen from outside; `groupNames` = `groups` names. */
  mesh: TriangleMesh;
  format: MeshFileFormat;
  /** Degenerate (near-zero area or non-finite) triangles dropped. */
  droppedDegenerate: number;
  /** Groups that kept triangles, in the order their first triangle appears; index = `groupOfTriangle` value. */
  groups: MeshGroupSummary[];
  /** Sum of the triangle areas (m²). */
  totalAreaM2: number;
  /** Axis-aligned bounds of the kept triangles in the body frame (m). */
  boundsM: { min: [number, number, number]; max: [number, number, number] };
}

/**
 * Tells the format of a mesh file (rules in the header of read-mesh.ts).
 * @param bytes the whole file
 * @param fileName tie-break hint (`.stl`)
 */
export function detectMeshFileFormat(bytes: Uint8Array, fileName: string): MeshFileFormat {
  if (hasBinaryStlSize(bytes)) return 'stl-binary';
  if (bytes.indexOf(0) !== -1) return 'stl-binary';
  const start = firstNonBlank(bytes);
  const startsWithSolid = startsWithWordIgnoringCase(bytes, start, 'solid');
  if (startsWithSolid && containsAscii(bytes, 'facet')) return 'stl-ascii';
  if (hasObjVertexLine(bytes)) return 'obj';
  if (fileName.trim().toLowerCase().endsWith('.stl')) return startsWithSolid ? 'stl-ascii' : 'stl-binary';
  return 'obj';
}

/**
 * Reads a mesh file into the body frame: coordinates × units, then rotated by R = Rz·Ry·Rx
 * (fixed axes; rotationDeg [0, 0, 90] carries +X onto +Y), then translated; degenerate triangles
 * (area below 1e-12 × the squared diagonal of the bounding box of all vertices, or not finite) are
 * dropped and counted. Allocates; not for hot paths.
 * @param bytes the whole file
 * @returns the mesh with its format, groups, total area (m²) and bounds (m)
 * @throws SrpError with `details.field` = `file` (details of type `MeshFileErrorDetails`):
 *   `invalid_input` for bad syntax (message and `details.line` name the 1-based line), a truncated
 *   binary STL (expected and actual bytes), a NaN or infinite binary STL coordinate (the triangle),
 *   a file without triangles or with only degenerate ones; `out_of_range` above `maxTriangles`
 *   (the limit named). Bad options throw with the option's name as field.
 */
export function readMesh(bytes: Uint8Array, options: ReadMeshOptions): MeshImport {
  const { fileName, maxTriangles } = options;
  const metresPerUnit = options.units === 'm' ? 1 : options.units === 'mm' ? 0.001 : undefined;
  if (metresPerUnit === undefined) {
    throw new SrpError('invalid_input', `units must be one of m, mm; got ${String(options.units)}`, {
      field: 'units',
      value: options.units,
      limit: 'm | mm',
    });
  }
  checkVec3(options.rotationDeg, 'rotationDeg', '°');
  checkVec3(options.translationM, 'translationM', 'm');
  if (!Number.isInteger(maxTriangles) || maxTriangles < 1) {
    throw new SrpError('invalid_input', `maxTriangles must be a positive integer; got ${String(maxTriangles)}`, {
      field: 'maxTriangles',
      value: maxTriangles,
      limit: '>= 1',
    });
  }

  const format = detectMeshFileFormat(bytes, fileName);
  let raw: RawTriangles;
  if (format === 'stl-binary') {
    raw = readBinaryStl(bytes, fileName, maxTriangles);
  } else {
    const text = new TextDecoder('utf-8').decode(bytes);
    raw = format === 'stl-ascii' ? readAsciiStl(text, fileName, maxTriangles) : readObj(text, fileName, maxTriangles);
  }
  const rawCount = raw.groupOfTriangle.length;
  if (rawCount === 0) {
    failFile('invalid_input', fileName, {}, `holds no triangles (read as ${formatLabel(format)})`, 0, '>= 1 triangle');
  }

  const positions = raw.positions;
  transformInPlace(positions, metresPerUnit, options.rotationDeg, options.translationM);
  return keepSolidTriangles(positions, raw, format, fileName);
}

function formatLabel(format: MeshFileFormat): string {
  return format === 'obj' ? 'OBJ' : format === 'stl-ascii' ? 'ASCII STL' : 'binary STL';
}

function checkVec3(value: readonly number[], field: string, unit: string): void {
  if (!Array.isArray(value) || value.length !== 3 || !value.every((c) => typeof c === 'number' && Number.isFinite(c))) {
    throw new SrpError('invalid_input', `${field} must be [x, y, z] of finite numbers (${unit}); got ${JSON.stringify(value)}`, {
      field,
      value,
    });
  }
}

/** cos and sin of an angle in degrees, exact at multiples of 90° so axis-aligned turns keep exact coordinates. */
function cosSinDeg(angleDeg: number): [number, number] {
  const quarterTurns = angleDeg / 90;
  if (Number.isInteger(quarterTurns)) {
    const q = ((quarterTurns % 4) + 4) % 4;
    return q === 0 ? [1, 0] : q === 1 ? [0, 1] : q === 2 ? [-1, 0] : [0, -1];
  }
  const angle = (angleDeg * Math.PI) / 180;
  return [Math.cos(angle), Math.sin(angle)];
}

/**
 * Rotation matrix R = Rz(γ)·Ry(β)·Rx(α) for rotationDeg [α, β, γ]: rotate about the fixed X axis,
 * then Y, then Z, right-handed. Row-major 3×3.
 */
export function meshRotationMatrix(rotationDeg: readonly [number, number, number]): Float64Array {
  const [cx, sx] = cosSinDeg(rotationDeg[0]);
  const [cy, sy] = cosSinDeg(rotationDeg[1]);
  const [cz, sz] = cosSinDeg(rotationDeg[2]);
  // Product written out: Ry·Rx = [[cy, sy·sx, sy·cx], [0, cx, -sx], [-sy, cy·sx, cy·cx]], then Rz on the left.
  return Float64Array.of(
    cz * cy, cz * sy * sx - sz * cx, cz * sy * cx + sz * sx,
    sz * cy, sz * sy * sx + cz * cx, sz * sy * cx - cz * sx,
    -sy, cy * sx, cy * cx,
  );
}

function transformInPlace(
  positions: Float64Array,
  metresPerUnit: number,
  rotationDeg: readonly [number, number, number],
  translationM: readonly [number, number, number],
): void {
  const r = meshRotationMatrix(rotationDeg);
  const s = metresPerUnit;
  const m00 = r[0]! * s, m01 = r[1]! * s, m02 = r[2]! * s;
  const m10 = r[3]! * s, m11 = r[4]! * s, m12 = r[5]! * s;
  const m20 = r[6]! * s, m21 = r[7]! * s, m22 = r[8]! * s;
  const [tx, ty, tz] = translationM;
  for (let i = 0; i < positions.length; i += 3) {
    const x = positions[i]!, y = positions[i + 1]!, z = positions[i + 2]!;
    positions[i] = m00 * x + m01 * y + m02 * z + tx;
    positions[i + 1] = m10 * x + m11 * y + m12 * z + ty;
    positions[i + 2] = m20 * x + m21 * y + m22 * z + tz;
  }
}

/** Area of triangle t (m²), NaN or Infinity when its corners are not finite. */
function triangleArea(p: Float64Array, t: number): number {
  const o = t * 9;
  const ax = p[o + 3]! - p[o]!, ay = p[o + 4]! - p[o + 1]!, az = p[o + 5]! - p[o + 2]!;
  const bx = p[o + 6]! - p[o]!, by = p[o + 7]! - p[o + 1]!, bz = p[o + 8]! - p[o + 2]!;
  const cx = ay * bz - az * by, cy = az * bx - ax * bz, cz = ax * by - ay * bx;
  return 0.5 * Math.sqrt(cx * cx + cy * cy + cz * cz);
}

/** Drops degenerate triangles, renumbers groups by first kept triangle, sums areas, takes bounds. */
function keepSolidTriangles(positions: Float64Array, raw: RawTriangles, format: MeshFileFormat, fileName: string): MeshImport {
  const rawCount = raw.groupOfTriangle.length;
  const min = [Infinity, Infinity, Infinity];
  const max = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < positions.length; i += 3) {
    for (let k = 0; k < 3; k += 1) {
      const v = positions[i + k]!;
      if (v < min[k]!) min[k] = v;
      if (v > max[k]!) max[k] = v;
    }
  }
  const dx = max[0]! - min[0]!, dy = max[1]! - min[1]!, dz = max[2]! - min[2]!;
  const minimumArea = DEGENERATE_AREA_FRACTION * (dx * dx + dy * dy + dz * dz);

  const rawToKeptGroup = new Int32Array(raw.groupNames.length).fill(-1);
  const groups: MeshGroupSummary[] = [];
  const groupOfTriangle = new Uint32Array(rawCount);
  let kept = 0;
  let totalAreaM2 = 0;
  for (let t = 0; t < rawCount; t += 1) {
    const area = triangleArea(positions, t);
    // The negated comparison also drops a NaN area.
    if (!(Number.isFinite(area) && area >= minimumArea)) continue;
    const rawGroup = raw.groupOfTriangle[t]!;
    let group = rawToKeptGroup[rawGroup]!;
    if (group === -1) {
      group = groups.length;
      rawToKeptGroup[rawGroup] = group;
      groups.push({ name: raw.groupNames[rawGroup]!, triangleCount: 0, areaM2: 0 });
    }
    const summary = groups[group]!;
    summary.triangleCount += 1;
    summary.areaM2 += area;
    totalAreaM2 += area;
    groupOfTriangle[kept] = group;
    if (kept !== t) positions.copyWithin(kept * 9, t * 9, t * 9 + 9);
    kept += 1;
  }
  const droppedDegenerate = rawCount - kept;
  if (kept === 0) {
    failFile(
      'invalid_input',
      fileName,
      {},
      `all ${rawCount} triangles are degenerate (zero area, repeated or collinear corners); nothing is left to import`,
      rawCount,
      '>= 1 non-degenerate triangle',
    );
  }

  const keptPositions = kept === rawCount ? positions : positions.slice(0, kept * 9);
  const boundsM = boundsOf(keptPositions);
  return {
    mesh: {
      positions: keptPositions,
      groupOfTriangle: kept === rawCount ? groupOfTriangle : groupOfTriangle.slice(0, kept),
      groupNames: groups.map((g) => g.name),
    },
    format,
    droppedDegenerate,
    groups,
    totalAreaM2,
    boundsM,
  };
}

function boundsOf(positions: Float64Array): MeshImport['boundsM'] {
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

function firstNonBlank(bytes: Uint8Array): number {
  let i = 0;
  // A UTF-8 byte-order mark counts as blank.
  if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) i = 3;
  while (i < bytes.length && (bytes[i] === 32 || (bytes[i]! >= 9 && bytes[i]! <= 13))) i += 1;
  return i;
}

function startsWithWordIgnoringCase(bytes: Uint8Array, at: number, word: string): boolean {
  for (let k = 0; k < word.length; k += 1) {
    const b = bytes[at + k];
    if (b === undefined || (b | 0x20) !== word.charCodeAt(k)) return false;
  }
  const after = bytes[at + word.length];
  return after === undefined || after === 32 || (after >= 9 && after <= 13);
}

/** Whether a line starts (after blanks) with `v` and a blank: an OBJ vertex. */
function hasObjVertexLine(bytes: Uint8Array): boolean {
  let lineStart = true;
  for (let i = 0; i < bytes.length; i += 1) {
    const b = bytes[i]!;
    if (b === 10 || b === 13) {
      lineStart = true;
    } else if (lineStart && b !== 32 && b !== 9) {
      const after = bytes[i + 1];
      if (b === 118 && (after === 32 || after === 9)) return true;
      lineStart = false;
    }
  }
  return false;
}

/** Whether `bytes` holds `word` (lower-case ASCII letters), in any letter case. */
function containsAscii(bytes: Uint8Array, word: string): boolean {
  const first = word.charCodeAt(0);
  const last = bytes.length - word.length;
  for (let i = 0; i <= last; i += 1) {
    if ((bytes[i]! | 0x20) !== first) continue;
    let k = 1;
    while (k < word.length && (bytes[i + k]! | 0x20) === word.charCodeAt(k)) k += 1;
    if (k === word.length) return true;
  }
  return false;
}
