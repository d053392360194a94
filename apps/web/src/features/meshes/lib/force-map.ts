import type { CoefficientTableData } from '@photon-ledger/shared';

/*
 * The coefficient table as a map over the sphere of Sun directions: equirectangular, azimuth
 * 0–360° across (from +x towards +y), polar angle 0–180° down (from body +z). Node (i, j) sits at
 * θ = i·step, φ = j·step; values hold Fx Fy Fz (m², N/Pa) and τx τy τz about the body origin
 * (m³, N·m/Pa) per node.
 */

/** One grid node's values. */
export interface TableNode {
  polarIndex: number;
  azimuthIndex: number;
  polarDeg: number;
  azimuthDeg: number;
  /** Force per unit pressure (m² ≡ N/Pa), body frame. */
  force: [number, number, number];
  /** Torque about the body origin per unit pressure (m³ ≡ N·m/Pa), body frame. */
  torque: [number, number, number];
  /** |F| per unit pressure (m²). */
  magnitude: number;
}

/** |F| per node, row-major (polar rows of azimuthCount), and its range. */
export function forceMagnitudes(data: CoefficientTableData): { values: Float64Array; min: number; max: number } {
  const count = data.polarCount * data.azimuthCount;
  const values = new Float64Array(count);
  let min = Infinity;
  let max = -Infinity;
  for (let k = 0; k < count; k += 1) {
    const o = 6 * k;
    const m = Math.hypot(data.values[o] ?? NaN, data.values[o + 1] ?? NaN, data.values[o + 2] ?? NaN);
    values[k] = m;
    if (m < min) min = m;
    if (m > max) max = m;
  }
  return { values, min, max };
}

/** The node nearest a Sun direction given by polar angle and azimuth (°). */
export function nearestNode(data: CoefficientTableData, polarDeg: number, azimuthDeg: number): TableNode {
  const i = Math.min(data.polarCount - 1, Math.max(0, Math.round(polarDeg / data.stepDeg)));
  const j = ((Math.round(azimuthDeg / data.stepDeg) % data.azimuthCount) + data.azimuthCount) % data.azimuthCount;
  return nodeAt(data, i, j);
}

/** The values at node (i, j). */
export function nodeAt(data: CoefficientTableData, i: number, j: number): TableNode {
  const o = 6 * (i * data.azimuthCount + j);
  const v = (k: number) => data.values[o + k] ?? NaN;
  const force: [number, number, number] = [v(0), v(1), v(2)];
  return {
    polarIndex: i,
    azimuthIndex: j,
    polarDeg: i * data.stepDeg,
    azimuthDeg: j * data.stepDeg,
    force,
    torque: [v(3), v(4), v(5)],
    magnitude: Math.hypot(force[0], force[1], force[2]),
  };
}

/** |F| at any (θ, φ) (°), bilinear between nodes, φ wrapping at 360°. */
export function sampleMagnitude(magnitudes: Float64Array, data: CoefficientTableData, polarDeg: number, azimuthDeg: number): number {
  const u = Math.min(data.polarCount - 1, Math.max(0, polarDeg / data.stepDeg));
  const w = ((azimuthDeg / data.stepDeg) % data.azimuthCount + data.azimuthCount) % data.azimuthCount;
  const i0 = Math.min(data.polarCount - 2, Math.floor(u));
  const j0 = Math.floor(w);
  const j1 = (j0 + 1) % data.azimuthCount;
  const a = u - i0;
  const b = w - j0;
  const at = (i: number, j: number) => magnitudes[i * data.azimuthCount + j]!;
  return (1 - a) * ((1 - b) * at(i0, j0) + b * at(i0, j1)) + a * ((1 - b) * at(i0 + 1, j0) + b * at(i0 + 1, j1));
}

/** Stops of the map's colour scale (sRGB hex), low to high: our paper, teal, sodium and deep ink tones. */
export const mapScaleStops = ['#f3efe3', '#b9d2c9', '#5f9a94', '#2f5d63', '#d9661f', '#7a2c0c'] as const;

const stopRgb = mapScaleStops.map((h) => [parseInt(h.slice(1, 3), 16), parseInt(h.slice(3, 5), 16), parseInt(h.slice(5, 7), 16)] as const);

/** The scale's colour at t in [0, 1] (0..255 components). */
export function scaleColour(t: number): [number, number, number] {
  const x = Math.min(1, Math.max(0, Number.isFinite(t) ? t : 0)) * (stopRgb.length - 1);
  const k = Math.min(stopRgb.length - 2, Math.floor(x));
  const f = x - k;
  const a = stopRgb[k]!;
  const b = stopRgb[k + 1]!;
  return [Math.round(a[0] + (b[0] - a[0]) * f), Math.round(a[1] + (b[1] - a[1]) * f), Math.round(a[2] + (b[2] - a[2]) * f)];
}

/** The CSS gradient of the scale (for the colour bar). */
export function scaleGradient(direction = 'to right'): string {
  return `linear-gradient(${direction}, ${mapScaleStops.join(', ')})`;
}

/**
 * Paints the map into RGBA pixels of a `width` × `height` image: column x is azimuth
 * (x + 0.5)/width·360°, row y is polar angle (y + 0.5)/height·180°.
 */
export function paintForceMap(
  magnitudes: Float64Array,
  data: CoefficientTableData,
  range: { min: number; max: number },
  width: number,
  height: number,
): Uint8ClampedArray {
  const pixels = new Uint8ClampedArray(width * height * 4);
  const span = range.max - range.min;
  for (let y = 0; y < height; y += 1) {
    const polar = ((y + 0.5) / height) * 180;
    for (let x = 0; x < width; x += 1) {
      const azimuth = ((x + 0.5) / width) * 360;
      const m = sampleMagnitude(magnitudes, data, polar, azimuth);
      const [r, g, b] = scaleColour(span > 0 ? (m - range.min) / span : 0.5);
      const o = 4 * (y * width + x);
      pixels[o] = r;
      pixels[o + 1] = g;
      pixels[o + 2] = b;
      pixels[o + 3] = 255;
    }
  }
  return pixels;
}
