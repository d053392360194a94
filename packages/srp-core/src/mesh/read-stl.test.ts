import { describe, expect, it } from 'vitest';
import { SrpError } from '../errors';
import { readMesh } from './read-mesh';
import type { MeshFileErrorDetails } from './read-mesh';

const options = { fileName: 'bus.stl', units: 'm', rotationDeg: [0, 0, 0], translationM: [0, 0, 0], maxTriangles: 100 } as const;

function caught(bytes: Uint8Array): SrpError {
  try {
    readMesh(bytes, options);
  } catch (error) {
    if (error instanceof SrpError) return error;
    throw error;
  }
  throw new Error('expected an SrpError');
}

const FACET = ['facet normal 0 0 1', 'outer loop', 'vertex 0 0 0', 'vertex 1 0 0', 'vertex 0 1 0', 'endloop', 'endfacet'];

function ascii(lines: string[]): Uint8Array {
  return new TextEncoder().encode(lines.join('\n'));
}

/** A binary STL of `count` copies of the triangle (0,0,0) (1,0,0) (0,1,0). */
function binary(count: number): Uint8Array {
  const bytes = new Uint8Array(84 + 50 * count);
  const view = new DataView(bytes.buffer);
  view.setUint32(80, count, true);
  for (let t = 0; t < count; t += 1) {
    view.setFloat32(84 + 50 * t + 24, 1, true); // v1.x
    view.setFloat32(84 + 50 * t + 40, 1, true); // v2.y
  }
  return bytes;
}

function expectLineError(lines: string[], line: number, messagePart: string): void {
  const error = caught(ascii(lines));
  expect(error.code).toBe('invalid_input');
  expect((error.details as MeshFileErrorDetails).line).toBe(line);
  expect(error.message).toContain(`bus.stl, line ${line}:`);
  expect(error.message).toContain(messagePart);
}

describe('readMesh on ASCII STL', () => {
  it('upper-case keywords, indentation, blank lines and a missing final endsolid are accepted', () => {
    const lines = ['SOLID part', '', ...FACET.map((l) => `   ${l.toUpperCase()}`)];
    const result = readMesh(ascii(lines), options);
    expect(result.format).toBe('stl-ascii');
    expect(result.groups).toEqual([{ name: 'part', triangleCount: 1, areaM2: 0.5 }]);
  });

  it('a bad coordinate names its line', () => {
    expectLineError(['solid a', ...FACET.slice(0, 3), 'vertex 1 zero 0'], 5, 'the y coordinate of vertex, "zero"');
  });

  it('a facet with 2 or 4 vertices, a missing outer loop, and a stray keyword are refused with their line', () => {
    expectLineError(['solid a', ...FACET.slice(0, 4), 'endloop'], 6, 'has 2 vertices');
    expectLineError(['solid a', ...FACET.slice(0, 5), 'vertex 1 1 0'], 7, 'more than 3 vertices');
    expectLineError(['solid a', 'facet normal 0 0 1', 'vertex 0 0 0'], 3, 'expected "outer loop"');
    expectLineError(['solid a', ...FACET, 'vertex 0 0 0'], 9, 'expected "facet normal nx ny nz" or "endsolid"');
    expectLineError(['solid a', ...FACET.slice(0, 6), 'endsolid a'], 8, 'expected "endfacet"');
  });

  it('a file ending inside a facet names the line the facet started on', () => {
    expectLineError(['solid a', ...FACET, ...FACET.slice(0, 4)], 12, 'facet started on line 9');
  });
});

describe('readMesh on binary STL', () => {
  it('reads the stated number of triangles', () => {
    const result = readMesh(binary(3), options);
    expect(result.format).toBe('stl-binary');
    expect(result.mesh.groupOfTriangle.length).toBe(3);
    expect(result.totalAreaM2).toBe(1.5);
  });

  it('a truncated file says the expected and the actual size', () => {
    const error = caught(binary(3).subarray(0, 200));
    expect(error.code).toBe('invalid_input');
    expect(error.message).toContain('must have 234 bytes');
    expect(error.message).toContain('has 200 bytes');
    expect(error.details).toMatchObject({ field: 'file', value: 200, limit: 234 });
  });

  it('a file shorter than the header says so', () => {
    const error = caught(new Uint8Array(40));
    expect(error.message).toContain('at least 84 bytes');
    expect(error.message).toContain('has 40 bytes');
  });

  it('a NaN or infinite coordinate names the triangle', () => {
    for (const bad of [Number.NaN, Number.POSITIVE_INFINITY]) {
      const bytes = binary(4);
      new DataView(bytes.buffer).setFloat32(84 + 50 * 2 + 12 + 12 + 8, bad, true); // triangle 3, v1.z
      const error = caught(bytes);
      expect(error.message).toContain('triangle 3');
      expect(error.message).toContain('vertex 2 coordinate z');
      expect((error.details as MeshFileErrorDetails).triangle).toBe(3);
    }
  });

  it('a stated count above the limit is refused before anything is read', () => {
    const error = caught(binary(101));
    expect(error.code).toBe('out_of_range');
    expect(error.details).toMatchObject({ field: 'file', value: 101, limit: 100 });
  });
});
