import { describe, expect, it } from 'vitest';
import type { Series } from '@photon-ledger/shared';
import {
  createPlaybackState,
  intervalIndex,
  maxNorm,
  playbackColumns,
  playbackDataFromSeries,
  playbackMaxPoints,
  sampleHermite,
  sampleTrack,
  stateAt,
  trackFromColumn,
} from './series-track';

/** A circular orbit of radius R (m) and angular rate w (rad/s) in the xy-plane. */
const R = 42_164_000;
const W = (2 * Math.PI) / 86_164;

function circularSeries(step: number, count: number, dropTimes = false): Series {
  const t = Array.from({ length: count }, (_, i) => i * step);
  const values: Record<string, number[]> = {
    x_m: t.map((s) => R * Math.cos(W * s)),
    y_m: t.map((s) => R * Math.sin(W * s)),
    z_m: t.map(() => 0),
    vx_m_s: t.map((s) => -R * W * Math.sin(W * s)),
    vy_m_s: t.map((s) => R * W * Math.cos(W * s)),
    vz_m_s: t.map(() => 0),
  };
  return {
    runId: '00000000-0000-4000-8000-000000000000',
    fromT: 0,
    toT: t[t.length - 1]!,
    maxPoints: 2 * count,
    bucketCount: count,
    rowsInRange: count,
    momentum: null,
    series: playbackColumns.map((column) => {
      const v = values[column] ?? t.map((_, i) => (column === 'illuminated_fraction' ? 1 : 1e-7 * (i + 1)));
      // A decimated answer may keep other times for velocity than for position.
      const times = dropTimes && column.startsWith('v') ? t.map((s) => s + 1) : t;
      return { column, unit: 'm', derived: false, t: times, values: v };
    }),
  };
}

describe('interpolation at a scrub time', () => {
  it('finds the interval holding a time by bisection and clamps outside the range', () => {
    const times = Float64Array.from([0, 10, 20, 30]);
    expect(intervalIndex(times, -5)).toBe(0);
    expect(intervalIndex(times, 10)).toBe(1);
    expect(intervalIndex(times, 29.9)).toBe(2);
    expect(intervalIndex(times, 99)).toBe(2);
  });

  it('a linear track gives the straight-line value between points and holds the end values outside', () => {
    const track = trackFromColumn({ t: [0, 10, 20], values: [0, 100, 50] });
    expect(sampleTrack(track, 5)).toBe(50);
    expect(sampleTrack(track, 15)).toBe(75);
    expect(sampleTrack(track, -1)).toBe(0);
    expect(sampleTrack(track, 21)).toBe(50);
    expect(sampleTrack(trackFromColumn({ t: [], values: [] }), 3)).toBeNaN();
  });

  it('two points at one instant (a sample on an event) give the later value, never a division by zero', () => {
    const track = trackFromColumn({ t: [0, 10, 10, 20], values: [1, 1, 0, 0] });
    expect(sampleTrack(track, 10)).toBe(0);
  });

  it('Hermite positions of a GEO orbit sampled every 600 s stay on the circle within 10 m, where the chord is km inside', () => {
    const data = playbackDataFromSeries(circularSeries(600, 200));
    expect(data.hermite).toBe(true);
    const t = 600 * 37 + 300; // mid-interval, where a chord is farthest from the arc
    const state = stateAt(createPlaybackState(), data, t);
    const radius = Math.hypot(...state.positionM);
    // Tolerance 10 m: the cubic's error over a 600 s step of GEO is ~(wh)^4 R / 384 ≈ 0.3 m.
    expect(Math.abs(radius - R)).toBeLessThan(10);
    expect(state.positionM[0]).toBeCloseTo(R * Math.cos(W * t), -1);
    const chord = Math.hypot(sampleTrack(data.position[0], t), sampleTrack(data.position[1], t));
    expect(R - chord).toBeGreaterThan(1000);
  });

  it('falls back to linear positions when velocity does not share the position times (a decimated answer)', () => {
    const data = playbackDataFromSeries(circularSeries(600, 50, true));
    expect(data.hermite).toBe(false);
    const t = 900;
    expect(stateAt(createPlaybackState(), data, t).positionM[0]).toBe(sampleTrack(data.position[0], t));
  });

  it('sampleHermite reproduces the end points exactly', () => {
    const p = trackFromColumn({ t: [0, 10], values: [3, 7] });
    const v = trackFromColumn({ t: [0, 10], values: [0.2, 0.5] });
    expect(sampleHermite(p, v, 0)).toBe(3);
    expect(sampleHermite(p, v, 10)).toBe(7);
  });

  it('clamps the illuminated fraction into 0..1 and reports a decimated answer', () => {
    const series = circularSeries(600, 10);
    const data = playbackDataFromSeries({ ...series, rowsInRange: 100 });
    expect(data.decimated).toBe(true);
    expect(stateAt(createPlaybackState(), data, 100).illuminatedFraction).toBe(1);
  });

  it('names a column the answer lacks', () => {
    const series = circularSeries(600, 10);
    expect(() => playbackDataFromSeries({ ...series, series: series.series.slice(1) })).toThrow(/x_m/);
  });

  it('the largest norm of a vector over the run is taken point by point', () => {
    const data = playbackDataFromSeries(circularSeries(600, 10));
    expect(maxNorm(data.position)).toBeCloseTo(R, 0);
  });

  it('asks for every sample while the route allows two points per sample, else for its limit', () => {
    expect(playbackMaxPoints(577, 20_000)).toBe(1154);
    expect(playbackMaxPoints(1_000_000, 20_000)).toBe(20_000);
    expect(playbackMaxPoints(1, 20_000)).toBe(4);
  });
});
