import { beforeAll, describe, expect, it } from 'vitest';
import { EARTH_EQUATORIAL_RADIUS, EARTH_GM, MOON_RADIUS, SUN_RADIUS } from '../bodies/body-constants';
import { createGeocentricEphemeris, type GeocentricEphemeris } from '../bodies/geocentric-ephemeris';
import type { Vec3 } from '../math/vec3';
import { apparentDiscs, conicalShadowFraction, createApparentDiscs } from '../radiation/shadow';
import { parseUtcEpoch } from '../time/epoch';
import {
  findEclipseEvents,
  summarizeEclipses,
  type EclipseEvent,
  type EclipseSearchResult,
  type SunMoonPositions,
} from './eclipse-events';
import { keplerianToCartesian, propagateKepler } from './kepler';

const GEO_RADIUS = 42_164_170; // source: common practice (a for a period of one sidereal day)
const DAY = 86_400;
const ORIGIN: Vec3 = [0, 0, 0];

/** A circular equatorial orbit of radius 42 164.17 km, propagated analytically. */
function geoSatellite(): (out: Vec3, t: number) => Vec3 {
  const start = keplerianToCartesian(
    new Float64Array(6),
    { semiMajorAxisM: GEO_RADIUS, eccentricity: 0, inclinationRad: 0, raanRad: 0, argPeriapsisRad: 0, trueAnomalyRad: 0 },
    EARTH_GM,
  );
  const s = new Float64Array(6);
  return (out, t) => {
    propagateKepler(s, start, t, EARTH_GM);
    out[0] = s[0]!;
    out[1] = s[1]!;
    out[2] = s[2]!;
    return out;
  };
}

/** ν from the independent code path (radiation/shadow) for the body of an event. */
function nuAt(event: EclipseEvent, t: number, sat: (out: Vec3, t: number) => Vec3, eph: SunMoonPositions): number {
  const r = sat([0, 0, 0], t);
  const sun = eph.sunPositionAt([0, 0, 0], t);
  return event.body === 'earth'
    ? conicalShadowFraction(r, sun, ORIGIN, EARTH_EQUATORIAL_RADIUS, SUN_RADIUS)
    : conicalShadowFraction(r, sun, eph.moonPositionAt([0, 0, 0], t), MOON_RADIUS, SUN_RADIUS);
}

/**
 * Checks every event to ±0.05 s with ν from radiation/shadow: lit before first contact and
 * partly shadowed after it, nothing visible inside the umbra, the reverse at the exits.
 */
function expectEventsWithin50ms(result: EclipseSearchResult, sat: (out: Vec3, t: number) => Vec3, eph: SunMoonPositions): void {
  for (const ev of result.events) {
    const before = nuAt(ev, ev.tSeconds - 0.05, sat, eph);
    const after = nuAt(ev, ev.tSeconds + 0.05, sat, eph);
    switch (ev.kind) {
      case 'penumbra-entry':
        expect([before, after < 1]).toEqual([1, true]);
        break;
      case 'penumbra-exit':
        expect([before < 1, after]).toEqual([true, 1]);
        break;
      case 'umbra-entry':
        expect([before > 0, after]).toEqual([true, 0]);
        break;
      case 'umbra-exit':
        expect([before, after > 0]).toEqual([0, true]);
        break;
      case 'antumbra-entry':
      case 'antumbra-exit': {
        // Inside the antumbra ν is constant (1 − b²/a²); outside it changes with c.
        const inside = ev.kind === 'antumbra-entry' ? after : before;
        const outside = ev.kind === 'antumbra-entry' ? before : after;
        expect(inside).toBeLessThan(1);
        expect(outside).toBeGreaterThan(inside);
        break;
      }
    }
  }
}

describe('findEclipseEvents around a geostationary orbit', () => {
  const epoch = parseUtcEpoch('2026-03-17T00:00:00Z'); // March equinox 2026-03-20 14:46 UTC (astronomy-engine Seasons: 14:45:36 UTC)
  const span = 7 * DAY;
  let eph: GeocentricEphemeris;
  const sat = geoSatellite();
  beforeAll(() => {
    eph = createGeocentricEphemeris(epoch, 0, span);
  });

  it('finds one Earth eclipse a day near the March equinox, longest ≈ 71.7 min first to last contact and 67.5 min in umbra', () => {
    const result = findEclipseEvents(sat, eph, 0, span);
    const summary = summarizeEclipses(result);
    // One eclipse per solar day (the geometry repeats with the Sun, every 86 400 s).
    expect(summary.passes.length).toBe(7);
    expect(summary.passes.every((p) => p.body === 'earth')).toBe(true);
    const longest = summary.passes.reduce((best, p) => (p.durationSeconds > best.durationSeconds ? p : best));
    // source: "about 70 minutes" at the equinox, umbra a little under and penumbra a little over
    // (common practice). Measured: 71.73 min first to last contact, 67.45 min in umbra.
    expect(longest.durationSeconds / 60).toBeGreaterThan(70);
    expect(longest.durationSeconds / 60).toBeLessThan(73);
    expect(longest.umbraSeconds / 60).toBeGreaterThan(66);
    expect(longest.umbraSeconds / 60).toBeLessThan(70);
    // Independent analytic check: with the Sun in the orbit plane, contacts happen where the
    // separation c equals b ± a, and c changes at the synodic rate 2π/86 400 s, so the durations
    // are 2 (b ± a) · 86 400 / 2π (b = asin(R⊕/r), a = asin(R⊙/d⊙)). The Sun is at most 0.5° off
    // the plane on the closest day, shortening the chords by ≲ 5 s; 10 s tolerance.
    const sunAtEclipse = eph.sunPositionAt([0, 0, 0], longest.startSeconds);
    const a = Math.asin(SUN_RADIUS / Math.hypot(...sunAtEclipse));
    const b = Math.asin(EARTH_EQUATORIAL_RADIUS / GEO_RADIUS);
    const synodicRate = (2 * Math.PI) / DAY;
    expect(Math.abs(longest.durationSeconds - (2 * (b + a)) / synodicRate)).toBeLessThan(10);
    expect(Math.abs(longest.umbraSeconds - (2 * (b - a)) / synodicRate)).toBeLessThan(10);
    // Passes do not overlap here, so the total is their sum (1e-6 s: sums of event times).
    const sum = summary.passes.reduce((total, p) => total + p.durationSeconds, 0);
    expect(Math.abs(summary.totalShadowSeconds - sum)).toBeLessThan(1e-6);
  });

  it('places every equinox event within 0.05 s, by ν from the shadow model on either side', () => {
    const result = findEclipseEvents(sat, eph, 0, span);
    expect(result.events.length).toBe(28);
    expectEventsWithin50ms(result, sat, eph);
  });

  it('finds the same event times with a 10-minute scan step as with 30 s, within 2 ms (twice the 1 ms root tolerance)', () => {
    const fine = findEclipseEvents(sat, eph, 0, 2 * DAY, { stepSeconds: 30 });
    const coarse = findEclipseEvents(sat, eph, 0, 2 * DAY, { stepSeconds: 600 });
    expect(coarse.events.map((e) => e.kind)).toEqual(fine.events.map((e) => e.kind));
    coarse.events.forEach((e, i) => expect(Math.abs(e.tSeconds - fine.events[i]!.tSeconds)).toBeLessThan(2e-3));
  });

  it('finds no eclipse near the June solstice', () => {
    const june = parseUtcEpoch('2026-06-19T00:00:00Z');
    const ephJune = createGeocentricEphemeris(june, 0, 4 * DAY);
    const result = findEclipseEvents(sat, ephJune, 0, 4 * DAY);
    expect(result.events).toEqual([]);
    expect(result.initialPhase).toEqual({ earth: 'sunlit', moon: 'sunlit' });
    expect(summarizeEclipses(result).totalShadowSeconds).toBe(0);
  });
});

describe('findEclipseEvents in synthetic geometries', () => {
  const AU = 149_597_870_700;
  /** The Sun fixed on +x at 1 au; the Moon parked far off unless given. */
  const fixedSky = (moon: Vec3 = [0, 0, 1e12]): SunMoonPositions => ({
    sunPositionAt: (out) => {
      out[0] = AU;
      out[1] = 0;
      out[2] = 0;
      return out;
    },
    moonPositionAt: (out) => {
      out[0] = moon[0];
      out[1] = moon[1];
      out[2] = moon[2];
      return out;
    },
  });

  it('catches a grazing penumbra pass of about 20 s that falls between 60 s scan samples', () => {
    // A straight pass behind the Earth at GEO distance, offset so that the minimum separation dips
    // just below a + b (by 1.6e-6 rad): the penumbra lasts about 20 s, centred on t = 990 s, so
    // the samples at 960 s and 1020 s are both outside it.
    const sky = fixedSky();
    const x = -GEO_RADIUS;
    // Find the sideways offset that makes c − (a + b) = −1.6e-6 rad at closest approach (bisection).
    const discs = createApparentDiscs();
    const fAt = (y: number): number => {
      apparentDiscs(discs, [x, y, 0], [AU, 0, 0], ORIGIN, EARTH_EQUATORIAL_RADIUS, SUN_RADIUS);
      return discs.separationRad - discs.sunRadiusRad - discs.bodyRadiusRad + 1.6e-6;
    };
    let lo = 0;
    let hi = 10_000_000;
    for (let k = 0; k < 80; k += 1) {
      const mid = (lo + hi) / 2;
      if (fAt(mid) < 0) lo = mid;
      else hi = mid;
    }
    const offset = (lo + hi) / 2;
    const sat = (out: Vec3, t: number): Vec3 => {
      out[0] = x;
      out[1] = offset;
      out[2] = 3000 * (t - 990);
      return out;
    };
    const result = findEclipseEvents(sat, sky, 0, 2000, { stepSeconds: 60, bodies: ['earth'] });
    expect(result.events.map((e) => e.kind)).toEqual(['penumbra-entry', 'penumbra-exit']);
    const [entry, exit] = [result.events[0]!.tSeconds, result.events[1]!.tSeconds];
    expect(Math.floor(entry / 60)).toBe(Math.floor(exit / 60)); // no sample inside the pass
    expect(exit - entry).toBeGreaterThan(10);
    expect(exit - entry).toBeLessThan(40);
    expectEventsWithin50ms(result, sat, sky);
  });

  it('classifies the Moon\'s shadow: umbra 200 000 km behind it, antumbra 450 000 km behind it', () => {
    // source: the Moon's umbra ends R☾/sin a ≈ 374 000 km behind it at 1 au (common practice)
    const moon: Vec3 = [50_000_000, 0, 0];
    const sky = fixedSky(moon);
    for (const [behind, inner] of [
      [200_000_000, 'umbra'],
      [450_000_000, 'antumbra'],
    ] as const) {
      const sat = (out: Vec3, t: number): Vec3 => {
        out[0] = moon[0] - behind;
        out[1] = 1000 * (t - 5000); // crossing the shadow axis at 1 km/s
        out[2] = 300_000;
        return out;
      };
      const result = findEclipseEvents(sat, sky, 0, 10_000, { bodies: ['moon'] });
      expect(result.events.map((e) => `${e.body} ${e.kind}`)).toEqual([
        'moon penumbra-entry',
        `moon ${inner}-entry`,
        `moon ${inner}-exit`,
        'moon penumbra-exit',
      ]);
      expectEventsWithin50ms(result, sat, sky);
      const summary = summarizeEclipses(result);
      expect(summary.passes.length).toBe(1);
      if (inner === 'umbra') expect(summary.totalUmbraSeconds).toBeGreaterThan(0);
      else expect(summary.passes[0]!.antumbraSeconds).toBeGreaterThan(0);
    }
  });

  it('reports a span that starts in the umbra as an eclipse already under way', () => {
    const sky = fixedSky();
    const sat = (out: Vec3, t: number): Vec3 => {
      out[0] = -GEO_RADIUS;
      out[1] = 3000 * t; // leaving the shadow axis sideways
      out[2] = 0;
      return out;
    };
    const result = findEclipseEvents(sat, sky, 0, 4000, { bodies: ['earth'] });
    expect(result.initialPhase.earth).toBe('umbra');
    expect(result.events.map((e) => e.kind)).toEqual(['umbra-exit', 'penumbra-exit']);
    const summary = summarizeEclipses(result);
    expect(summary.passes[0]!.startsBeforeSpan).toBe(true);
    expect(Math.abs(summary.passes[0]!.umbraSeconds - result.events[0]!.tSeconds)).toBeLessThan(1e-9);
  });

  it('counts overlapping Earth and Moon shadows once in the total', () => {
    // A Moon placed 30 000 km sunward of the Earth and 8000 km aside: a satellite crossing the
    // Earth's shadow at GEO distance meets the Moon's shadow as it leaves the Earth's.
    const sky = fixedSky([30_000_000, 8_000_000, 0]);
    const sat = (out: Vec3, t: number): Vec3 => {
      out[0] = -GEO_RADIUS;
      out[1] = 3000 * (t - 3000);
      out[2] = 0;
      return out;
    };
    const result = findEclipseEvents(sat, sky, 0, 8000);
    const summary = summarizeEclipses(result);
    const earthPass = summary.passes.find((p) => p.body === 'earth')!;
    const moonPass = summary.passes.find((p) => p.body === 'moon')!;
    expect(earthPass).toBeDefined();
    expect(moonPass).toBeDefined();
    expect(moonPass.startSeconds).toBeLessThan(earthPass.endSeconds); // they overlap
    const union = Math.max(earthPass.endSeconds, moonPass.endSeconds) - Math.min(earthPass.startSeconds, moonPass.startSeconds);
    // 1e-6 s: sums and differences of event times.
    expect(Math.abs(summary.totalShadowSeconds - union)).toBeLessThan(1e-6);
    expect(summary.totalShadowSeconds).toBeLessThan(earthPass.durationSeconds + moonPass.durationSeconds);
    expectEventsWithin50ms(result, sat, sky);
  });

  it('refuses an empty span and a zero step, naming the field', () => {
    const sky = fixedSky();
    const sat = (out: Vec3): Vec3 => out;
    expect(() => findEclipseEvents(sat, sky, 10, 10)).toThrow(
      expect.objectContaining({ code: 'out_of_range', details: expect.objectContaining({ field: 'endSeconds' }) }),
    );
    expect(() => findEclipseEvents(sat, sky, 0, 10, { stepSeconds: 0 })).toThrow(
      expect.objectContaining({ details: expect.objectContaining({ field: 'stepSeconds' }) }),
    );
  });
});
