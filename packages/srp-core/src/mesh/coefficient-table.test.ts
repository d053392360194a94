import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../math/vec3';
import { srpErrorFor } from '../vehicles/vehicle-test-helpers';
import {
  assembleCoefficientTable,
  checkCoefficientTable,
  coefficientTableShape,
  computeCoefficientTable,
  computeCoefficientTableRows,
  interpolateCoefficientTable,
  tableNodeDirection,
} from './coefficient-table';
import { createMeshIllumination, illuminateMesh } from './illuminate-mesh';
import { createMeshScene } from './mesh-scene';
import { boxWingMesh, MeshBuilder } from './mesh-test-helpers';
import type { MeshOpticsInput } from './mesh-types';

const boxWingOptics: MeshOpticsInput = {
  default: { front: 'mli-kapton' },
  groups: {
    wing: { front: 'solar-cell', back: 'solar-array-back' },
    dish: { front: 'osr-radiator', back: 'mli-kapton' },
  },
};

/** Deterministic pseudo-random numbers in [0, 1) (a linear congruential generator). */
function lcg(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

describe('coefficient table layout', () => {
  it('a step dividing 180 gives 180/step + 1 polar and 360/step azimuth nodes; others are refused', () => {
    expect(coefficientTableShape(5)).toEqual({ polarCount: 37, azimuthCount: 72 });
    expect(coefficientTableShape(10)).toEqual({ polarCount: 19, azimuthCount: 36 });
    expect(coefficientTableShape(1)).toEqual({ polarCount: 181, azimuthCount: 360 });
    expect(() => coefficientTableShape(7)).toThrow(srpErrorFor('invalid_input', 'stepDeg'));
    expect(() => coefficientTableShape(0)).toThrow(srpErrorFor('invalid_input', 'stepDeg'));
  });

  const scene = createMeshScene(boxWingMesh({ bus: 2, wing: 3, dish: 2 }), boxWingOptics);
  const settings = { stepDeg: 15, samplesPerFacet: 4, specularBounce: false };
  const whole = computeCoefficientTable(scene, settings);

  it('rows computed in chunks and joined equal the whole table; node values are illuminateMesh at the node', () => {
    const a = computeCoefficientTableRows(scene, settings, 0, 5);
    const b = computeCoefficientTableRows(scene, settings, 5, 13);
    const joined = assembleCoefficientTable(15, [a.values, b.values]);
    expect(joined.values).toEqual(whole.values);
    // Ray counts depend on the chunking (skipped tests are remembered per chunk); values do not.
    expect(a.rays).toBeGreaterThan(0);
    expect(b.rays).toBeGreaterThan(0);
    const out = createMeshIllumination(scene);
    const sun: Vec3 = [0, 0, 0];
    for (const [i, j] of [[3, 7], [0, 0], [12, 0], [6, 23]] as const) {
      illuminateMesh(scene, tableNodeDirection(sun, 15, 13, i, j), settings, out);
      const o = 6 * (i * 24 + j);
      expect(Array.from(whole.values.subarray(o, o + 6))).toEqual([...out.forcePerPressure, ...out.torquePerPressure]);
    }
    expect(() => assembleCoefficientTable(15, [a.values])).toThrow(srpErrorFor('invalid_input', 'rows'));
  });

  it('every azimuth node of a pole holds the same values', () => {
    for (const i of [0, 12]) {
      const first = Array.from(whole.values.subarray(6 * i * 24, 6 * i * 24 + 6));
      for (let j = 1; j < 24; j += 1) expect(Array.from(whole.values.subarray(6 * (i * 24 + j), 6 * (i * 24 + j) + 6))).toEqual(first);
    }
  });

  it('interpolation returns the node values at a node and wraps φ past 360°', () => {
    const out = new Float64Array(6);
    const sun: Vec3 = [0, 0, 0];
    for (const [i, j] of [[1, 0], [4, 23], [11, 12]] as const) {
      interpolateCoefficientTable(out, whole, tableNodeDirection(sun, 15, 13, i, j));
      const o = 6 * (i * 24 + j);
      for (let k = 0; k < 6; k += 1) expect(out[k]).toBeCloseTo(whole.values[o + k]!, 12);
    }
    // Halfway between φ = 345° (j = 23) and φ = 360° = 0° (j = 0) at θ = 60° (i = 4).
    const theta = (60 * Math.PI) / 180;
    const phi = (352.5 * Math.PI) / 180;
    interpolateCoefficientTable(out, whole, [Math.sin(theta) * Math.cos(phi), Math.sin(theta) * Math.sin(phi), Math.cos(theta)]);
    for (let k = 0; k < 6; k += 1) {
      expect(out[k]).toBeCloseTo((whole.values[6 * (4 * 24 + 23) + k]! + whole.values[6 * (4 * 24) + k]!) / 2, 12);
    }
  });

  it('reports progress per row and stops when cancelled', () => {
    const progress: number[] = [];
    computeCoefficientTableRows(scene, settings, 2, 6, { onProgress: (done, count) => progress.push(done / count) });
    expect(progress).toEqual([0.25, 0.5, 0.75, 1]);
    let polls = 0;
    const stopped = computeCoefficientTableRows(scene, settings, 0, 13, { isCancelled: () => ++polls > 2 });
    expect(stopped.cancelled).toBe(true);
    expect(polls).toBe(3);
  });

  it('bad settings and row ranges name their field', () => {
    expect(() => computeCoefficientTableRows(scene, { ...settings, stepDeg: 7 }, 0, 1)).toThrow(srpErrorFor('invalid_input', 'table.stepDeg'));
    expect(() => computeCoefficientTableRows(scene, { ...settings, samplesPerFacet: 3 }, 0, 1)).toThrow(
      srpErrorFor('invalid_input', 'table.samplesPerFacet'),
    );
    expect(() => computeCoefficientTableRows(scene, settings, 13, 14)).toThrow(srpErrorFor('out_of_range', 'firstPolarRow'));
    expect(() => computeCoefficientTableRows(scene, settings, 4, 4)).toThrow(srpErrorFor('out_of_range', 'endPolarRow'));
  });

  it('checkCoefficientTable refuses a wrong shape or a non-finite number, naming it', () => {
    expect(checkCoefficientTable(whole)).toBe(whole);
    expect(() => checkCoefficientTable({ ...whole, polarCount: 12 })).toThrow(srpErrorFor('invalid_input', 'table.polarCount'));
    expect(() => checkCoefficientTable({ ...whole, azimuthCount: 25 })).toThrow(srpErrorFor('invalid_input', 'table.azimuthCount'));
    expect(() => checkCoefficientTable({ ...whole, values: whole.values.subarray(6) })).toThrow(srpErrorFor('invalid_input', 'table.values'));
    const bad = Float64Array.from(whole.values);
    bad[40] = Number.NaN;
    expect(() => checkCoefficientTable({ ...whole, values: bad })).toThrow(srpErrorFor('invalid_input', 'table.values.40'));
  });
});

describe('table interpolation error against direct evaluation (issue 8 item 4)', () => {
  // A box-wing with a dish shading part of the bus; reference: illuminateMesh at the same direction.
  const scene = createMeshScene(boxWingMesh({ bus: 4, wing: 9, dish: 4 }), boxWingOptics);
  const random = lcg(20261202);
  const directions: Vec3[] = [];
  for (let k = 0; k < 400; k += 1) {
    const z = 2 * random() - 1;
    const phi = 2 * Math.PI * random();
    const r = Math.sqrt(1 - z * z);
    directions.push([r * Math.cos(phi), r * Math.sin(phi), z]);
  }
  const direct = createMeshIllumination(scene);
  const exact = directions.map((s) => {
    illuminateMesh(scene, s, { samplesPerFacet: 4, specularBounce: false }, direct);
    return [...direct.forcePerPressure] as Vec3;
  });

  function errors(stepDeg: number): { max: number; rms: number } {
    const table = computeCoefficientTable(scene, { stepDeg, samplesPerFacet: 4, specularBounce: false });
    const out = new Float64Array(6);
    let max = 0;
    let sumSq = 0;
    directions.forEach((s, k) => {
      interpolateCoefficientTable(out, table, s);
      const e = exact[k]!;
      const rel = Math.hypot(out[0]! - e[0], out[1]! - e[1], out[2]! - e[2]) / Math.hypot(...e);
      max = Math.max(max, rel);
      sumSq += rel * rel;
    });
    return { max, rms: Math.sqrt(sumSq / directions.length) };
  }

  it('bounded at 5° and 10°, and smaller at 5° (errors printed)', () => {
    const five = errors(5);
    const ten = errors(10);
    console.log(
      `table interpolation, |ΔF|/|F| over ${directions.length} random directions, ${scene.triangleCount}-triangle box-wing: ` +
        `5°: max ${(100 * five.max).toFixed(2)} %, RMS ${(100 * five.rms).toFixed(3)} %; ` +
        `10°: max ${(100 * ten.max).toFixed(2)} %, RMS ${(100 * ten.rms).toFixed(3)} %`,
    );
    // Bounds: the measured values (see interpolateCoefficientTable's comment) with margin.
    expect(five.max).toBeLessThan(0.1);
    expect(five.rms).toBeLessThan(0.01);
    expect(ten.max).toBeLessThan(0.14);
    expect(ten.rms).toBeLessThan(0.02);
    expect(five.rms).toBeLessThan(ten.rms);
  });
});

describe('a table of a thin plate from both sides', () => {
  it('a two-sided absorbing square pushes away from the Sun from either side', () => {
    const scene = createMeshScene(new MeshBuilder().parallelogram('sheet', [-1, -1, 0], [2, 0, 0], [0, 2, 0], 2).mesh(), {
      default: { front: { absorbed: 1, specular: 0, diffuse: 0 }, back: { absorbed: 1, specular: 0, diffuse: 0 } },
    });
    const table = computeCoefficientTable(scene, { stepDeg: 30, samplesPerFacet: 1, specularBounce: false });
    // Poles: Sun on +z then -z; F/P = -A |cos θ| s = ∓4 ez.
    expect(table.values[2]).toBeCloseTo(-4, 12);
    expect(table.values[6 * 6 * 12 + 2]).toBeCloseTo(4, 12);
  });
});
