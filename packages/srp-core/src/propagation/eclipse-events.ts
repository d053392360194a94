/**
 * Eclipse events: when a spacecraft enters and leaves the penumbra and the umbra (or antumbra) of
 * the Earth and the Moon, found by root finding on continuous shadow functions, not by sampling ν.
 *
 * For each body, with a, b, c the apparent solar radius, body radius and separation
 * (`apparentDiscs`, conical model as in `radiation/shadow.ts`):
 * - penumbra function  fP = c − (a + b): negative once the body covers any of the Sun
 *   (first contact → `penumbra-entry`, last contact → `penumbra-exit`);
 * - inner function     fU = c − |b − a|: negative while the body covers the whole Sun (b > a:
 *   `umbra-entry` / `umbra-exit`, second and third contact) or lies wholly inside the solar disc
 *   (b < a: `antumbra-entry` / `antumbra-exit`, an annular eclipse).
 * Both are continuous in time (c, a, b are), so sign changes bracket the events.
 *
 * Search: the span is scanned at `stepSeconds`; every sign change is refined by Brent's method
 * to `toleranceSeconds`; every sampled local extremum close enough to zero to hide two crossings
 * between samples (|f_i| < 4 × the larger neighbour difference, which is certain for a locally
 * parabolic f) is refined by golden-section search and, if it crosses, yields two events. So an
 * eclipse is missed only if its shadow function is not even approximately parabolic over
 * 2 × stepSeconds, which for orbital motion needs steps of a sizeable fraction of the orbit.
 * Source: Brent, Algorithms for Minimization without Derivatives (1973), ch. 4 "zero" (from memory).
 */
import { EARTH_EQUATORIAL_RADIUS, MOON_RADIUS, SUN_RADIUS } from '../bodies/body-constants';
import { SrpError } from '../errors';
import type { ReadonlyVec3, Vec3 } from '../math/vec3';
import { apparentDiscs, createApparentDiscs } from '../radiation/shadow';
import { brentRoot, createRootBracket } from './integrator/brent-root';

/** Bodies that can eclipse the Sun for a spacecraft in Earth orbit. */
export const occultingBodies = ['earth', 'moon'] as const;
/** `earth` (sphere of EARTH_EQUATORIAL_RADIUS) or `moon` (sphere of MOON_RADIUS). */
export type OccultingBody = (typeof occultingBodies)[number];

/** Event kinds, in the order they occur during a total (or annular) eclipse. */
export const eclipseEventKinds = [
  'penumbra-entry',
  'umbra-entry',
  'antumbra-entry',
  'antumbra-exit',
  'umbra-exit',
  'penumbra-exit',
] as const;
/** First contact, second contact (umbra or antumbra), third contact, last contact. */
export type EclipseEventKind = (typeof eclipseEventKinds)[number];

/** One event. */
export interface EclipseEvent {
  /** What happens. */
  kind: EclipseEventKind;
  /** Which body's shadow. */
  body: OccultingBody;
  /** When (s from the scenario epoch), within toleranceSeconds (1 ms by default). */
  tSeconds: number;
}

/** Where a spacecraft is with respect to one body's shadow. */
export type ShadowPhase = 'sunlit' | 'penumbra' | 'umbra' | 'antumbra';

/** Sun and Moon positions over time, as `GeocentricEphemeris` provides them. */
export interface SunMoonPositions {
  /** Geocentric position of the Sun (m, ECI EQJ) at tSeconds (s from the epoch). */
  sunPositionAt(out: Vec3, tSeconds: number): Vec3;
  /** Geocentric position of the Moon (m, ECI EQJ) at tSeconds (s from the epoch). */
  moonPositionAt(out: Vec3, tSeconds: number): Vec3;
}

/** Search settings. */
export interface EclipseSearchOptions {
  /** Occulting bodies to consider; default both. */
  bodies?: readonly OccultingBody[];
  /** Scan step (s); default 30 s (a LEO orbit is then sampled 180 times). */
  stepSeconds?: number;
  /** Root-finding tolerance on event times (s); default 0.001 s. */
  toleranceSeconds?: number;
}

/** The events of a span and the phase each body's shadow was in at its start. */
export interface EclipseSearchResult {
  /** Start of the searched span (s from the epoch). */
  startSeconds: number;
  /** End of the searched span (s from the epoch). */
  endSeconds: number;
  /** The bodies searched. */
  bodies: OccultingBody[];
  /** Phase at startSeconds, per body searched. */
  initialPhase: Partial<Record<OccultingBody, ShadowPhase>>;
  /** Events in time order. */
  events: EclipseEvent[];
}

const DEFAULT_STEP_SECONDS = 30;
const DEFAULT_TOLERANCE_SECONDS = 1e-3;
const ORIGIN: ReadonlyVec3 = [0, 0, 0];
const rSat: Vec3 = [0, 0, 0];
const sunPos: Vec3 = [0, 0, 0];
const moonPos: Vec3 = [0, 0, 0];
const discs = createApparentDiscs();

/** The shadow functions of one body at one time: fP and fU (rad), and whether b > a. */
interface ShadowValues {
  penumbra: number;
  inner: number;
  bodyLarger: boolean;
}
const values: ShadowValues = { penumbra: 0, inner: 0, bodyLarger: false };

function evaluate(
  out: ShadowValues,
  satPositionEci: (out: Vec3, tSeconds: number) => Vec3,
  ephemeris: SunMoonPositions,
  body: OccultingBody,
  t: number,
): ShadowValues {
  satPositionEci(rSat, t);
  ephemeris.sunPositionAt(sunPos, t);
  if (body === 'earth') {
    apparentDiscs(discs, rSat, sunPos, ORIGIN, EARTH_EQUATORIAL_RADIUS, SUN_RADIUS);
  } else {
    apparentDiscs(discs, rSat, sunPos, ephemeris.moonPositionAt(moonPos, t), MOON_RADIUS, SUN_RADIUS);
  }
  const a = discs.sunRadiusRad;
  const b = discs.bodyRadiusRad;
  const c = discs.separationRad;
  out.penumbra = c - (a + b);
  out.inner = c - Math.abs(b - a);
  out.bodyLarger = b > a;
  if (!Number.isFinite(out.penumbra) || !Number.isFinite(out.inner)) {
    throw new SrpError('invalid_input', `the spacecraft, Sun or Moon position at t = ${t} s is not finite`, {
      field: 'satPositionEci',
      value: t,
    });
  }
  return out;
}

const bracket = createRootBracket();

/** Brent's method (integrator/brent-root.ts) for a root of f on [a, b], f(a) and f(b) of opposite signs. */
function rootOf(f: (t: number) => number, a: number, b: number, fa: number, fb: number, tol: number): number {
  return brentRoot(bracket, f, a, b, fa, fb, tol).root;
}

/** Golden-section search for the minimum of f on [a, b] to tolerance tol; returns its abscissa. */
function goldenMin(f: (t: number) => number, a0: number, b0: number, tol: number): number {
  const g = (Math.sqrt(5) - 1) / 2;
  let a = a0;
  let b = b0;
  let x1 = b - g * (b - a);
  let x2 = a + g * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  while (b - a > tol) {
    if (f1 <= f2) {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - g * (b - a);
      f1 = f(x1);
    } else {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + g * (b - a);
      f2 = f(x2);
    }
  }
  return f1 <= f2 ? x1 : x2;
}

/**
 * Finds eclipse events of the given bodies between startSeconds and endSeconds.
 * @param satPositionEci writes the spacecraft position (m, ECI EQJ) at tSeconds (s from the epoch) into out
 * @param ephemeris Sun and Moon positions (m, ECI EQJ), e.g. a `GeocentricEphemeris` covering the span
 * @param startSeconds span start (s from the epoch)
 * @param endSeconds span end (s from the epoch), > startSeconds
 * @returns events sorted by time, and each body's phase at the start
 * @throws SrpError `out_of_range` for an empty span or a non-positive step or tolerance
 */
export function findEclipseEvents(
  satPositionEci: (out: Vec3, tSeconds: number) => Vec3,
  ephemeris: SunMoonPositions,
  startSeconds: number,
  endSeconds: number,
  options: EclipseSearchOptions = {},
): EclipseSearchResult {
  const bodies = [...(options.bodies ?? occultingBodies)];
  const step = options.stepSeconds ?? DEFAULT_STEP_SECONDS;
  const tol = options.toleranceSeconds ?? DEFAULT_TOLERANCE_SECONDS;
  if (!Number.isFinite(startSeconds) || !Number.isFinite(endSeconds) || !(endSeconds > startSeconds)) {
    const message = `endSeconds must be finite and after startSeconds (${startSeconds} s); got ${endSeconds}`;
    throw new SrpError('out_of_range', message, {
      field: 'endSeconds',
      value: endSeconds,
      limit: `> ${startSeconds}`,
    });
  }
  if (!(step > 0) || !Number.isFinite(step)) {
    throw new SrpError('out_of_range', `stepSeconds must be a finite number (s) greater than 0; got ${step}`, {
      field: 'stepSeconds',
      value: step,
      limit: '> 0',
    });
  }
  if (!(tol > 0) || !Number.isFinite(tol)) {
    throw new SrpError('out_of_range', `toleranceSeconds must be a finite number (s) greater than 0; got ${tol}`, {
      field: 'toleranceSeconds',
      value: tol,
      limit: '> 0',
    });
  }
  const n = Math.max(1, Math.ceil((endSeconds - startSeconds) / step));
  const h = (endSeconds - startSeconds) / n;
  const times = new Float64Array(n + 1);
  for (let i = 0; i <= n; i += 1) times[i] = i === n ? endSeconds : startSeconds + i * h;

  const events: EclipseEvent[] = [];
  const initialPhase: Partial<Record<OccultingBody, ShadowPhase>> = {};
  for (const body of bodies) {
    const fp = new Float64Array(n + 1);
    const fu = new Float64Array(n + 1);
    for (let i = 0; i <= n; i += 1) {
      evaluate(values, satPositionEci, ephemeris, body, times[i] as number);
      fp[i] = values.penumbra;
      fu[i] = values.inner;
      if (i === 0) {
        initialPhase[body] =
          values.inner < 0 ? (values.bodyLarger ? 'umbra' : 'antumbra') : values.penumbra < 0 ? 'penumbra' : 'sunlit';
      }
    }
    const fPen = (t: number): number => evaluate(values, satPositionEci, ephemeris, body, t).penumbra;
    const fInner = (t: number): number => evaluate(values, satPositionEci, ephemeris, body, t).inner;
    const innerKind = (t: number, entry: boolean): EclipseEventKind => {
      const larger = evaluate(values, satPositionEci, ephemeris, body, t).bodyLarger;
      if (larger) return entry ? 'umbra-entry' : 'umbra-exit';
      return entry ? 'antumbra-entry' : 'antumbra-exit';
    };
    const push = (kind: EclipseEventKind, t: number): void => {
      events.push({ kind, body, tSeconds: t });
    };
    for (const [f, fn, isPenumbra] of [
      [fp, fPen, true],
      [fu, fInner, false],
    ] as const) {
      const kindOf = (t: number, entry: boolean): EclipseEventKind =>
        isPenumbra ? (entry ? 'penumbra-entry' : 'penumbra-exit') : innerKind(t, entry);
      for (let i = 0; i < n; i += 1) {
        const f0 = f[i] as number;
        const f1 = f[i + 1] as number;
        const t0 = times[i] as number;
        const t1 = times[i + 1] as number;
        if (f0 >= 0 !== f1 >= 0) {
          const t = rootOf(fn, t0, t1, f0, f1, tol);
          push(kindOf(t, f0 >= 0), t);
        }
        if (i === 0) continue;
        // A near-zero local extremum of the samples may hide two crossings inside [t_{i-1}, t_{i+1}].
        const fm = f[i - 1] as number;
        const sameSide = fm >= 0 === f0 >= 0 && f0 >= 0 === f1 >= 0;
        if (!sameSide) continue;
        const sign = f0 >= 0 ? 1 : -1;
        const gm = sign * fm;
        const g0 = sign * f0;
        const g1 = sign * f1;
        // Strict on the left so that a tie between two samples is refined once, not twice.
        if (!(g0 < gm && g0 <= g1)) continue;
        if (!(g0 < 4 * Math.max(gm - g0, g1 - g0))) continue;
        const tm = times[i - 1] as number;
        const g = (t: number): number => sign * fn(t);
        const tMin = goldenMin(g, tm, t1, tol);
        const gMin = g(tMin);
        if (gMin >= 0) continue;
        const tA = rootOf(fn, tm, tMin, fm, sign * gMin, tol);
        const tB = rootOf(fn, tMin, t1, sign * gMin, f1, tol);
        push(kindOf(tA, sign > 0), tA);
        push(kindOf(tB, sign < 0), tB);
      }
    }
  }
  const order = (k: EclipseEventKind): number => eclipseEventKinds.indexOf(k);
  events.sort((x, y) => x.tSeconds - y.tSeconds || (x.body === y.body ? order(x.kind) - order(y.kind) : 0));
  return { startSeconds, endSeconds, bodies, initialPhase, events };
}

/** One eclipse by one body: from first to last contact, clipped to the searched span. */
export interface EclipsePass {
  /** The occulting body. */
  body: OccultingBody;
  /** Start (s from the epoch): penumbra entry, or the span start if already in shadow. */
  startSeconds: number;
  /** End (s from the epoch): penumbra exit, or the span end if still in shadow. */
  endSeconds: number;
  /** endSeconds − startSeconds (s). */
  durationSeconds: number;
  /** Time in the umbra (s). */
  umbraSeconds: number;
  /** Time in the antumbra (annular phase) (s). */
  antumbraSeconds: number;
  /** True if the span started inside this eclipse. */
  startsBeforeSpan: boolean;
  /** True if the span ended inside this eclipse. */
  endsAfterSpan: boolean;
}

/** Eclipses of a span and the time spent in shadow. */
export interface EclipseSummary {
  /** Every eclipse, by start time. */
  passes: EclipsePass[];
  /** Time with any part of the Sun hidden by any body (s), overlaps counted once. */
  totalShadowSeconds: number;
  /** Time with the whole Sun hidden by some body (s), overlaps counted once. */
  totalUmbraSeconds: number;
  /** Longest pass duration (s); 0 with no eclipse. */
  longestSeconds: number;
}

function unionLength(intervals: [number, number][]): number {
  intervals.sort((x, y) => x[0] - y[0]);
  let total = 0;
  let curStart = Number.NEGATIVE_INFINITY;
  let curEnd = Number.NEGATIVE_INFINITY;
  for (const [s, e] of intervals) {
    if (s > curEnd) {
      if (curEnd > curStart) total += curEnd - curStart;
      curStart = s;
      curEnd = e;
    } else if (e > curEnd) {
      curEnd = e;
    }
  }
  if (curEnd > curStart) total += curEnd - curStart;
  return total;
}

/**
 * Groups the events of a search into eclipses (first to last contact) per body, with their
 * umbra and antumbra time, and totals over the span.
 */
export function summarizeEclipses(result: EclipseSearchResult): EclipseSummary {
  const passes: EclipsePass[] = [];
  const shadowIntervals: [number, number][] = [];
  const umbraIntervals: [number, number][] = [];
  for (const body of result.bodies) {
    let phase: ShadowPhase = result.initialPhase[body] ?? 'sunlit';
    let current: EclipsePass | null = null;
    let innerStart = result.startSeconds;
    const open = (t: number, startsBefore: boolean): EclipsePass => ({
      body,
      startSeconds: t,
      endSeconds: t,
      durationSeconds: 0,
      umbraSeconds: 0,
      antumbraSeconds: 0,
      startsBeforeSpan: startsBefore,
      endsAfterSpan: false,
    });
    const closeInner = (pass: EclipsePass, t: number): void => {
      if (phase === 'umbra') {
        pass.umbraSeconds += t - innerStart;
        umbraIntervals.push([innerStart, t]);
      } else if (phase === 'antumbra') {
        pass.antumbraSeconds += t - innerStart;
      }
    };
    if (phase !== 'sunlit') current = open(result.startSeconds, true);
    for (const ev of result.events) {
      if (ev.body !== body) continue;
      const t = ev.tSeconds;
      switch (ev.kind) {
        case 'penumbra-entry':
          current = open(t, false);
          phase = 'penumbra';
          break;
        case 'umbra-entry':
        case 'antumbra-entry':
          current ??= open(t, false);
          innerStart = t;
          phase = ev.kind === 'umbra-entry' ? 'umbra' : 'antumbra';
          break;
        case 'umbra-exit':
        case 'antumbra-exit':
          current ??= open(result.startSeconds, true);
          closeInner(current, t);
          phase = 'penumbra';
          break;
        case 'penumbra-exit': {
          const pass = current ?? open(result.startSeconds, true);
          if (phase === 'umbra' || phase === 'antumbra') closeInner(pass, t);
          pass.endSeconds = t;
          pass.durationSeconds = t - pass.startSeconds;
          passes.push(pass);
          shadowIntervals.push([pass.startSeconds, t]);
          current = null;
          phase = 'sunlit';
          break;
        }
      }
    }
    if (current) {
      const t = result.endSeconds;
      if (phase === 'umbra' || phase === 'antumbra') closeInner(current, t);
      current.endSeconds = t;
      current.durationSeconds = t - current.startSeconds;
      current.endsAfterSpan = true;
      passes.push(current);
      shadowIntervals.push([current.startSeconds, t]);
    }
  }
  passes.sort((x, y) => x.startSeconds - y.startSeconds);
  return {
    passes,
    totalShadowSeconds: unionLength(shadowIntervals),
    totalUmbraSeconds: unionLength(umbraIntervals),
    longestSeconds: passes.reduce((m, p) => Math.max(m, p.durationSeconds), 0),
  };
}
