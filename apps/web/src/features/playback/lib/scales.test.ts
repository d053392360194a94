import { describe, expect, it } from 'vitest';
import { arrowLength, arrowScale, cameraDistance, markerSize, niceCeil, sceneUnitMeters } from './scales';
import { formatElapsed, formatSig, utcLabel } from './format-quantity';
import { shadowIntervals } from './shadow-intervals';

describe('scale choices', () => {
  it('rounds an arrow scale up to 1, 2 or 5 × 10ⁿ', () => {
    expect(niceCeil(4.6e-4)).toBeCloseTo(5e-4, 15);
    expect(niceCeil(1.09e-7)).toBeCloseTo(2e-7, 20);
    expect(niceCeil(2e-5)).toBeCloseTo(2e-5, 20);
    expect(niceCeil(7)).toBe(10);
    expect(niceCeil(0)).toBe(0);
    expect(niceCeil(Number.NaN)).toBe(0);
  });

  it('the largest vector of the run is at most one axis length long, and nothing is drawn without a scale', () => {
    const scale = arrowScale(4.6e-4);
    expect(arrowLength(4.6e-4, scale)).toBeLessThanOrEqual(1);
    expect(arrowLength(4.6e-4, scale)).toBeGreaterThan(0.4);
    expect(arrowLength(1, arrowScale(0))).toBe(0);
  });

  it('measures Earth scenes in Earth radii and heliocentric ones in AU', () => {
    expect(sceneUnitMeters('earth')).toBe(6_378_137);
    expect(sceneUnitMeters('sun')).toBeCloseTo(1.495978707e11, -2);
  });

  it('puts the camera outside the orbit and markers at a visible size', () => {
    expect(cameraDistance(6.6, 1)).toBeGreaterThan(6.6 * 2);
    expect(cameraDistance(0.1, 1)).toBeGreaterThan(1.5);
    expect(markerSize(6.6, 0.06)).toBeCloseTo(0.165, 3);
    expect(markerSize(1, 0.06)).toBe(0.06);
  });
});

describe('readout formats', () => {
  it('writes small and large numbers as powers of ten with a true minus', () => {
    expect(formatSig(1.0923e-7)).toBe('1.09 × 10⁻⁷');
    expect(formatSig(-0.5)).toBe('−0.5');
    expect(formatSig(42164.17, 6)).toBe('42,164.2');
  });

  it('labels times from the epoch in UTC and as elapsed time', () => {
    expect(utcLabel('2026-09-08T00:00:00.000Z', 78_971.9)).toBe('2026-09-08 21:56:12 UTC');
    expect(formatElapsed(90_061)).toBe('1 d 01:01:01');
    expect(formatElapsed(61)).toBe('00:01:01');
  });
});

describe('shadow passes from events', () => {
  const ev = (name: string, tSeconds: number) => ({ name, tSeconds, utc: '2026-09-08T00:00:00.000Z' });

  it('pairs entries with exits per body and depth, and ignores node events', () => {
    const passes = shadowIntervals(
      [ev('descending-node', 5), ev('earth-penumbra-entry', 10), ev('earth-umbra-entry', 12), ev('earth-umbra-exit', 20), ev('earth-penumbra-exit', 22)],
      0,
      100,
    );
    expect(passes).toEqual([
      { body: 'earth', depth: 'penumbra', fromT: 10, toT: 22 },
      { body: 'earth', depth: 'umbra', fromT: 12, toT: 20 },
    ]);
  });

  it('opens a pass at the start for an exit without entry and closes it at the end for an entry without exit', () => {
    const passes = shadowIntervals([ev('moon-penumbra-exit', 8), ev('earth-antumbra-entry', 90)], 0, 100);
    expect(passes).toEqual([
      { body: 'moon', depth: 'penumbra', fromT: 0, toT: 8 },
      { body: 'earth', depth: 'umbra', fromT: 90, toT: 100 },
    ]);
  });
});
