/** Synthetic sample histories for the budget and export tests. */
import type { SampleHistory, SampleLayout } from '../propagation/sample-layout';
import { createSampleLayout } from '../propagation/sample-layout';

/** Row writer: `set(column, value)` for row k at time t. */
export type RowFiller = (row: Float64Array, layout: SampleLayout, k: number, t: number) => void;

/**
 * A history of `count` samples at t = k·step (s), every column 0 except t and what `fill` writes
 * (into a subarray view of the row).
 */
export function syntheticHistory(count: number, stepSeconds: number, fill: RowFiller, forceNames: readonly string[] = []): SampleHistory {
  const layout = createSampleLayout(forceNames);
  const samples = new Float64Array(count * layout.stride);
  for (let k = 0; k < count; k += 1) {
    const row = samples.subarray(k * layout.stride, (k + 1) * layout.stride);
    const t = k * stepSeconds;
    row[layout.t] = t;
    fill(row, layout, k, t);
  }
  return { layout, samples, sampleCount: count };
}

/** Earth GM (m³/s²), EGM96 / WGS 84 value 3.986004418e14; source: NIMA TR8350.2 (from memory). */
export const TEST_EARTH_MU = 3.986004418e14;

/**
 * Writes a circular equatorial orbit of radius `radiusM` at time t into the r and v columns
 * (x = R cos nt, y = R sin nt).
 */
export function circularOrbitFiller(radiusM: number, mu = TEST_EARTH_MU): RowFiller {
  const n = Math.sqrt(mu / radiusM ** 3);
  const speed = n * radiusM;
  return (row, l, _k, t) => {
    row[l.r] = radiusM * Math.cos(n * t);
    row[l.r + 1] = radiusM * Math.sin(n * t);
    row[l.v] = -speed * Math.sin(n * t);
    row[l.v + 1] = speed * Math.cos(n * t);
  };
}
