import { describe, expect, it } from 'vitest';
import { ASTRONOMICAL_UNIT } from '../constants';
import { SUN_GRAVITY_AT_1AU } from '../vehicles/sail-performance';
import { syntheticHistory } from './budget-test-helpers';
import { sailBudget, timeToHeliocentricRadius } from './sail-budget';

/** A Sun-centred radial spiral: |r| = 1 au + k·t, sampled every day for 100 days. */
function outwardSail(kMPerS: number) {
  return syntheticHistory(101, 86_400, (row, l, _k, t) => {
    row[l.r] = (ASTRONOMICAL_UNIT + kMPerS * t) * Math.SQRT1_2;
    row[l.r + 1] = (ASTRONOMICAL_UNIT + kMPerS * t) * Math.SQRT1_2;
    row[l.sunDistanceM] = ASTRONOMICAL_UNIT + kMPerS * t;
  });
}

describe('sail budget', () => {
  it('finds the first crossing of the target radius, interpolated between daily samples', () => {
    const k = 10; // m/s outward
    const target = ASTRONOMICAL_UNIT + k * 1_000_000.5; // crossed between day 11 and day 12
    // Linear interpolation is exact for a radius linear in time; tolerance 1e-3 s, far above the
    // rounding of 1.5e11 m (ulp 3e-5 m, i.e. 3e-6 s at 10 m/s).
    expect(Math.abs((timeToHeliocentricRadius(outwardSail(k), 'sun', target) as number) - 1_000_000.5)).toBeLessThan(1e-3);
    expect(Math.abs((timeToHeliocentricRadius(outwardSail(k), 'earth', target) as number) - 1_000_000.5)).toBeLessThan(1e-3);
  });

  it('reports a target beyond the span as not reached (null), and an inward target the same way', () => {
    expect(timeToHeliocentricRadius(outwardSail(10), 'sun', 2 * ASTRONOMICAL_UNIT)).toBeNull();
    expect(timeToHeliocentricRadius(outwardSail(10), 'sun', 0.5 * ASTRONOMICAL_UNIT)).toBeNull();
  });

  it('takes the lightness number from a_c / g☉(1 au) and the loading from m / A', () => {
    const b = sailBudget(outwardSail(10), 'sun', 100, { characteristicAccelMps2: 0.1e-3, sailAreaM2: 10_000 });
    expect(b.lightnessNumber).toBeCloseTo(0.1e-3 / SUN_GRAVITY_AT_1AU, 15);
    expect(b.sailLoadingKgM2).toBe(0.01);
    expect(b.timeToTargetSeconds).toBeNull();
  });
});

describe('sail budget of an Earth-centred run without SRP', () => {
  it('refuses to take the heliocentric radius from an unrecorded Sun distance, naming the sample', () => {
    const h = syntheticHistory(3, 60, () => undefined);
    expect(() => timeToHeliocentricRadius(h, 'earth', ASTRONOMICAL_UNIT)).toThrow(/samples\.0\.sunDistanceM/);
  });
});
