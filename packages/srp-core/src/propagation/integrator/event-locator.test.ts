import { describe, expect, it } from 'vitest';
import { EARTH_GM } from '../../bodies/body-constants';
import { SrpError } from '../../errors';
import { createDop853, type Derivative, type IntegratorOptions } from './dop853';
import { createEventLocator, type StepEvent } from './event-locator';
import { integrate } from './integrate';
import { periapsisState, twoBody } from './test-helpers';

const MU = EARTH_GM; // source: IERS Conventions 2010, Table 1.1
const TIGHT: IntegratorOptions = { relTol: 1e-13, absTol: 1e-12 };
const A = 7_000_000; // circular orbit radius (m)
const N = Math.sqrt(MU / A ** 3); // mean motion (rad/s), source: Kepler's third law
const PERIOD = (2 * Math.PI) / N;
/** Circular orbit starting on +x, inclined 30°: x(t) = A cos(n t) (source: uniform circular motion). */
const Y0 = periapsisState(MU, A, 0, Math.PI / 6);
const xCrossing: StepEvent = { name: 'x-zero', g: (_t, y) => y[0]! };

/** Analytic times of x = 0: (π/2 + kπ)/n. */
function analyticCrossings(count: number): number[] {
  return Array.from({ length: count }, (_, k) => (Math.PI / 2 + k * Math.PI) / N);
}

describe('createEventLocator on a circular orbit', () => {
  it('locates every x = 0 crossing over 10 revolutions within 1e-6 s of the analytic time', () => {
    const r = integrate(twoBody(MU), 0, Y0, 10 * PERIOD, TIGHT, { events: [xCrossing] });

    const expected = analyticCrossings(20);
    expect(r.events.map((e) => e.name)).toEqual(expected.map(() => 'x-zero'));
    const worst = Math.max(...r.events.map((e, k) => Math.abs(e.t - expected[k]!)));
    // 1e-6 s: the brief's requirement; measured 1.6e-9 s (the orbit's own along-track error and the
    // 1e-9 s root tolerance).
    expect(worst).toBeLessThan(1e-6);
    for (const e of r.events) expect(Math.abs(e.y[0]!)).toBeLessThan(1e-4); // |x| at the event (m): 7.5 km/s · 1e-8 s
  });

  it('reports only rising crossings with direction 1 and only falling ones with direction −1', () => {
    const rising = integrate(twoBody(MU), 0, Y0, 3 * PERIOD, TIGHT, { events: [{ ...xCrossing, direction: 1 }] });
    const falling = integrate(twoBody(MU), 0, Y0, 3 * PERIOD, TIGHT, { events: [{ ...xCrossing, direction: -1 }] });

    const all = analyticCrossings(6);
    // x = A cos(n t) falls through 0 at T/4 (k even) and rises at 3T/4 (k odd).
    expect(falling.events.map((e) => e.t)).toHaveLength(3);
    expect(rising.events.map((e) => e.t)).toHaveLength(3);
    falling.events.forEach((e, k) => expect(Math.abs(e.t - all[2 * k]!)).toBeLessThan(1e-6));
    rising.events.forEach((e, k) => expect(Math.abs(e.t - all[2 * k + 1]!)).toBeLessThan(1e-6));
  });

  it('stops exactly at restart events: a step ends on each and the next starts there', () => {
    const intervals: [number, number][] = [];
    const r = integrate(twoBody(MU), 0, Y0, 2 * PERIOD, TIGHT, {
      events: [{ ...xCrossing, restart: true }],
      onStep: (dop) => {
        intervals.push([dop.tPrev, dop.t]);
      },
    });

    expect(r.events).toHaveLength(4);
    for (const e of r.events) {
      const ending = intervals.findIndex(([, t1]) => t1 === e.t);
      expect(ending).toBeGreaterThanOrEqual(0);
      expect(intervals[ending + 1]![0]).toBe(e.t);
      // No step reaches across the event.
      expect(intervals.some(([t0, t1]) => t0 < e.t && e.t < t1)).toBe(false);
    }
  });

  it('a derivative that jumps at a restart event: the step lands on the new side and the next starts there', () => {
    // y' = 0 before t = 1, 1 after: y(3) = 2 exactly (source: integration by hand).
    const jump: Derivative = (dydt, t) => {
      dydt[0] = t < 1 ? 0 : 1;
    };
    const switchAt1: StepEvent = { name: 'switch', g: (t) => t - 1, restart: true };
    const starts: number[] = [];

    const r = integrate(jump, 0, new Float64Array([0]), 3, { relTol: 1e-12, absTol: 1e-12 }, {
      events: [switchAt1],
      onStep: (dop) => {
        starts.push(dop.tPrev);
      },
    });

    const tEvent = r.events[0]!.t;
    // On the side where g ≥ 0 (the new regime), within the 1e-9 s root tolerance.
    expect(tEvent - 1).toBeGreaterThanOrEqual(0);
    expect(tEvent - 1).toBeLessThan(1e-9);
    expect(starts).toContain(tEvent);
    // 1e-9: after the switch y = t − 1, so the error is that of the event time and the state there.
    expect(Math.abs(r.y[0]! - 2)).toBeLessThan(1e-9);
  });
});

describe('createEventLocator with its own stepping loop', () => {
  it('keeps the dense output valid on a step cut at a restart event and ignores an event that starts at zero', () => {
    const dop = createDop853(6, twoBody(MU), TIGHT);
    dop.reset(0, Y0);
    const startsAtZero: StepEvent = { name: 'y-zero', g: (_t, y) => y[1]! }; // y = 0 at t = 0
    const locator = createEventLocator(dop, [{ ...xCrossing, restart: true }, startsAtZero]);
    locator.start();
    const found: string[] = [];
    const out = new Float64Array(6);
    while (dop.t < PERIOD / 2) {
      dop.step(PERIOD / 2);
      for (const e of locator.afterStep()) {
        found.push(e.name);
        expect(dop.t).toBe(e.t);
        // Dense output covers the shortened step.
        expect(dop.denseAt(out, 0.5 * (dop.tPrev + dop.t))[0]).toBeGreaterThan(0);
      }
    }
    // x falls through 0 at T/4; y starts at 0, rises, and falls back through 0 at T/2 = the end.
    expect(found[0]).toBe('x-zero');
    expect(found.filter((n) => n === 'y-zero').length).toBeLessThanOrEqual(1);
  });

  it('refuses an event function that returns NaN, naming the event', () => {
    const dop = createDop853(6, twoBody(MU), TIGHT);
    dop.reset(0, Y0);
    const locator = createEventLocator(dop, [xCrossing, { name: 'broken', g: () => Number.NaN }]);
    try {
      locator.start();
      expect.unreachable('a NaN event must be refused');
    } catch (e) {
      expect(e).toBeInstanceOf(SrpError);
      expect((e as SrpError).details.field).toBe('events.1.g');
      expect((e as SrpError).message).toMatch(/broken/);
    }
  });
});
