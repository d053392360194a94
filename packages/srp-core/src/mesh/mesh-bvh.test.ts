import { describe, expect, it } from 'vitest';
import { anyHit, anyVertexInFront, buildMeshBvh, closestHit, createMeshRay } from './mesh-bvh';

/** Deterministic pseudo-random numbers in [0, 1) (a linear congruential generator). */
function lcg(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

/** Brute force: distance to the nearest triangle the ray crosses (Möller–Trumbore on every one), or Infinity. */
function bruteNearest(positions: Float64Array, o: number[], d: number[]): { t: number; id: number } {
  let best = Infinity;
  let id = -1;
  for (let k = 0; k < positions.length / 9; k += 1) {
    const p = positions.subarray(9 * k, 9 * k + 9);
    const e1 = [p[3]! - p[0]!, p[4]! - p[1]!, p[5]! - p[2]!];
    const e2 = [p[6]! - p[0]!, p[7]! - p[1]!, p[8]! - p[2]!];
    const pv = [d[1]! * e2[2]! - d[2]! * e2[1]!, d[2]! * e2[0]! - d[0]! * e2[2]!, d[0]! * e2[1]! - d[1]! * e2[0]!];
    const det = e1[0]! * pv[0]! + e1[1]! * pv[1]! + e1[2]! * pv[2]!;
    if (det === 0) continue;
    const tv = [o[0]! - p[0]!, o[1]! - p[1]!, o[2]! - p[2]!];
    const u = (tv[0]! * pv[0]! + tv[1]! * pv[1]! + tv[2]! * pv[2]!) / det;
    const qv = [tv[1]! * e1[2]! - tv[2]! * e1[1]!, tv[2]! * e1[0]! - tv[0]! * e1[2]!, tv[0]! * e1[1]! - tv[1]! * e1[0]!];
    const v = (d[0]! * qv[0]! + d[1]! * qv[1]! + d[2]! * qv[2]!) / det;
    const t = (e2[0]! * qv[0]! + e2[1]! * qv[1]! + e2[2]! * qv[2]!) / det;
    if (u >= 0 && v >= 0 && u + v <= 1 && t > 0 && t < best) {
      best = t;
      id = k;
    }
  }
  return { t: best, id };
}

describe('the mesh BVH answers as brute force does', () => {
  const random = lcg(8);
  const count = 600;
  const positions = new Float64Array(9 * count);
  for (let k = 0; k < count; k += 1) {
    const c = [10 * random() - 5, 10 * random() - 5, 10 * random() - 5];
    for (let v = 0; v < 3; v += 1) for (let a = 0; a < 3; a += 1) positions[9 * k + 3 * v + a] = c[a]! + random() - 0.5;
  }
  const bvh = buildMeshBvh(positions);

  it('keeps every triangle once and builds a tree whose leaves cover them', () => {
    expect(Array.from(bvh.triangleIds).sort((a, b) => a - b)).toEqual(Array.from({ length: count }, (_, k) => k));
    let covered = 0;
    for (let n = 0; n < bvh.nodes.length / 2; n += 1) covered += bvh.nodes[2 * n + 1]!;
    expect(covered).toBe(count);
    for (let k = 0; k < count; k += 1) expect(bvh.triangleIds[bvh.rowOfTriangle[k]!]).toBe(k);
  });

  it('any-hit and closest-hit agree with testing every triangle, over 2000 random rays', () => {
    const ray = createMeshRay();
    let hits = 0;
    for (let r = 0; r < 2000; r += 1) {
      const o = [12 * random() - 6, 12 * random() - 6, 12 * random() - 6];
      const z = 2 * random() - 1;
      const phi = 2 * Math.PI * random();
      const d = [Math.sqrt(1 - z * z) * Math.cos(phi), Math.sqrt(1 - z * z) * Math.sin(phi), z];
      ray.set([...o, ...d, Infinity, 0]);
      const brute = bruteNearest(positions, o, d);
      expect(anyHit(bvh, ray, -1)).toBe(brute.id >= 0);
      const row = closestHit(bvh, ray, -1);
      expect(row < 0 ? -1 : bvh.triangleIds[row]).toBe(brute.id);
      if (row >= 0) {
        expect(ray[7]).toBeCloseTo(brute.t, 12);
        hits += 1;
        // A shorter ray that stops before the nearest hit meets nothing.
        ray[6] = brute.t * 0.999;
        expect(anyHit(bvh, ray, -1)).toBe(false);
        // Skipping the nearest triangle finds the next one or none.
        ray[6] = Infinity;
        expect(closestHit(bvh, ray, row)).not.toBe(row);
      }
    }
    expect(hits).toBeGreaterThan(200); // the rays really test hits, not only misses
  });

  it('finds a vertex in front of a plane exactly when one is', () => {
    for (let k = 0; k < 50; k += 1) {
      const z = 2 * random() - 1;
      const phi = 2 * Math.PI * random();
      const n = [Math.sqrt(1 - z * z) * Math.cos(phi), Math.sqrt(1 - z * z) * Math.sin(phi), z];
      let highest = -Infinity;
      for (let v = 0; v < 3 * count; v += 1) {
        highest = Math.max(highest, n[0]! * positions[3 * v]! + n[1]! * positions[3 * v + 1]! + n[2]! * positions[3 * v + 2]!);
      }
      expect(anyVertexInFront(bvh, n[0]!, n[1]!, n[2]!, highest - 1e-3, 0)).toBe(true);
      expect(anyVertexInFront(bvh, n[0]!, n[1]!, n[2]!, highest + 1e-3, 0)).toBe(false);
    }
  });
});
