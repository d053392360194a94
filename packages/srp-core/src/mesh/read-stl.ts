/**
 * Readers of STL files, ASCII and binary.
 *
 * Winding: the vertex order is trusted (counter-clockwise seen from outside, the STL rule); the
 * stated facet normal is not read at all, since exporters often write zero or stale normals
 * and the winding is what the rest of the product uses.
 *
 * ASCII: `solid [name]`, then per facet `facet normal nx ny nz`, `outer loop`, three
 * `vertex x y z`, `endloop`, `endfacet`, and `endsolid [name]`; keywords in any letter case,
 * blank lines allowed. Each solid's name is the group of its facets (`default` when unnamed);
 * several solids in one file give several groups, solids of the same name share one. A missing
 * final `endsolid` is accepted.
 *
 * Binary: an 80-byte header (ignored; all facets go in group `default`), a uint32 triangle count
 * (little-endian), then 50 bytes per triangle: 12 float32 (normal, v0, v1, v2) and a uint16
 * attribute (ignored).
 */
import {
  DEFAULT_GROUP_NAME,
  failFile,
  failTooManyTriangles,
  GroupNameTable,
  GrowableFloat64,
  GrowableUint32,
  LineReader,
  parseDecimal,
  skipSpaces,
  tokenEnd,
} from './read-mesh-common';
import type { RawTriangles } from './read-mesh-common';

/** Bytes before the first binary STL triangle: 80-byte header and the uint32 count. */
export const STL_BINARY_HEADER_BYTES = 84;
/** Bytes per binary STL triangle. */
export const STL_BINARY_TRIANGLE_BYTES = 50;

/** @returns whether `bytes` has exactly the size a binary STL with its stated count has */
export function hasBinaryStlSize(bytes: Uint8Array): boolean {
  if (bytes.byteLength < STL_BINARY_HEADER_BYTES) return false;
  const count = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength).getUint32(80, true);
  return bytes.byteLength === STL_BINARY_HEADER_BYTES + STL_BINARY_TRIANGLE_BYTES * count;
}

/**
 * Reads a binary STL.
 * @throws SrpError `invalid_input` for a file whose size is not 84 + 50 × count (saying the
 *   expected and actual bytes) or a vertex coordinate that is NaN or infinite (naming the
 *   1-based triangle); `out_of_range` for a count above `maxTriangles`
 */
export function readBinaryStl(bytes: Uint8Array, fileName: string, maxTriangles: number): RawTriangles {
  if (bytes.byteLength < STL_BINARY_HEADER_BYTES) {
    failFile(
      'invalid_input',
      fileName,
      {},
      `a binary STL needs at least ${STL_BINARY_HEADER_BYTES} bytes (80-byte header and triangle count); ` +
        `the file has ${bytes.byteLength} bytes (truncated, or not an STL, OBJ or ASCII STL file)`,
      bytes.byteLength,
      STL_BINARY_HEADER_BYTES,
    );
  }
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const count = view.getUint32(80, true);
  const expectedBytes = STL_BINARY_HEADER_BYTES + STL_BINARY_TRIANGLE_BYTES * count;
  if (bytes.byteLength !== expectedBytes) {
    failFile(
      'invalid_input',
      fileName,
      {},
      `binary STL stating ${count} triangles must have ${expectedBytes} bytes (84 + 50 × ${count}); ` +
        `the file has ${bytes.byteLength} bytes (${bytes.byteLength < expectedBytes ? 'truncated' : 'extra bytes at the end'}, or not a mesh file)`,
      bytes.byteLength,
      expectedBytes,
    );
  }
  if (count > maxTriangles) failTooManyTriangles(fileName, count, maxTriangles);

  const positions = new Float64Array(count * 9);
  for (let t = 0; t < count; t += 1) {
    // Skip the stated normal (12 bytes); read v0, v1, v2.
    const base = STL_BINARY_HEADER_BYTES + t * STL_BINARY_TRIANGLE_BYTES + 12;
    for (let k = 0; k < 9; k += 1) {
      const value = view.getFloat32(base + 4 * k, true);
      if (!Number.isFinite(value)) {
        failFile(
          'invalid_input',
          fileName,
          { triangle: t + 1 },
          `vertex ${Math.floor(k / 3) + 1} coordinate ${'xyz'[k % 3]} is ${String(value)} (triangle ${t + 1} of ${count}); ` +
            'coordinates must be finite numbers',
          value,
        );
      }
      positions[t * 9 + k] = value;
    }
  }
  return { positions, groupOfTriangle: new Uint32Array(count), groupNames: [DEFAULT_GROUP_NAME] };
}

type AsciiState = 'outside' | 'solid' | 'facet' | 'loop' | 'endloop';

/**
 * Reads an ASCII STL.
 * @throws SrpError `invalid_input` naming the line: a keyword out of place, a loop without
 *   exactly 3 vertices, a coordinate that is not a finite decimal number, a file ending inside a
 *   facet; `out_of_range` beyond `maxTriangles`
 */
export function readAsciiStl(text: string, fileName: string, maxTriangles: number): RawTriangles {
  const positions = new GrowableFloat64();
  const triangleGroups = new GrowableUint32();
  const groups = new GroupNameTable();
  let currentGroup = 0;
  let state: AsciiState = 'outside';
  let facetLine = 0;
  let loopVertices = 0;
  const facet = new Float64Array(9);

  const fail = (line: number, problem: string, value: unknown): never =>
    failFile('invalid_input', fileName, { line }, problem, value);

  const reader = new LineReader(text);
  for (;;) {
    const line = reader.next();
    if (line === undefined) break;
    const lineNumber = reader.lineNumber;
    const start = skipSpaces(line, 0);
    if (start >= line.length) continue;
    const end = tokenEnd(line, start);
    const keyword = line.slice(start, end).toLowerCase();

    switch (state) {
      case 'outside':
        if (keyword !== 'solid') fail(lineNumber, `expected "solid <name>", found "${line.trim()}"`, line.trim());
        {
          const name = line.slice(end).trim();
          currentGroup = groups.indexOf(name === '' ? DEFAULT_GROUP_NAME : name);
        }
        state = 'solid';
        break;
      case 'solid':
        if (keyword === 'facet') {
          facetLine = lineNumber;
          state = 'facet';
        } else if (keyword === 'endsolid') {
          state = 'outside';
        } else {
          fail(lineNumber, `expected "facet normal nx ny nz" or "endsolid", found "${line.trim()}"`, line.trim());
        }
        break;
      case 'facet': {
        const second = skipSpaces(line, end);
        if (keyword !== 'outer' || line.slice(second, tokenEnd(line, second)).toLowerCase() !== 'loop') {
          fail(lineNumber, `expected "outer loop" after the facet on line ${facetLine}, found "${line.trim()}"`, line.trim());
        }
        loopVertices = 0;
        state = 'loop';
        break;
      }
      case 'loop':
        if (keyword === 'vertex') {
          if (loopVertices === 3) fail(lineNumber, `the facet on line ${facetLine} has more than 3 vertices; STL facets are triangles`, line.trim());
          let at = end;
          for (let k = 0; k < 3; k += 1) {
            const tokenStart = skipSpaces(line, at);
            if (tokenStart >= line.length) fail(lineNumber, `vertex has ${k} coordinates; expected "vertex x y z"`, line.trim());
            at = tokenEnd(line, tokenStart);
            const token = line.slice(tokenStart, at);
            const value = parseDecimal(token);
            if (Number.isNaN(value)) {
              fail(lineNumber, `the ${'xyz'[k]} coordinate of vertex, "${token}", is not a finite decimal number`, token);
            }
            facet[loopVertices * 3 + k] = value;
          }
          loopVertices += 1;
        } else if (keyword === 'endloop') {
          if (loopVertices !== 3) {
            fail(lineNumber, `the facet on line ${facetLine} has ${loopVertices} vertices; STL facets need exactly 3`, loopVertices);
          }
          state = 'endloop';
        } else {
          fail(lineNumber, `expected "vertex x y z" or "endloop", found "${line.trim()}"`, line.trim());
        }
        break;
      case 'endloop':
        if (keyword !== 'endfacet') fail(lineNumber, `expected "endfacet", found "${line.trim()}"`, line.trim());
        if (triangleGroups.length >= maxTriangles) {
          failTooManyTriangles(fileName, `more than ${maxTriangles}`, maxTriangles, lineNumber);
        }
        positions.push3(facet[0]!, facet[1]!, facet[2]!);
        positions.push3(facet[3]!, facet[4]!, facet[5]!);
        positions.push3(facet[6]!, facet[7]!, facet[8]!);
        triangleGroups.push(currentGroup);
        state = 'solid';
        break;
    }
  }
  if (state === 'facet' || state === 'loop' || state === 'endloop') {
    fail(reader.lineNumber, `the file ends inside the facet started on line ${facetLine}`, facetLine);
  }
  return { positions: positions.toArray(), groupOfTriangle: triangleGroups.toArray(), groupNames: groups.names };
}
