import { describe, expect, it } from 'vitest';
import { EARTH_GM } from '../bodies/body-constants';
import { parseUtcEpoch } from '../time/epoch';
import { keplerianToCartesian, orbitalPeriod } from './kepler';
import { createCentralBodyForce } from './forces/central-body';
import { createNodeCrossingEvents, createRadiusCrossingEvents } from './orbit-events';
import { propagate } from './propagate';

const epoch = parseUtcEpoch('2026-01-01T00:00:00Z');

describe('orbit events', () => {
  it('node crossings of a circular inclined two-body orbit fall at the analytic times (argument of latitude 0 and 180°)', () => {
    const a = 7_000_000;
    // Start at argument of latitude 30°: the ascending node comes after 330° of motion.
    const state0 = keplerianToCartesian(
      new Float64Array(6),
      { semiMajorAxisM: a, eccentricity: 0, inclinationRad: 0.9, raanRad: 0.3, argPeriapsisRad: 0, trueAnomalyRad: Math.PI / 6 },
      EARTH_GM,
    );
    const period = orbitalPeriod(a, EARTH_GM);
    const r = propagate({
      epoch, centralBody: 'earth', mu: EARTH_GM, state0, spanSeconds: 2 * period, outputStepSeconds: 600,
      forces: [createCentralBodyForce(EARTH_GM)], srp: null, events: createNodeCrossingEvents(),
      integrator: { relTol: 1e-12, absTol: 1e-9 },
    });
    // Analytic: uniform motion of the argument of latitude u at 2π/T (circular two-body; source: Kepler's laws).
    const expected = [
      { name: 'descending-node', t: (150 / 360) * period },
      { name: 'ascending-node', t: (330 / 360) * period },
      { name: 'descending-node', t: (510 / 360) * period },
      { name: 'ascending-node', t: (690 / 360) * period },
    ];
    expect(r.events.map((e) => e.name)).toEqual(expected.map((e) => e.name));
    // Event times to 1 ms: the locator's tolerance is 1e-9 s; the integration at rtol 1e-12 adds microseconds.
    r.events.forEach((e, i) => expect(Math.abs(e.tSeconds - expected[i]!.t)).toBeLessThan(1e-3));
  });

  it('radius crossings of an eccentric orbit come at the true anomalies where r equals the given radius', () => {
    const a = 20_000_000;
    const e = 0.5;
    const state0 = keplerianToCartesian(
      new Float64Array(6),
      { semiMajorAxisM: a, eccentricity: e, inclinationRad: 0.2, raanRad: 0, argPeriapsisRad: 0, trueAnomalyRad: 0 },
      EARTH_GM,
    );
    const radius = 20_000_000; // r = a where cos ν = −e (source: conic equation r = a(1 − e²)/(1 + e cos ν))
    const period = orbitalPeriod(a, EARTH_GM);
    const r = propagate({
      epoch, centralBody: 'earth', mu: EARTH_GM, state0, spanSeconds: period, outputStepSeconds: 3600,
      forces: [createCentralBodyForce(EARTH_GM)], srp: null, events: createRadiusCrossingEvents(radius, 'r20000km'),
      integrator: { relTol: 1e-12, absTol: 1e-9 },
    });
    // Kepler's equation: at r = a, E = ±π/2, so M = E − e sin E and t = M/n.
    const n = (2 * Math.PI) / period;
    const tUp = (Math.PI / 2 - e) / n;
    const tDown = (3 * Math.PI / 2 + e) / n;
    expect(r.events.map((x) => x.name)).toEqual(['r20000km-up', 'r20000km-down']);
    expect(Math.abs(r.events[0]!.tSeconds - tUp)).toBeLessThan(1e-3);
    expect(Math.abs(r.events[1]!.tSeconds - tDown)).toBeLessThan(1e-3);
  });

  it('refuses a non-positive radius naming radiusM', () => {
    expect(() => createRadiusCrossingEvents(0, 'x')).toThrow(/radiusM/);
  });
});
