import { describe, expect, it } from 'vitest';
import { createKeplerianElements, keplerianToCartesian } from '../propagation/kepler';
import { TEST_EARTH_MU, syntheticHistory } from './budget-test-helpers';
import { secularDrift } from './secular-drift';

const DEG = Math.PI / 180;

/** States on orbits whose elements move linearly in time (no two-body consistency needed: the fit reads elements back). */
function driftingHistory(rates: { aMPerDay: number; raanDegPerDay: number; iDegPerDay: number; ePerDay: number }, raan0Deg: number) {
  const el = createKeplerianElements();
  const state = new Float64Array(6);
  return syntheticHistory(24 * 10 + 1, 3600, (row, l, _k, t) => {
    const days = t / 86_400;
    el.semiMajorAxisM = 7_000_000 + rates.aMPerDay * days;
    el.eccentricity = 0.01 + rates.ePerDay * days;
    el.inclinationRad = (98 + rates.iDegPerDay * days) * DEG;
    el.raanRad = (((raan0Deg + rates.raanDegPerDay * days) % 360) + 360) % 360 * DEG;
    el.argPeriapsisRad = 30 * DEG;
    el.trueAnomalyRad = ((t / 600) % (2 * Math.PI));
    keplerianToCartesian(state, el, TEST_EARTH_MU);
    row.set(state.subarray(0, 3), l.r);
    row.set(state.subarray(3, 6), l.v);
  });
}

describe('secular drift of the osculating elements', () => {
  it('recovers a linear RAAN drift of +0.9856 deg/day across the 0/360 deg wrap, per day', () => {
    // Sun-synchronous rate 360/365.2422 deg/day (common practice); start at 355 deg so it wraps after 5 days.
    const rate = 360 / 365.2422;
    const d = secularDrift(driftingHistory({ aMPerDay: 0, raanDegPerDay: rate, iDegPerDay: 0, ePerDay: 0 }, 355), TEST_EARTH_MU);
    // Tolerance 1e-9 relative: elements → state → elements is exact to rounding (kepler.test.ts).
    expect(Math.abs((d.raanDegPerDay as number) / rate - 1)).toBeLessThan(1e-9);
    expect(Math.abs(d.semiMajorAxisMPerDay as number)).toBeLessThan(1e-6);
    expect(d.equatorial).toBe(false);
  });

  it('recovers drifts of a, e, i and a westward RAAN together', () => {
    const rates = { aMPerDay: -12.5, raanDegPerDay: -5, iDegPerDay: 1e-3, ePerDay: 2e-5 };
    const d = secularDrift(driftingHistory(rates, 2), TEST_EARTH_MU);
    expect(Math.abs((d.semiMajorAxisMPerDay as number) / rates.aMPerDay - 1)).toBeLessThan(1e-7);
    expect(Math.abs((d.eccentricityPerDay as number) / rates.ePerDay - 1)).toBeLessThan(1e-7);
    expect(Math.abs((d.inclinationDegPerDay as number) / rates.iDegPerDay - 1)).toBeLessThan(1e-7);
    expect(Math.abs((d.raanDegPerDay as number) / rates.raanDegPerDay - 1)).toBeLessThan(1e-9);
  });

  it('gives no RAAN drift for an equatorial orbit and no drift at all from one sample', () => {
    const equatorial = syntheticHistory(10, 60, (row, l) => {
      row[l.r] = 7e6;
      row[l.v + 1] = 7546;
    });
    expect(secularDrift(equatorial, TEST_EARTH_MU)).toMatchObject({ raanDegPerDay: null, equatorial: true });
    const single = syntheticHistory(1, 60, (row, l) => {
      row[l.r] = 7e6;
      row[l.v + 2] = 7546;
    });
    expect(secularDrift(single, TEST_EARTH_MU)).toMatchObject({ semiMajorAxisMPerDay: null, raanDegPerDay: null });
  });
});
