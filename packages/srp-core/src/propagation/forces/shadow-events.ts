/**
 * Shadow edges as integrator events: the illuminated fraction ν jumps in slope (and, for the
 * cylindrical model, in value) at the shadow boundaries, so the integrator must end a step there
 * and restart rather than step over them (STYLE: discontinuities are events). Each g-function is
 * continuous in (t, y) and changes sign exactly where ν's formula changes branch.
 *
 * Conical model, per body, with a, b, c the apparent solar radius, body radius and separation
 * from `apparentDiscs` (the geometry `conicalShadowFraction` uses; radiation/shadow.ts):
 *   penumbra  g = c − (a + b)   < 0 once the body covers any of the Sun (first/last contact);
 *   umbra     g = c − (b − a)   < 0 while the body covers the whole Sun (second/third contact);
 *   antumbra  g = c − (a − b)   < 0 while the body lies wholly inside the solar disc (annular).
 * The umbra function stays ≥ c + a − b > 0 when the body looks smaller than the Sun, the antumbra
 * function when it looks larger, so each keeps one meaning (unlike c − |b − a|, eclipse-events.ts).
 * Cylindrical model, per body: g = ρ − R behind the body (r·ŝ < 0, ρ the distance from the
 * shadow axis), |r| − R in front of it: continuous (ρ = |r| where r·ŝ = 0), negative exactly in
 * the shadow cylinder.
 * Entry events have direction −1 (g falls through 0), exit events +1; all restart the integrator.
 */
import { EARTH_EQUATORIAL_RADIUS, MOON_RADIUS, SUN_RADIUS } from '../../bodies/body-constants';
import type { GeocentricEphemeris } from '../../bodies/geocentric-ephemeris';
import { SrpError } from '../../errors';
import type { ReadonlyVec3, Vec3 } from '../../math/vec3';
import { apparentDiscs, createApparentDiscs, shadowModels, type ShadowModel } from '../../radiation/shadow';
import { occultingBodies, type OccultingBody } from '../eclipse-events';
import type { StepEvent } from '../integrator/event-locator';
import { sunMoonMemo, type PositionMemo } from './ephemeris-cache';

/** A shadow-edge event for the integrator: a `StepEvent` whose g(t, y) changes sign at the edge. */
export interface ShadowStepEvent extends StepEvent {
  /** `<body>-<phase>-<entry|exit>`, e.g. `earth-umbra-entry`, `moon-penumbra-exit`, `earth-shadow-entry` (cylindrical). */
  name: string;
  /** Continuous event function (rad for conical, m for cylindrical) of t (s) and the state (m, m/s). */
  g: (t: number, y: Float64Array) => number;
  /** −1 for entries (g decreasing through 0), +1 for exits. */
  direction: 1 | -1;
  /** Always true: ν changes branch here. */
  restart: true;
}

/** Options of `createShadowEvents`. */
export interface ShadowEventOptions {
  /** Sun and Moon positions (m, ECI EQJ) over the span. */
  ephemeris: GeocentricEphemeris;
  /** The shadow model the SRP force uses: events follow its edges; 'none' gives no events. */
  shadowModel: ShadowModel;
  /** Occulting bodies, as for the SRP force; default ['earth', 'moon']. */
  bodies?: readonly OccultingBody[];
}

const ORIGIN: ReadonlyVec3 = [0, 0, 0];

/** The shadow g-functions of one body, sharing one evaluation per (t, position). */
function bodyFunctions(
  body: OccultingBody,
  sun: PositionMemo,
  moon: PositionMemo,
): { penumbra: (t: number, y: Float64Array) => number; umbra: (t: number, y: Float64Array) => number; antumbra: (t: number, y: Float64Array) => number; cylinder: (t: number, y: Float64Array) => number } {
  const radius = body === 'earth' ? EARTH_EQUATORIAL_RADIUS : MOON_RADIUS;
  const discs = createApparentDiscs();
  const r: Vec3 = [0, 0, 0];
  // Key of the cached evaluation: t, x, y, z (typed array: captured `let` doubles are boxed by V8).
  const last = new Float64Array(4).fill(Number.NaN);
  const update = (t: number, y: Float64Array): void => {
    if (t === last[0] && y[0] === last[1] && y[1] === last[2] && y[2] === last[3]) return;
    r[0] = y[0]!;
    r[1] = y[1]!;
    r[2] = y[2]!;
    const bodyPos = body === 'earth' ? ORIGIN : moon.at(t);
    apparentDiscs(discs, r, sun.at(t), bodyPos, radius, SUN_RADIUS);
    last[0] = t;
    last[1] = r[0];
    last[2] = r[1];
    last[3] = r[2];
  };
  return {
    penumbra(t, y) {
      update(t, y);
      return discs.separationRad - (discs.sunRadiusRad + discs.bodyRadiusRad);
    },
    umbra(t, y) {
      update(t, y);
      return discs.separationRad - (discs.bodyRadiusRad - discs.sunRadiusRad);
    },
    antumbra(t, y) {
      update(t, y);
      return discs.separationRad - (discs.sunRadiusRad - discs.bodyRadiusRad);
    },
    cylinder(t, y) {
      const bodyPos = body === 'earth' ? ORIGIN : moon.at(t);
      const s = sun.at(t);
      const sx = s[0] - bodyPos[0];
      const sy = s[1] - bodyPos[1];
      const sz = s[2] - bodyPos[2];
      const rx = y[0]! - bodyPos[0];
      const ry = y[1]! - bodyPos[1];
      const rz = y[2]! - bodyPos[2];
      const r2 = rx * rx + ry * ry + rz * rz;
      const rs = (rx * sx + ry * sy + rz * sz) / Math.sqrt(sx * sx + sy * sy + sz * sz);
      // Clamped at 0: rounding can make |r|² − (r·ŝ)² slightly negative on the axis.
      const rho = rs >= 0 ? Math.sqrt(r2) : Math.sqrt(Math.max(0, r2 - rs * rs));
      return rho - radius;
    },
  };
}

/**
 * The shadow-edge events of an Earth-centred run (see the file comment), for the integrator's
 * `events`. Conical: penumbra, umbra and antumbra entry and exit per body (6 per body);
 * cylindrical: shadow entry and exit per body; none: no events.
 * @throws SrpError naming `shadowModel` or `bodies.<i>`
 */
export function createShadowEvents(options: ShadowEventOptions): ShadowStepEvent[] {
  const { shadowModel } = options;
  if (!shadowModels.includes(shadowModel)) {
    throw new SrpError('invalid_input', `shadowModel must be one of ${shadowModels.join(', ')}; got ${String(shadowModel)}`, {
      field: 'shadowModel',
      value: shadowModel,
      limit: shadowModels.join(' | '),
    });
  }
  const bodies = options.bodies ?? occultingBodies;
  const { sun, moon } = sunMoonMemo(options.ephemeris);
  const events: ShadowStepEvent[] = [];
  if (shadowModel === 'none') return events;
  bodies.forEach((body, i) => {
    if (!occultingBodies.includes(body)) {
      throw new SrpError('invalid_input', `bodies.${i} must be one of ${occultingBodies.join(', ')}; got ${String(body)}`, {
        field: `bodies.${i}`,
        value: body,
        limit: occultingBodies.join(' | '),
      });
    }
    const f = bodyFunctions(body, sun, moon);
    const pairs: [string, (t: number, y: Float64Array) => number][] =
      shadowModel === 'conical'
        ? [
            ['penumbra', f.penumbra],
            ['umbra', f.umbra],
            ['antumbra', f.antumbra],
          ]
        : [['shadow', f.cylinder]];
    for (const [phase, g] of pairs) {
      events.push({ name: `${body}-${phase}-entry`, g, direction: -1, restart: true });
      events.push({ name: `${body}-${phase}-exit`, g, direction: 1, restart: true });
    }
  });
  return events;
}
