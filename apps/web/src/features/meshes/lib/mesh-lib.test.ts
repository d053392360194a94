import { describe, expect, it } from 'vitest';
import type { CoefficientTableData } from '@photon-ledger/shared';
import { createLitCalculator } from './lit-fractions';
import { encodeMeshGeometry, facetNormals, parseMeshGeometry } from './mesh-geometry';
import { facetColours, facetPalette, facetState } from './facet-colours';
import { forceMagnitudes, nearestNode, sampleMagnitude } from './force-map';
import { anglesFromPolar, sunVector } from './sun-angles';

/** A 2 m square in the plane z = h facing +z, as two counter-clockwise triangles. */
function square(h: number, half: number): number[] {
  return [-half, -half, h, half, -half, h, half, half, h, -half, -half, h, half, half, h, -half, half, h];
}

describe('mesh geometry', () => {
  it('reads back the API layout: float32 positions then uint32 groups, little-endian', () => {
    const positions = [...square(0, 1), ...square(1.5, 1)];
    const buffer = encodeMeshGeometry(positions, [0, 0, 1, 1]);
    const g = parseMeshGeometry(buffer, 4);
    expect(g.triangleCount).toBe(4);
    expect(Array.from(g.positions)).toEqual(positions);
    expect(Array.from(g.groupOfTriangle)).toEqual([0, 0, 1, 1]);
  });

  it('refuses a body that is not whole triangles, or that disagrees with the header', () => {
    expect(() => parseMeshGeometry(new ArrayBuffer(41))).toThrow(/whole number of triangles/);
    expect(() => parseMeshGeometry(encodeMeshGeometry(square(0, 1), [0, 0]), 3)).toThrow(/header says 3/);
  });

  it('gives the front normal from the counter-clockwise winding', () => {
    expect(Array.from(facetNormals(square(0, 1), 2))).toEqual([0, 0, 1, 0, 0, 1]);
  });
});

describe('lit fractions in the browser (srp-core)', () => {
  it('a plate above a smaller one shades it from overhead and not from the side', () => {
    // Upper plate 2 m wide at z = 1; lower 1 m wide at z = 0; both face +z. Tolerance: exact (whole facets).
    const positions = Float32Array.from([...square(0, 0.5), ...square(1, 1)]);
    const calc = createLitCalculator({ positions, groupOfTriangle: Uint32Array.from([0, 0, 1, 1]), groupNames: ['low', 'high'] });
    const overhead = calc.illuminate([0, 0, 1], 4);
    expect(Array.from(overhead.litFraction)).toEqual([0, 0, 1, 1]);
    // From 80° off the vertical along +x, the upper plate's shadow falls 5.7 m away: all lit.
    const low = sunVector({ azimuthDeg: 0, elevationDeg: 10 });
    const side = calc.illuminate(low, 4);
    expect(Array.from(side.litFraction)).toEqual([1, 1, 1, 1]);
    expect(overhead.rays).toBeGreaterThan(0);
  });
});

describe('facet colours', () => {
  it('tells lit, partly lit, shadowed and turned-away facets apart', () => {
    expect(facetState(0.5, false, 1)).toBe('lit');
    expect(facetState(0.5, false, 0.4)).toBe('partial');
    expect(facetState(0.5, false, 0)).toBe('shadowed');
    expect(facetState(-0.5, false, 0)).toBe('away');
    expect(facetState(-0.5, true, 1)).toBe('lit');
  });

  it('colours a fully lit facet warmer than a shadowed one, and a turned-away one grey', () => {
    const normals = Float32Array.from([0, 0, 1, 0, 0, 1, 0, 0, -1]);
    const c = facetColours(normals, Float32Array.from([1, 0, 0]), [0, 0, 1], null);
    const [litR, , litB] = [c[0]!, c[1]!, c[2]!];
    expect(litR).toBeGreaterThan(litB); // warm
    expect(c[9]!).toBeLessThan(0.25); // shadowed: dark
    const grey = parseInt(facetPalette.away.slice(1, 3), 16) / 255;
    expect(c[18]!).toBeGreaterThan(grey * 0.8);
    expect(Math.abs(c[18]! - c[20]!)).toBeLessThan(0.1); // neutral
  });
});

describe('force map', () => {
  // A 90° grid: 3 polar rows × 4 azimuths; |F| = polar row + azimuth column.
  const values: number[] = [];
  for (let i = 0; i < 3; i += 1) for (let j = 0; j < 4; j += 1) values.push(i + j, 0, 0, 0, 0, 1);
  const data: CoefficientTableData = { id: '00000000-0000-4000-8000-000000000000', stepDeg: 90, polarCount: 3, azimuthCount: 4, values };

  it('finds the nearest node, wrapping the azimuth', () => {
    const n = nearestNode(data, 80, 350);
    expect([n.polarIndex, n.azimuthIndex, n.magnitude]).toEqual([1, 0, 1]);
    expect(n.torque).toEqual([0, 0, 1]);
  });

  it('interpolates bilinearly between nodes and across 360°', () => {
    const { values: m, min, max } = forceMagnitudes(data);
    expect([min, max]).toEqual([0, 5]);
    expect(sampleMagnitude(m, data, 45, 45)).toBeCloseTo(1, 12);
    // Between φ = 270° (3) and φ = 360° ≡ 0° (0) on the first row.
    expect(sampleMagnitude(m, data, 0, 315)).toBeCloseTo(1.5, 12);
  });

  it('maps the table polar angle to the view elevation', () => {
    expect(anglesFromPolar(30, 370)).toEqual({ azimuthDeg: 10, elevationDeg: 60 });
  });
});
