import { describe, expect, it } from 'vitest';
import { SrpError } from '../errors';
import { detectMeshFileFormat, meshRotationMatrix, readMesh } from './read-mesh';
import type { MeshImport, ReadMeshOptions } from './read-mesh';

type Triple = [number, number, number];

/** Unit cube [0, 1]³: corners numbered 1..8 as in an OBJ file. */
const CUBE_CORNERS: Triple[] = [
  [0, 0, 0], [1, 0, 0], [1, 1, 0], [0, 1, 0],
  [0, 0, 1], [1, 0, 1], [1, 1, 1], [0, 1, 1],
];
/** Its six faces as 1-based corner quads, counter-clockwise seen from outside (-z, +z, -y, +y, -x, +x). */
const CUBE_QUADS: number[][] = [
  [1, 4, 3, 2], [5, 6, 7, 8], [1, 2, 6, 5], [4, 8, 7, 3], [1, 5, 8, 4], [2, 3, 7, 6],
];

/** The cube's 12 triangles, each quad fanned from its first corner. */
function cubeTriangles(scale = 1): Triple[][] {
  return CUBE_QUADS.flatMap(([a, b, c, d]) =>
    [[a!, b!, c!], [a!, c!, d!]].map((tri) => tri.map((i) => CUBE_CORNERS[i - 1]!.map((x) => x * scale) as Triple)),
  );
}

const encoder = new TextEncoder();

function asciiStl(solids: { name: string; triangles: Triple[][] }[]): Uint8Array {
  const lines: string[] = [];
  for (const solid of solids) {
    lines.push(`solid ${solid.name}`);
    for (const [v0, v1, v2] of solid.triangles) {
      // A deliberately wrong stated normal: the reader must follow the winding, not this.
      lines.push('  facet normal 0 0 0', '    outer loop');
      for (const v of [v0!, v1!, v2!]) lines.push(`      vertex ${v[0]} ${v[1]} ${v[2]}`);
      lines.push('    endloop', '  endfacet');
    }
    lines.push(`endsolid ${solid.name}`);
  }
  return encoder.encode(lines.join('\n') + '\n');
}

function binaryStl(triangles: Triple[][], header = 'binary test mesh'): Uint8Array {
  const bytes = new Uint8Array(84 + 50 * triangles.length);
  bytes.set(encoder.encode(header).subarray(0, 80));
  const view = new DataView(bytes.buffer);
  view.setUint32(80, triangles.length, true);
  triangles.forEach((tri, t) => {
    tri.forEach((v, k) => v.forEach((x, c) => view.setFloat32(84 + 50 * t + 12 + 12 * k + 4 * c, x, true)));
  });
  return bytes;
}

/** The cube as OBJ: quads, mixing index forms, 1-based and negative (relative) indices. */
const CUBE_OBJ = [
  '# unit cube',
  'mtllib cube.mtl',
  'v 0 0 0',
  'v 1 0 0',
  'v 1 1 0',
  'v 0 1 0',
  'vt 0 0',
  'vn 0 0 -1',
  'f -4 -1 -2 -3 # bottom, relative to the 4 vertices so far: 1 4 3 2',
  'v 0 0 1',
  'v 1 0 1 1.0',
  'v 1 1 1',
  'v 0 1 1',
  's off',
  'f 5/1 6/1 7/1 8/1',
  'f 1//1 2//1 6//1 5//1',
  'f 4/1/1 8/1/1 \\',
  '  7/1/1 3/1/1',
  'f -8 -4 -1 -5',
  'f 2 3 7 6',
].join('\r\n');

const defaults: ReadMeshOptions = {
  fileName: 'test.obj',
  units: 'm',
  rotationDeg: [0, 0, 0],
  translationM: [0, 0, 0],
  maxTriangles: 1000,
};

function read(content: string | Uint8Array, options: Partial<ReadMeshOptions> = {}): MeshImport {
  return readMesh(typeof content === 'string' ? encoder.encode(content) : content, { ...defaults, ...options });
}

function caught(act: () => unknown): SrpError {
  try {
    act();
  } catch (error) {
    if (error instanceof SrpError) return error;
    throw error;
  }
  throw new Error('expected an SrpError');
}

function vertex(result: MeshImport, triangle: number, corner: number): Triple {
  const o = triangle * 9 + corner * 3;
  const p = result.mesh.positions;
  return [p[o]!, p[o + 1]!, p[o + 2]!];
}

function sub(a: Triple, b: Triple): Triple {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}

function cross(a: Triple, b: Triple): Triple {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

function dot(a: Triple, b: Triple): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

/** Checks the unit cube: 12 triangles, 6 m², bounds [0, 1]³, every normal pointing away from the centre. */
function expectUnitCube(result: MeshImport): void {
  expect(result.mesh.positions.length).toBe(12 * 9);
  expect(result.mesh.groupOfTriangle.length).toBe(12);
  expect(result.droppedDegenerate).toBe(0);
  // Tolerance 1e-12 m²: sums of exact halves, only rounding.
  expect(result.totalAreaM2).toBeCloseTo(6, 12);
  expect(result.boundsM).toEqual({ min: [0, 0, 0], max: [1, 1, 1] });
  const centre: Triple = [0.5, 0.5, 0.5];
  for (let t = 0; t < 12; t += 1) {
    const [v0, v1, v2] = [vertex(result, t, 0), vertex(result, t, 1), vertex(result, t, 2)];
    const normal = cross(sub(v1, v0), sub(v2, v0));
    const centroid: Triple = [(v0[0] + v1[0] + v2[0]) / 3, (v0[1] + v1[1] + v2[1]) / 3, (v0[2] + v1[2] + v2[2]) / 3];
    expect(dot(normal, sub(centroid, centre)), `triangle ${t} faces outward`).toBeGreaterThan(0);
  }
}

describe('readMesh: the unit cube in every format', () => {
  it('an OBJ of quads with 1-based, negative and slashed indices and a continued line gives the 12 outward triangles', () => {
    const result = read(CUBE_OBJ);
    expect(result.format).toBe('obj');
    expectUnitCube(result);
    expect(result.groups).toEqual([{ name: 'default', triangleCount: 12, areaM2: expect.closeTo(6, 12) as number }]);
  });

  it('an ASCII STL gives the same cube, following the winding rather than the stated normals', () => {
    const result = read(asciiStl([{ name: 'cube', triangles: cubeTriangles() }]), { fileName: 'cube.stl' });
    expect(result.format).toBe('stl-ascii');
    expectUnitCube(result);
    expect(result.mesh.groupNames).toEqual(['cube']);
  });

  it('a binary STL gives the same cube, also when its header starts with "solid"', () => {
    for (const header of ['binary cube', 'solid cube facet']) {
      const result = read(binaryStl(cubeTriangles(), header), { fileName: 'cube.obj' });
      expect(result.format).toBe('stl-binary');
      expectUnitCube(result);
      expect(result.mesh.groupNames).toEqual(['default']);
    }
  });

  it('units mm scale by 0.001: a 1000 mm cube is the unit cube', () => {
    expectUnitCube(read(binaryStl(cubeTriangles(1000)), { units: 'mm' }));
    expectUnitCube(read(asciiStl([{ name: '', triangles: cubeTriangles(1000) }]), { units: 'mm' }));
  });
});

describe('readMesh: transform into the body frame', () => {
  const TRIANGLE = 'v 1 0 0\nv 0 1 0\nv 0 0 1\nf 1 2 3\n';

  it('rotationDeg [0, 0, 90] carries +X onto +Y', () => {
    const result = read(TRIANGLE, { rotationDeg: [0, 0, 90] });
    expect(vertex(result, 0, 0)).toEqual([0, 1, 0]);
    expect(vertex(result, 0, 1)).toEqual([-1, 0, 0]);
  });

  it('rotationDeg [90, 0, 0] carries +Y onto +Z, and [0, 90, 0] carries +Z onto +X', () => {
    expect(vertex(read(TRIANGLE, { rotationDeg: [90, 0, 0] }), 0, 1)).toEqual([0, 0, 1]);
    expect(vertex(read(TRIANGLE, { rotationDeg: [0, 90, 0] }), 0, 2)).toEqual([1, 0, 0]);
  });

  it('a combined rotation is R = Rz·Ry·Rx (X first, fixed axes), checked against the three matrices multiplied', () => {
    const [a, b, c] = [(30 * Math.PI) / 180, (-50 * Math.PI) / 180, (120 * Math.PI) / 180];
    const rx = [[1, 0, 0], [0, Math.cos(a), -Math.sin(a)], [0, Math.sin(a), Math.cos(a)]];
    const ry = [[Math.cos(b), 0, Math.sin(b)], [0, 1, 0], [-Math.sin(b), 0, Math.cos(b)]];
    const rz = [[Math.cos(c), -Math.sin(c), 0], [Math.sin(c), Math.cos(c), 0], [0, 0, 1]];
    const mul = (m: number[][], n: number[][]) => m.map((row) => [0, 1, 2].map((j) => row.reduce((s, x, k) => s + x * n[k]![j]!, 0)));
    const r = mul(rz, mul(ry, rx));
    const point: Triple = [0.3, -1.2, 2.5];
    const expected = r.map((row) => dot(row as Triple, point));
    const result = read(`v ${point.join(' ')}\nv 5 0 0\nv 0 5 0\nf 1 2 3\n`, { rotationDeg: [30, -50, 120] });
    // Tolerance 1e-12 m: a few roundings on unit-sized numbers.
    vertex(result, 0, 0).forEach((x, k) => expect(x).toBeCloseTo(expected[k]!, 12));
    const matrix = meshRotationMatrix([30, -50, 120]);
    r.flat().forEach((x, k) => expect(matrix[k]).toBeCloseTo(x, 14));
  });

  it('translation is applied after scaling and rotating', () => {
    const result = read(TRIANGLE.replace('v 1 0 0', 'v 1000 0 0'), {
      units: 'mm',
      rotationDeg: [0, 0, 90],
      translationM: [10, -2, 0.5],
    });
    expect(vertex(result, 0, 0)).toEqual([10, -1, 0.5]);
    expect(result.boundsM.min).toEqual([10 - 0.001, -2, 0.5]);
  });
});

describe('readMesh: groups', () => {
  it('OBJ: usemtl wins over g/o while in effect; faces before any name are default; empty groups are left out', () => {
    const obj = [
      'v 0 0 0', 'v 1 0 0', 'v 1 1 0', 'v 0 1 0',
      'f 1 2 3', // default
      'g never used',
      'g panel',
      'f 1 2 3 4', // panel, 2 triangles
      'usemtl kapton',
      'f 1 2 3', // kapton
      'o antenna',
      'f 1 3 4', // still kapton: the material is in effect
      'usemtl',
      'f 1 2 4', // antenna: material ended
      'g panel',
      'f 2 3 4', // panel again
    ].join('\n');
    const result = read(obj);
    expect(result.groups.map((g) => [g.name, g.triangleCount])).toEqual([
      ['default', 1],
      ['panel', 3],
      ['kapton', 2],
      ['antenna', 1],
    ]);
    expect(result.mesh.groupNames).toEqual(['default', 'panel', 'kapton', 'antenna']);
    expect(Array.from(result.mesh.groupOfTriangle)).toEqual([0, 1, 1, 2, 2, 3, 1]);
    // Triangles of the unit square are 0.5 m² each.
    expect(result.groups.map((g) => g.areaM2)).toEqual([0.5, 1.5, 1, 0.5]);
  });

  it('ASCII STL: each solid is a group, unnamed is default, solids of one name share a group', () => {
    const [t0, t1, t2] = cubeTriangles();
    const result = read(
      asciiStl([
        { name: 'bus', triangles: [t0!] },
        { name: '', triangles: [t1!] },
        { name: 'bus', triangles: [t2!] },
      ]),
    );
    expect(result.groups.map((g) => [g.name, g.triangleCount])).toEqual([['bus', 2], ['default', 1]]);
    expect(Array.from(result.mesh.groupOfTriangle)).toEqual([0, 1, 0]);
  });
});

describe('readMesh: degenerate triangles and limits', () => {
  it('a repeated-corner and a collinear triangle are dropped and counted; the rest is kept in order', () => {
    const obj = `${CUBE_OBJ}\nf 1 1 2\nv 2 0 0\nf 1 2 -1\n`;
    const result = read(obj);
    expect(result.droppedDegenerate).toBe(2);
    expectUnitCube({ ...result, droppedDegenerate: 0 });
  });

  it('a dropped triangle in the middle does not shift the groups of the triangles after it', () => {
    const obj = ['v 0 0 0', 'v 1 0 0', 'v 0 1 0', 'g a', 'f 1 2 3', 'g b', 'f 1 2 2', 'g c', 'f 1 2 3'].join('\n');
    const result = read(obj);
    expect(result.droppedDegenerate).toBe(1);
    expect(result.mesh.groupNames).toEqual(['a', 'c']);
    expect(Array.from(result.mesh.groupOfTriangle)).toEqual([0, 1]);
  });

  it('a file of only degenerate triangles, or of none, is refused naming the file', () => {
    const allDegenerate = caught(() => read('v 0 0 0\nv 1 0 0\nf 1 2 2\n'));
    expect(allDegenerate.details.field).toBe('file');
    expect(allDegenerate.message).toContain('degenerate');
    const empty = caught(() => read('# nothing\nv 0 0 0\n'));
    expect(empty.details.field).toBe('file');
    expect(empty.message).toContain('no triangles');
  });

  it('more triangles than maxTriangles is out_of_range naming the limit, in every format', () => {
    const inputs: Uint8Array[] = [
      encoder.encode(CUBE_OBJ),
      asciiStl([{ name: 'cube', triangles: cubeTriangles() }]),
      binaryStl(cubeTriangles()),
    ];
    for (const bytes of inputs) {
      const error = caught(() => read(bytes, { maxTriangles: 11 }));
      expect(error.code).toBe('out_of_range');
      expect(error.details).toMatchObject({ field: 'file', limit: 11 });
      expect(error.message).toContain('at most 11');
      expect(read(bytes, { maxTriangles: 12 }).mesh.groupOfTriangle.length).toBe(12);
    }
  });
});

describe('readMesh: format detection and options', () => {
  it('tells formats apart by content, the .stl name only breaking ties', () => {
    expect(detectMeshFileFormat(encoder.encode(CUBE_OBJ), 'cube.stl')).toBe('obj');
    expect(detectMeshFileFormat(asciiStl([{ name: 'x', triangles: [] }]), 'x.obj')).toBe('obj');
    expect(detectMeshFileFormat(asciiStl([{ name: 'x', triangles: [] }]), 'x.STL')).toBe('stl-ascii');
    expect(detectMeshFileFormat(asciiStl([{ name: 'x', triangles: cubeTriangles() }]), 'x.obj')).toBe('stl-ascii');
    expect(detectMeshFileFormat(binaryStl(cubeTriangles()).subarray(0, 500), 'x.dat')).toBe('stl-binary');
    expect(detectMeshFileFormat(encoder.encode('not a mesh'), 'x.stl')).toBe('stl-binary');
    expect(detectMeshFileFormat(encoder.encode('not a mesh'), 'x.obj')).toBe('obj');
  });

  it('bad options name the option', () => {
    expect(caught(() => read(CUBE_OBJ, { units: 'cm' as 'm' })).details.field).toBe('units');
    expect(caught(() => read(CUBE_OBJ, { rotationDeg: [0, Number.NaN, 0] })).details.field).toBe('rotationDeg');
    expect(caught(() => read(CUBE_OBJ, { translationM: [0, 0] as unknown as Triple })).details.field).toBe('translationM');
    expect(caught(() => read(CUBE_OBJ, { maxTriangles: 0 })).details.field).toBe('maxTriangles');
  });
});
