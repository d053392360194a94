/**
 * Disturbance torque from SRP and the angular momentum it leaves in the wheels: statistics of
 * |τ|, per-axis figures, and H(t) = ∫τ_body dt with simulated momentum dumps.
 */
import { SrpError } from '../errors';
import type { SampleHistory, TimeStatistics } from './sample-history';
import { columnNorm, historySpanSeconds, timeStatistics } from './sample-history';

const SECONDS_PER_DAY = 86_400;

/** Statistics of the SRP torque about the centre of mass, body axes. */
export interface TorqueStatistics {
  /** Of |τ| (N·m). */
  magnitude: TimeStatistics;
  /** Per body axis x, y, z: time mean (signed), largest |τ_axis| and RMS (N·m). */
  axes: [TimeStatistics, TimeStatistics, TimeStatistics];
}

/** When a dump is triggered: by |H| or by the largest single body-axis component of H. */
export type DumpCriterion = 'norm' | 'axis';

/** Wheel capacity and dump policy. */
export interface MomentumOptions {
  /** Momentum the wheels can store (N·m·s), > 0: of |H| ('norm') or of each body axis ('axis'). */
  wheelCapacityNms: number;
  /** Fraction of the capacity at which a dump is commanded, (0, 1]. */
  dumpThresholdFraction: number;
  /** Which quantity reaches the threshold: |H| ('norm', default) or any |H_axis| ('axis'). */
  dumpCriterion?: DumpCriterion;
}

/** Result of integrating the torque with dumps. */
export interface MomentumBudget {
  /** The criterion that was simulated. */
  dumpCriterion: DumpCriterion;
  /** threshold × capacity (N·m·s). */
  dumpLevelNms: number;
  /** Times of the dumps (s from epoch). */
  dumpTimesSeconds: number[];
  /** Dumps per day over the span (1/day). */
  dumpsPerDay: number;
  /** Mean interval between dumps, the start counting as one (the wheels start empty) (s); null without dumps. */
  meanTimeBetweenDumpsSeconds: number | null;
  /** Largest |H| reached (N·m·s). */
  peakMomentumNms: number;
  /** Largest |H_axis| reached per body axis (N·m·s). */
  peakAxisMomentumNms: [number, number, number];
  /** H at the end of the span, body axes (N·m·s). */
  finalMomentumBody: [number, number, number];
}

/** Statistics of |τ| and of each body-axis component (N·m), trapezoid in time. */
export function torqueStatistics(history: SampleHistory): TorqueStatistics {
  const { layout, samples } = history;
  const c = layout.srpTorqueBody;
  const axis = (j: number): TimeStatistics => {
    const signed = timeStatistics(history, (o) => samples[o + c + j] as number);
    const abs = timeStatistics(history, (o) => Math.abs(samples[o + c + j] as number));
    return { mean: signed.mean, max: abs.max, rms: abs.rms };
  };
  return { magnitude: timeStatistics(history, columnNorm(samples, c)), axes: [axis(0), axis(1), axis(2)] };
}

function requireFraction(value: number): void {
  if (!(value > 0 && value <= 1)) {
    throw new SrpError(
      Number.isFinite(value) ? 'out_of_range' : 'invalid_input',
      `dumpThresholdFraction must be a fraction of the wheel capacity in (0, 1]; got ${value}`,
      { field: 'dumpThresholdFraction', value, limit: '(0, 1]' },
    );
  }
}

/**
 * Smallest s in (0, remaining] at which H + τ̄ s reaches `level` by the criterion, or Infinity.
 * 'norm': the positive root of |H + τ̄ s|² = level²; 'axis': the first axis to reach ±level.
 */
export function timeToLevel(h: Float64Array, tau: Float64Array, level: number, criterion: DumpCriterion): number {
  if (criterion === 'axis') {
    // Already at the level (rounding at the end of the previous step): dump now.
    if (Math.max(Math.abs(h[0] as number), Math.abs(h[1] as number), Math.abs(h[2] as number)) >= level) return 0;
    let best = Infinity;
    for (let j = 0; j < 3; j += 1) {
      const rate = tau[j] as number;
      if (rate === 0) continue;
      const s = ((rate > 0 ? level : -level) - (h[j] as number)) / rate;
      if (s >= 0 && s < best) best = s;
    }
    return best;
  }
  const c = (h[0] as number) ** 2 + (h[1] as number) ** 2 + (h[2] as number) ** 2 - level * level;
  if (c >= 0) return 0;
  const a = (tau[0] as number) ** 2 + (tau[1] as number) ** 2 + (tau[2] as number) ** 2;
  if (a === 0) return Infinity;
  const b = (h[0] as number) * (tau[0] as number) + (h[1] as number) * (tau[1] as number) + (h[2] as number) * (tau[2] as number);
  // Roots of a s² + 2 b s + c = 0; c ≤ 0 inside the level, so the larger root is the exit.
  const disc = b * b - a * c;
  if (disc < 0) return Infinity;
  const q = -b - Math.sign(b || 1) * Math.sqrt(disc);
  const r1 = q / a;
  const r2 = q !== 0 ? c / q : r1;
  const s = Math.max(r1, r2);
  return s >= 0 ? s : Infinity;
}

/**
 * Accumulates H(t) = ∫τ_body dt (the wheels absorb the SRP torque) and dumps it to zero when the
 * criterion reaches threshold × capacity. Over each sample step the torque is taken at its
 * trapezoid mean, so H is linear inside the step and the dump instant is found exactly on that
 * line (several dumps may fall in one long step). Exact for a constant torque: dumps every
 * threshold·capacity/|τ| s ('norm'). The wheels start empty.
 * @throws SrpError naming `wheelCapacityNms` or `dumpThresholdFraction`
 */
export function momentumBudget(history: SampleHistory, options: MomentumOptions): MomentumBudget {
  const capacity = options.wheelCapacityNms;
  if (!(capacity > 0 && capacity < Infinity)) {
    throw new SrpError(
      Number.isFinite(capacity) ? 'out_of_range' : 'invalid_input',
      `wheelCapacityNms must be a finite number (N*m*s) greater than 0; got ${capacity}`,
      { field: 'wheelCapacityNms', value: capacity, limit: '> 0' },
    );
  }
  requireFraction(options.dumpThresholdFraction);
  const criterion = options.dumpCriterion ?? 'norm';
  const level = capacity * options.dumpThresholdFraction;
  const { layout, samples, sampleCount } = history;
  const c = layout.srpTorqueBody;
  const h = new Float64Array(3);
  const tau = new Float64Array(3);
  const peakAxis: [number, number, number] = [0, 0, 0];
  let peak = 0;
  const dumps: number[] = [];
  const t0 = samples[layout.t] as number;
  const track = (): void => {
    const n = Math.hypot(h[0] as number, h[1] as number, h[2] as number);
    if (n > peak) peak = n;
    for (let j = 0; j < 3; j += 1) peakAxis[j] = Math.max(peakAxis[j] as number, Math.abs(h[j] as number));
  };
  for (let k = 1; k < sampleCount; k += 1) {
    const o = k * layout.stride;
    const p = o - layout.stride;
    let t = samples[p + layout.t] as number;
    const tEnd = samples[o + layout.t] as number;
    for (let j = 0; j < 3; j += 1) tau[j] = 0.5 * ((samples[p + c + j] as number) + (samples[o + c + j] as number));
    for (;;) {
      const s = timeToLevel(h, tau, level, criterion);
      if (!(t + s <= tEnd)) break;
      for (let j = 0; j < 3; j += 1) h[j] = (h[j] as number) + (tau[j] as number) * s;
      track();
      t += s;
      dumps.push(t);
      h.fill(0);
      // A torque strong enough to refill the wheels within rounding would loop for ever.
      if (dumps.length > 1e7) {
        throw new SrpError('out_of_range', 'wheelCapacityNms is too small for this torque: more than 1e7 dumps', {
          field: 'wheelCapacityNms',
          value: capacity,
        });
      }
    }
    for (let j = 0; j < 3; j += 1) h[j] = (h[j] as number) + (tau[j] as number) * (tEnd - t);
    track();
  }
  const span = historySpanSeconds(history);
  const last = dumps[dumps.length - 1];
  return {
    dumpCriterion: criterion,
    dumpLevelNms: level,
    dumpTimesSeconds: dumps,
    dumpsPerDay: span > 0 ? (dumps.length * SECONDS_PER_DAY) / span : 0,
    meanTimeBetweenDumpsSeconds: last === undefined ? null : (last - t0) / dumps.length,
    peakMomentumNms: peak,
    peakAxisMomentumNms: peakAxis,
    finalMomentumBody: [h[0] as number, h[1] as number, h[2] as number],
  };
}
