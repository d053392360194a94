import { createMeshIllumination, createMeshScene, illuminateMesh, type MeshOpticsInput, type MeshScene } from '@photon-ledger/srp-core';

/*
 * Lit fractions of a mesh's facets for a Sun direction, computed in the browser by srp-core's ray
 * caster (the same code the coefficient-table jobs run): createMeshScene once per mesh and
 * optics, illuminateMesh per Sun direction. Used inside the Web Worker (lit-worker.ts), and on
 * the main thread where no Worker exists (tests).
 */

/** The mesh as the worker receives it. */
export interface LitMeshInput {
  /** 9 per triangle (m, body frame), as the API sends them (float32). */
  positions: Float32Array;
  groupOfTriangle: Uint32Array;
  groupNames: readonly string[];
  /** Optics by group; default: every facet one-sided MLI (enough to see light and shadow). */
  optics?: MeshOpticsInput | undefined;
}

/** One Sun direction's answer. */
export interface LitResult {
  /** Lit fraction of each facet, 0..1 (0 also for a facet whose lit side faces away or has no optics). */
  litFraction: Float32Array;
  /** Force per unit pressure (m², N/Pa), body frame. */
  forcePerPressure: [number, number, number];
  /** Torque about the body origin per unit pressure (m³, N·m/Pa), body frame. */
  torquePerPressure: [number, number, number];
  /** Rays cast. */
  rays: number;
  /** Time of this illumination (ms). */
  illuminateMs: number;
  /** Time spent preparing the scene (BVH) before the first illumination (ms); 0 afterwards. */
  sceneMs: number;
}

/** View optics when the caller gives none. */
export const VIEW_OPTICS: MeshOpticsInput = { default: { front: 'mli-kapton' } };

/** A calculator bound to one mesh and optics. */
export interface LitCalculator {
  illuminate(sunDirBody: readonly [number, number, number], samplesPerFacet: number): LitResult;
}

const now = () => (typeof performance !== 'undefined' ? performance.now() : Date.now());

/** Prepares the scene (BVH) of `input`; illuminate() then answers per Sun direction. */
export function createLitCalculator(input: LitMeshInput): LitCalculator {
  const t0 = now();
  const scene: MeshScene = createMeshScene(
    { positions: Float64Array.from(input.positions), groupOfTriangle: input.groupOfTriangle, groupNames: input.groupNames },
    input.optics ?? VIEW_OPTICS,
  );
  let sceneMs = now() - t0;
  const out = createMeshIllumination(scene);
  return {
    illuminate(sunDirBody, samplesPerFacet) {
      const t1 = now();
      const len = Math.hypot(sunDirBody[0], sunDirBody[1], sunDirBody[2]);
      illuminateMesh(scene, [sunDirBody[0] / len, sunDirBody[1] / len, sunDirBody[2] / len], { samplesPerFacet, specularBounce: false }, out);
      const result: LitResult = {
        litFraction: Float32Array.from(out.litFraction),
        forcePerPressure: [...out.forcePerPressure],
        torquePerPressure: [...out.torquePerPressure],
        rays: out.rays,
        illuminateMs: now() - t1,
        sceneMs,
      };
      sceneMs = 0;
      return result;
    },
  };
}
