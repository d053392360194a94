import { describe, expect, it } from 'vitest';
import { SrpError } from '../errors';
import type { Vec3 } from '../math/vec3';
import { astroTimeAt, parseUtcEpoch } from '../time/epoch';
import { evaluateChebyshevTable, fitChebyshevTable } from './chebyshev-table';
import { moonPositionEci, sunPositionEci } from './ephemeris';
import { createGeocentricEphemeris } from './geocentric-ephemeris';

const dist = (a: Vec3, b: Vec3): number => Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);

describe('fitChebyshevTable', () => {
  it('reproduces a cubic exactly with degree 3', () => {
    // An interpolating polynomial of degree n reproduces polynomials of degree ≤ n (exact in
    // arithmetic); 1e-9 relative covers the rounding of the DCT sums.
    const f = (out: Vec3, t: number): Vec3 => {
      out[0] = 1 + 2 * t - 0.5 * t * t + 0.01 * t * t * t;
      out[1] = -3 * t;
      out[2] = 7;
      return out;
    };
    const table = fitChebyshevTable(f, -10, 30, 8, 3);
    const got: Vec3 = [0, 0, 0];
    const want: Vec3 = [0, 0, 0];
    for (let t = -10; t <= 30; t += 0.37) {
      evaluateChebyshevTable(got, table, t);
      f(want, t);
      for (let c = 0; c < 3; c += 1) expect(Math.abs(got[c]! - want[c]!)).toBeLessThan(1e-9 * (1 + Math.abs(want[c]!)));
    }
  });

  it('approximates sin(t) on 1-unit segments with degree 8 to 1e-10', () => {
    // Chebyshev interpolation error ≤ 2 (h/4)^(n+1) max|f^(n+1)| / (n+1)! = 2 · 4^-9 / 9! ≈ 2e-11
    // for h = 1 (source: Numerical Recipes §5.8 / standard interpolation bound, from memory).
    const f = (out: Vec3, t: number): Vec3 => {
      out[0] = Math.sin(t);
      out[1] = Math.cos(t);
      out[2] = 0;
      return out;
    };
    const table = fitChebyshevTable(f, 0, 20, 1, 8);
    const got: Vec3 = [0, 0, 0];
    let max = 0;
    for (let t = 0; t <= 20; t += 0.013) {
      evaluateChebyshevTable(got, table, t);
      max = Math.max(max, Math.abs(got[0] - Math.sin(t)), Math.abs(got[1] - Math.cos(t)));
    }
    expect(max).toBeLessThan(1e-10);
  });

  it('refuses to extrapolate, naming tSeconds', () => {
    const table = fitChebyshevTable((out) => out, 0, 10, 5, 2);
    expect(() => evaluateChebyshevTable([0, 0, 0], table, 10.001)).toThrow(SrpError);
    expect(() => evaluateChebyshevTable([0, 0, 0], table, -1)).toThrow(
      expect.objectContaining({ code: 'out_of_range', details: expect.objectContaining({ field: 'tSeconds' }) }),
    );
  });

  it('refuses a degree of 0 and a non-positive segment, naming them', () => {
    expect(() => fitChebyshevTable((out) => out, 0, 10, 5, 0)).toThrow(
      expect.objectContaining({ details: expect.objectContaining({ field: 'degree' }) }),
    );
    expect(() => fitChebyshevTable((out) => out, 0, 10, 0, 5)).toThrow(
      expect.objectContaining({ details: expect.objectContaining({ field: 'segmentSeconds' }) }),
    );
  });
});

describe('createGeocentricEphemeris', () => {
  it('interpolates the Sun within 1 m and the Moon within 1 m of astronomy-engine over 30 days', () => {
    // Measured (2026-03-01 + 30 days, every 97 s, default 4-day/1-day segments of degree 9):
    // Sun 1.4e-2 m, Moon 5e-4 m. The floor is the
    // time argument's rounding (~0.2 µs of TT × 30 km/s), not the polynomials. Bound 1 m: far
    // above that, yet 1000 times below the theories' own kilometre-level accuracy, so any real
    // interpolation fault (a wrong node, segment or scale) shows.
    const epoch = parseUtcEpoch('2026-03-01T00:00:00Z');
    const span = 30 * 86_400;
    const eph = createGeocentricEphemeris(epoch, 0, span);
    const a: Vec3 = [0, 0, 0];
    const b: Vec3 = [0, 0, 0];
    let maxSun = 0;
    let maxMoon = 0;
    for (let t = 0; t <= span; t += 997) {
      const time = astroTimeAt(epoch, t);
      maxSun = Math.max(maxSun, dist(eph.sunPositionAt(a, t), sunPositionEci(b, time)));
      maxMoon = Math.max(maxMoon, dist(eph.moonPositionAt(a, t), moonPositionEci(b, time)));
    }
    expect(maxSun).toBeLessThan(1);
    expect(maxMoon).toBeLessThan(1);
  });

  it('with 8-day Moon segments of degree 10 the error grows to metres, which the 1 m bound would catch', () => {
    // Shows the test above can fail: measured 2.7 m for this coarser choice.
    const epoch = parseUtcEpoch('2026-03-01T00:00:00Z');
    const span = 30 * 86_400;
    const eph = createGeocentricEphemeris(epoch, 0, span, { moonSegmentSeconds: 8 * 86_400, moonDegree: 10 });
    const a: Vec3 = [0, 0, 0];
    const b: Vec3 = [0, 0, 0];
    let maxMoon = 0;
    for (let t = 0; t <= span; t += 997) {
      maxMoon = Math.max(maxMoon, dist(eph.moonPositionAt(a, t), moonPositionEci(b, astroTimeAt(epoch, t))));
    }
    expect(maxMoon).toBeGreaterThan(1);
  });

  it('covers at least the requested span and refuses times outside it', () => {
    const epoch = parseUtcEpoch('2026-03-01T00:00:00Z');
    const eph = createGeocentricEphemeris(epoch, -3600, 5 * 86_400);
    expect(eph.endSeconds).toBeGreaterThanOrEqual(5 * 86_400);
    expect(() => eph.sunPositionAt([0, 0, 0], -3601)).toThrow(SrpError);
    expect(() => eph.moonPositionAt([0, 0, 0], eph.moon.endSeconds + 1)).toThrow(SrpError);
  });
});
