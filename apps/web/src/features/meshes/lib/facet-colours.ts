/*
 * Colours of the facets in the mesh view, Photon Ledger's own: lit facets in a warm sodium tone
 * scaled by their lit fraction, the shadowed parts of Sun-facing facets a dark teal-grey, and
 * facets turned away from the Sun (or never lit because that side takes no light) a neutral grey.
 * A fixed key direction shades every colour a little so the shape reads.
 */

/** sRGB components 0..1. */
type Rgb = readonly [number, number, number];

const hex = (h: string): Rgb => [parseInt(h.slice(1, 3), 16) / 255, parseInt(h.slice(3, 5), 16) / 255, parseInt(h.slice(5, 7), 16) / 255];

/** The view's palette (hex), also used by its legend. */
export const facetPalette = {
  lit: '#f2a33a',
  shadow: '#27343a',
  away: '#b3b0a7',
  pending: '#c9c5ba',
} as const;

/** Colours of the body axes and the sunlight arrow in the view and its legend. */
export const sceneArrowColours = { x: '#9a4a3c', y: '#4d5e43', z: '#2e4a7a', sun: '#e0a40c' } as const;

const LIT = hex(facetPalette.lit);
const SHADOW = hex(facetPalette.shadow);
const AWAY = hex(facetPalette.away);
const PENDING = hex(facetPalette.pending);
/** The fixed key direction for shape shading (body frame, unit). */
const KEY: Rgb = (() => {
  const v = [0.45, -0.55, 0.7];
  const n = Math.hypot(v[0]!, v[1]!, v[2]!);
  return [v[0]! / n, v[1]! / n, v[2]! / n] as const;
})();

/** How a facet is drawn for a Sun direction. */
export type FacetState = 'lit' | 'partial' | 'shadowed' | 'away';

/** The state of a facet from its front normal·Sun, whether its back takes light, and its lit fraction. */
export function facetState(cosSun: number, twoSided: boolean, litFraction: number): FacetState {
  const facing = cosSun > 0 || (twoSided && cosSun < 0);
  if (!facing) return 'away';
  if (litFraction >= 0.999) return 'lit';
  if (litFraction <= 0.001) return 'shadowed';
  return 'partial';
}

/**
 * Per-vertex sRGB colours (9 numbers per triangle, the three corners alike).
 * @param normals unit front normal per triangle (stride 3)
 * @param litFraction per triangle, or null while not computed yet (all drawn neutral)
 * @param sunDir unit vector towards the Sun (body frame)
 * @param twoSided per triangle: 1 when its back takes light (null: none)
 */
export function facetColours(
  normals: Float32Array,
  litFraction: Float32Array | null,
  sunDir: readonly [number, number, number],
  twoSided: Uint8Array | null,
  out: Float32Array = new Float32Array(normals.length * 3),
): Float32Array {
  const count = normals.length / 3;
  for (let t = 0; t < count; t += 1) {
    const nx = normals[3 * t]!;
    const ny = normals[3 * t + 1]!;
    const nz = normals[3 * t + 2]!;
    const shade = 0.82 + 0.18 * Math.abs(nx * KEY[0] + ny * KEY[1] + nz * KEY[2]);
    let c: Rgb;
    if (litFraction === null) {
      c = PENDING;
    } else {
      const cos = nx * sunDir[0] + ny * sunDir[1] + nz * sunDir[2];
      const state = facetState(cos, (twoSided?.[t] ?? 0) === 1, litFraction[t] ?? 0);
      if (state === 'away') c = AWAY;
      else {
        const f = Math.min(1, Math.max(0, litFraction[t] ?? 0));
        c = [SHADOW[0] + (LIT[0] - SHADOW[0]) * f, SHADOW[1] + (LIT[1] - SHADOW[1]) * f, SHADOW[2] + (LIT[2] - SHADOW[2]) * f];
      }
    }
    const r = c[0] * shade;
    const g = c[1] * shade;
    const b = c[2] * shade;
    const o = 9 * t;
    for (let k = 0; k < 9; k += 3) {
      out[o + k] = r;
      out[o + k + 1] = g;
      out[o + k + 2] = b;
    }
  }
  return out;
}

/** Counts and areas of facets by state (m²), for the read-out beside the view. */
export function litSummary(
  normals: Float32Array,
  areas: Float32Array,
  litFraction: Float32Array,
  sunDir: readonly [number, number, number],
  twoSided: Uint8Array | null,
): { litAreaM2: number; shadowedAreaM2: number; facingAreaM2: number; counts: Record<FacetState, number> } {
  const counts: Record<FacetState, number> = { lit: 0, partial: 0, shadowed: 0, away: 0 };
  let litAreaM2 = 0;
  let facingAreaM2 = 0;
  for (let t = 0; t < areas.length; t += 1) {
    const cos = normals[3 * t]! * sunDir[0] + normals[3 * t + 1]! * sunDir[1] + normals[3 * t + 2]! * sunDir[2];
    const f = litFraction[t] ?? 0;
    const state = facetState(cos, (twoSided?.[t] ?? 0) === 1, f);
    counts[state] += 1;
    if (state !== 'away') {
      facingAreaM2 += areas[t]!;
      litAreaM2 += areas[t]! * f;
    }
  }
  return { litAreaM2, shadowedAreaM2: facingAreaM2 - litAreaM2, facingAreaM2, counts };
}

/** Area of each triangle (m²). */
export function facetAreas(positions: ArrayLike<number>, triangleCount: number): Float32Array {
  const out = new Float32Array(triangleCount);
  for (let t = 0; t < triangleCount; t += 1) {
    const o = 9 * t;
    const ax = positions[o + 3]! - positions[o]!;
    const ay = positions[o + 4]! - positions[o + 1]!;
    const az = positions[o + 5]! - positions[o + 2]!;
    const bx = positions[o + 6]! - positions[o]!;
    const by = positions[o + 7]! - positions[o + 1]!;
    const bz = positions[o + 8]! - positions[o + 2]!;
    out[t] = 0.5 * Math.hypot(ay * bz - az * by, az * bx - ax * bz, ax * by - ay * bx);
  }
  return out;
}
