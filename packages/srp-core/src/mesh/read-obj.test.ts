import { describe, expect, it } from 'vitest';
import { SrpError } from '../errors';
import { readMesh } from './read-mesh';
import type { MeshFileErrorDetails } from './read-mesh';

const options = { fileName: 'panel.obj', units: 'm', rotationDeg: [0, 0, 0], translationM: [0, 0, 0], maxTriangles: 100 } as const;

function readObjText(lines: string[]) {
  return readMesh(new TextEncoder().encode(lines.join('\n')), options);
}

/** Expects the text to be refused as invalid_input, the message and details naming the line. */
function expectLineError(lines: string[], line: number, messagePart: string): void {
  let error: unknown;
  try {
    readObjText(lines);
  } catch (e) {
    error = e;
  }
  expect(error).toBeInstanceOf(SrpError);
  const srpError = error as SrpError;
  expect(srpError.code).toBe('invalid_input');
  expect((srpError.details as MeshFileErrorDetails).line).toBe(line);
  expect(srpError.details.field).toBe('file');
  expect(srpError.message).toContain(`line ${line}:`);
  expect(srpError.message).toContain('panel.obj');
  expect(srpError.message).toContain(messagePart);
}

const SQUARE = ['# a square', 'o square', 'v 0 0 0', 'v 1 0 0', 'v 1 1 0', 'v 0 1 0'];

describe('readMesh on OBJ: errors name the line', () => {
  it('a bad number on line 7 says line 7 and which coordinate', () => {
    expectLineError([...SQUARE, 'v 1 1.2.3 0', 'f 1 2 3'], 7, 'the y coordinate of v, "1.2.3"');
  });

  it('hexadecimal, infinite and overflowing coordinates are not accepted as numbers', () => {
    for (const bad of ['0x10', 'Infinity', 'inf', '1e999']) {
      expectLineError([...SQUARE, `v ${bad} 0 0`], 7, `"${bad}"`);
    }
  });

  it('a vertex with fewer than 3 coordinates is refused', () => {
    expectLineError([...SQUARE, 'v 1 2'], 7, 'v has 2 coordinates');
  });

  it('a face index beyond the vertices defined so far names the line and the allowed range', () => {
    expectLineError([...SQUARE, 'f 1 2 5', 'v 0 0 1'], 7, 'index 5 is out of range: 4 vertices');
    expectLineError([...SQUARE, 'f -1 -2 -5'], 7, 'index -5 is out of range');
  });

  it('index 0, a non-integer index and a face of 2 corners are refused', () => {
    expectLineError([...SQUARE, 'f 0 1 2'], 7, 'index 0 is not allowed');
    expectLineError([...SQUARE, 'f 1 2.5 3'], 7, '"2.5"');
    expectLineError([...SQUARE, 'f 1 /2 3'], 7, '"/2"');
    expectLineError([...SQUARE, 'f 1 2'], 7, 'at least 3 corners');
  });

  it('a continued line is reported at its first line; CRLF and blank lines count like an editor', () => {
    expectLineError([...SQUARE, '', 'f 1 2 \\', '  9'], 8, 'index 9');
    let error: unknown;
    try {
      readMesh(new TextEncoder().encode([...SQUARE, 'v a 0 0'].join('\r\n')), options);
    } catch (e) {
      error = e;
    }
    expect((error as SrpError).message).toContain('line 7:');
  });
});

describe('readMesh on OBJ: what is read and what is ignored', () => {
  it('unknown keywords, normals, texture coordinates, lines and points are ignored', () => {
    const result = readObjText([...SQUARE, 'vn 0 0 1', 'vt 0.5 0.5', 'l 1 2', 'p 3', 'bevel off', 'frobnicate 1 2', 'f 1 2 3 4']);
    expect(result.mesh.groupOfTriangle.length).toBe(2);
    expect(result.groups).toEqual([{ name: 'square', triangleCount: 2, areaM2: 1 }]);
  });

  it('a pentagon is fanned from its first corner into 3 triangles keeping the winding', () => {
    const result = readObjText(['v 0 0 0', 'v 2 0 0', 'v 2 1 0', 'v 1 2 0', 'v 0 1 0', 'f 1 2 3 4 5']);
    const p = result.mesh.positions;
    const corners = Array.from({ length: 3 }, (_, t) => [0, 1, 2].map((c) => `${p[t * 9 + c * 3]},${p[t * 9 + c * 3 + 1]}`));
    expect(corners).toEqual([
      ['0,0', '2,0', '2,1'],
      ['0,0', '2,1', '1,2'],
      ['0,0', '1,2', '0,1'],
    ]);
    // Shoelace area of the pentagon: 2 + 1 = 3 m² (rectangle 2×1 plus the roof triangle of base 2, height 1).
    expect(result.totalAreaM2).toBeCloseTo(3, 12);
  });

  it('a UTF-8 byte-order mark and group names with spaces and non-ASCII letters are kept', () => {
    const bytes = new TextEncoder().encode('\uFEFFv 0 0 0\nv 1 0 0\nv 0 1 0\ng  Solarflügel links  \nf 1 2 3\n');
    expect(readMesh(bytes, options).mesh.groupNames).toEqual(['Solarflügel links']);
  });
});
