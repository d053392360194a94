/**
 * Sail figures of merit and the time a sail takes to reach a heliocentric radius.
 */
import { SrpError, requirePositive } from '../errors';
import { lightnessNumber, sailLoading } from '../vehicles/sail-performance';
import type { SampleHistory } from './sample-history';

/** What the caller knows of the sail (from vehicles/sail-performance.ts). */
export interface SailContext {
  /** Characteristic acceleration a_c at 1 au (m/s²), e.g. from `characteristicAcceleration`. */
  characteristicAccelMps2: number;
  /** Sail area (m²), for the sail loading; omit to leave that line out. */
  sailAreaM2?: number;
  /** Heliocentric radius to reach (m); omit to leave the time-to-target line out. */
  targetHeliocentricRadiusM?: number;
}

/** Sail metrics and the time to the target radius. */
export interface SailBudget {
  /** a_c (m/s²). */
  characteristicAccelMps2: number;
  /** β = a_c / g☉(1 au) (-). */
  lightnessNumber: number;
  /** σ = m / A (kg/m²); null without an area. */
  sailLoadingKgM2: number | null;
  /** Target heliocentric radius (m); null without one. */
  targetHeliocentricRadiusM: number | null;
  /** First time (s from the first sample) the heliocentric radius reaches the target; null if not reached. */
  timeToTargetSeconds: number | null;
}

/**
 * Heliocentric radius (m) of row offset `o`: |r| for a Sun-centred run, otherwise the
 * `sunDistanceM` column.
 * @throws SrpError naming `samples.k.sunDistanceM` when an Earth-centred run did not record it (0)
 */
export function heliocentricRadius(history: SampleHistory, centralBody: 'earth' | 'sun', o: number): number {
  const { layout, samples } = history;
  if (centralBody === 'sun') {
    return Math.hypot(samples[o + layout.r] as number, samples[o + layout.r + 1] as number, samples[o + layout.r + 2] as number);
  }
  const d = samples[o + layout.sunDistanceM] as number;
  if (!(d > 0)) {
    const k = o / layout.stride;
    throw new SrpError(
      'invalid_input',
      `samples.${k}.sunDistanceM must be greater than 0 (m); got ${d}: an Earth-centred run records it only with an SRP force`,
      { field: `samples.${k}.sunDistanceM`, value: d, limit: '> 0' },
    );
  }
  return d;
}

/**
 * First time (s from the first sample) the heliocentric radius reaches `targetM`, moving from the
 * side it starts on (outward for a target beyond the start, inward for one inside), linearly
 * interpolated between the two samples that bracket it; 0 if the start is on the target; null
 * if it is not reached within the span.
 * @param targetM heliocentric radius (m), > 0
 */
export function timeToHeliocentricRadius(history: SampleHistory, centralBody: 'earth' | 'sun', targetM: number): number | null {
  requirePositive(targetM, 'targetHeliocentricRadiusM', 'm');
  const { layout, samples, sampleCount } = history;
  const t0 = samples[layout.t] as number;
  const r0 = heliocentricRadius(history, centralBody, 0);
  if (r0 === targetM) return 0;
  const outward = targetM > r0;
  let rPrev = r0;
  let tPrev = t0;
  for (let k = 1; k < sampleCount; k += 1) {
    const o = k * layout.stride;
    const r = heliocentricRadius(history, centralBody, o);
    const t = samples[o + layout.t] as number;
    if (outward ? r >= targetM : r <= targetM) {
      return tPrev + ((targetM - rPrev) / (r - rPrev)) * (t - tPrev) - t0;
    }
    rPrev = r;
    tPrev = t;
  }
  return null;
}

/**
 * Characteristic acceleration, lightness number, sail loading and time to target.
 * @param massKg vehicle mass (kg), for the sail loading
 * @throws SrpError naming `sail.characteristicAccelMps2`, `massKg`, `areaM2` or `targetHeliocentricRadiusM`
 */
export function sailBudget(history: SampleHistory, centralBody: 'earth' | 'sun', massKg: number, sail: SailContext): SailBudget {
  const ac = sail.characteristicAccelMps2;
  if (!(ac >= 0 && ac < Infinity)) {
    throw new SrpError('invalid_input', `sail.characteristicAccelMps2 must be a finite number (m/s^2) >= 0; got ${ac}`, {
      field: 'sail.characteristicAccelMps2',
      value: ac,
      limit: '>= 0',
    });
  }
  const target = sail.targetHeliocentricRadiusM;
  return {
    characteristicAccelMps2: ac,
    lightnessNumber: lightnessNumber(ac),
    sailLoadingKgM2: sail.sailAreaM2 === undefined ? null : sailLoading(massKg, sail.sailAreaM2),
    targetHeliocentricRadiusM: target ?? null,
    timeToTargetSeconds: target === undefined ? null : timeToHeliocentricRadius(history, centralBody, target),
  };
}
