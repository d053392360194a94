/**
 * Reader of Wavefront OBJ text (geometry only).
 *
 * Read: `v x y z [w]` (w and any further numbers, such as vertex colours, ignored); `f` with
 * corners `i`, `i/t`, `i//n` or `i/t/n`, only `i` used; an index counts from 1, a negative one
 * back from the last vertex defined so far (-1 = the latest); an index must name a vertex defined
 * on an earlier line. A polygon with n > 3 corners is fanned from its first corner into n - 2
 * triangles (c0 c1 c2, c0 c2 c3, ...), keeping its winding. `#` starts a comment; a line whose
 * last non-blank character (after its comment is removed) is `\` continues on the next line.
 * Everything else (`vn`, `vt`, `vp`, `s`, `mtllib`, `l`, `p`, free-form geometry, unknown keywords)
 * is ignored.
 *
 * Group name of a face: the name of the `usemtl` in effect, if any; otherwise the last `g` or `o`
 * name; otherwise `default`. A name is the rest of its line, trimmed (`g wing left` → `wing left`);
 * `g`/`o` without a name go back to `default`, `usemtl` without a name ends the material so the
 * `g`/`o` name applies again. Materials win because optics are assigned per material when the
 * file has them, and an exporter's `g` names are often per object part.
 */
import {
  DEFAULT_GROUP_NAME,
  failFile,
  failTooManyTriangles,
  GroupNameTable,
  GrowableFloat64,
  GrowableUint32,
  isSpace,
  LineReader,
  parseDecimal,
  skipSpaces,
  tokenEnd,
} from './read-mesh-common';
import type { RawTriangles } from './read-mesh-common';

const coordinateNames = ['x', 'y', 'z'] as const;
/** The coordinates of the `v` line being read (no allocation per vertex). */
const vertexScratch = new Float64Array(3);

/**
 * Reads the triangles of an OBJ file.
 * @param text the whole file
 * @param fileName for messages
 * @param maxTriangles most triangles accepted (after fanning)
 * @throws SrpError `invalid_input` naming the line: a coordinate that is not a finite decimal
 *   number, fewer than 3 coordinates, a face index that is not an integer, is 0 or names no vertex
 *   defined before the line, a face with fewer than 3 corners; `out_of_range` beyond `maxTriangles`
 */
export function readObj(text: string, fileName: string, maxTriangles: number): RawTriangles {
  const vertices = new GrowableFloat64();
  const corners = new GrowableUint32(); // 3 vertex indices (0-based) per triangle
  const triangleGroups = new GrowableUint32();
  const groups = new GroupNameTable();

  let objectName = DEFAULT_GROUP_NAME;
  let materialName: string | undefined;
  let currentGroup = -1; // resolved lazily when a face arrives
  const faceCorners: number[] = [];

  const reader = new LineReader(text);
  for (;;) {
    let line = reader.next();
    if (line === undefined) break;
    const lineNumber = reader.lineNumber;
    line = withoutComment(line);
    while (endsWithBackslash(line)) {
      const next = reader.next();
      line = line.slice(0, line.lastIndexOf('\\')) + ' ' + (next === undefined ? '' : withoutComment(next));
      if (next === undefined) break;
    }

    const start = skipSpaces(line, 0);
    if (start >= line.length) continue;
    const end = tokenEnd(line, start);
    const keyword = line.slice(start, end);

    if (keyword === 'v') {
      let at = end;
      for (let k = 0; k < 3; k += 1) {
        const tokenStart = skipSpaces(line, at);
        if (tokenStart >= line.length) {
          failFile('invalid_input', fileName, { line: lineNumber }, `v has ${k} coordinates; expected 3 numbers "v x y z"`, line.trim());
        }
        at = tokenEnd(line, tokenStart);
        const token = line.slice(tokenStart, at);
        const value = parseDecimal(token);
        if (Number.isNaN(value)) {
          failFile(
            'invalid_input',
            fileName,
            { line: lineNumber },
            `the ${coordinateNames[k]} coordinate of v, "${token}", is not a finite decimal number`,
            token,
          );
        }
        vertexScratch[k] = value;
      }
      vertices.push3(vertexScratch[0]!, vertexScratch[1]!, vertexScratch[2]!);
    } else if (keyword === 'f') {
      const vertexCount = vertices.length / 3;
      faceCorners.length = 0;
      let at = skipSpaces(line, end);
      while (at < line.length) {
        const tokenStopAt = tokenEnd(line, at);
        const slash = line.indexOf('/', at);
        const indexEnd = slash !== -1 && slash < tokenStopAt ? slash : tokenStopAt;
        const indexText = line.slice(at, indexEnd);
        const index = parseIndex(indexText);
        if (index === undefined) {
          failFile(
            'invalid_input',
            fileName,
            { line: lineNumber },
            `face corner "${line.slice(at, tokenStopAt)}" must start with a vertex index (a non-zero integer)`,
            line.slice(at, tokenStopAt),
          );
        }
        const resolved = index > 0 ? index - 1 : vertexCount + index;
        if (index === 0 || resolved < 0 || resolved >= vertexCount) {
          failFile(
            'invalid_input',
            fileName,
            { line: lineNumber },
            index === 0
              ? 'face vertex index 0 is not allowed (indices count from 1, or back from -1)'
              : `face vertex index ${index} is out of range: ${vertexCount} vertices are defined before this line` +
                  ` (allowed 1..${vertexCount} or -${vertexCount}..-1)`,
            index,
            vertexCount === 0 ? 'no vertices defined' : `1..${vertexCount} or -${vertexCount}..-1`,
          );
        }
        faceCorners.push(resolved);
        at = skipSpaces(line, tokenStopAt);
      }
      if (faceCorners.length < 3) {
        failFile(
          'invalid_input',
          fileName,
          { line: lineNumber },
          `a face needs at least 3 corners; this one has ${faceCorners.length}`,
          line.trim(),
          '>= 3 corners',
        );
      }
      if (currentGroup === -1) currentGroup = groups.indexOf(materialName ?? objectName);
      const first = faceCorners[0]!;
      for (let k = 1; k + 1 < faceCorners.length; k += 1) {
        if (triangleGroups.length >= maxTriangles) {
          failTooManyTriangles(fileName, `more than ${maxTriangles}`, maxTriangles, lineNumber);
        }
        corners.push(first);
        corners.push(faceCorners[k]!);
        corners.push(faceCorners[k + 1]!);
        triangleGroups.push(currentGroup);
      }
    } else if (keyword === 'g' || keyword === 'o') {
      const name = line.slice(end).trim();
      objectName = name === '' ? DEFAULT_GROUP_NAME : name;
      currentGroup = -1;
    } else if (keyword === 'usemtl') {
      const name = line.slice(end).trim();
      materialName = name === '' ? undefined : name;
      currentGroup = -1;
    }
    // Anything else: ignored (normals, texture coordinates, smoothing, libraries, lines, points).
  }

  const triangleCount = triangleGroups.length;
  const positions = new Float64Array(triangleCount * 9);
  const vertexData = vertices.data;
  const cornerData = corners.data;
  for (let c = 0; c < triangleCount * 3; c += 1) {
    const v = cornerData[c]! * 3;
    positions[c * 3] = vertexData[v]!;
    positions[c * 3 + 1] = vertexData[v + 1]!;
    positions[c * 3 + 2] = vertexData[v + 2]!;
  }
  return { positions, groupOfTriangle: triangleGroups.toArray(), groupNames: groups.names };
}

function withoutComment(line: string): string {
  const hash = line.indexOf('#');
  return hash === -1 ? line : line.slice(0, hash);
}

function endsWithBackslash(line: string): boolean {
  let i = line.length - 1;
  while (i >= 0 && isSpace(line.charCodeAt(i))) i -= 1;
  return i >= 0 && line.charCodeAt(i) === 92;
}

/** @returns the integer written in `text` (optional sign, digits only), or undefined */
function parseIndex(text: string): number | undefined {
  if (text.length === 0) return undefined;
  let i = text.charCodeAt(0) === 45 || text.charCodeAt(0) === 43 ? 1 : 0;
  if (i === text.length) return undefined;
  for (; i < text.length; i += 1) {
    const c = text.charCodeAt(i);
    if (c < 48 || c > 57) return undefined;
  }
  const value = Number(text);
  return Number.isSafeInteger(value) ? value : undefined;
}
