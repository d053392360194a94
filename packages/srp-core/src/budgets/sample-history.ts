/**
 * Checks and time statistics over the packed sample history the budgets read (a
 * PropagationResult's `layout`, `samples`, `sampleCount`).
 */
import { SrpError } from '../errors';
import type { SampleHistory } from '../propagation/sample-layout';

export type { SampleHistory };

/** Mean, maximum and RMS of a non-negative quantity over time. */
export interface TimeStatistics {
  /** Time mean (1/T)∫x dt, trapezoid over the samples (unit of x). */
  mean: number;
  /** Largest sampled value (unit of x). */
  max: number;
  /** Root of the time mean of x², trapezoid (unit of x). */
  rms: number;
}

/**
 * Checks the buffer holds `sampleCount` rows of finite, non-decreasing times.
 * @throws SrpError naming `sampleCount` or `samples.k.t`
 */
export function checkHistory(history: SampleHistory): void {
  const { layout, samples, sampleCount } = history;
  if (!Number.isInteger(sampleCount) || sampleCount < 1 || sampleCount * layout.stride > samples.length) {
    throw new SrpError(
      'out_of_range',
      `sampleCount must be an integer from 1 to samples.length / stride (${Math.floor(samples.length / layout.stride)}); got ${sampleCount}`,
      { field: 'sampleCount', value: sampleCount, limit: `[1, ${Math.floor(samples.length / layout.stride)}]` },
    );
  }
  let previous = -Infinity;
  for (let k = 0; k < sampleCount; k += 1) {
    const t = samples[k * layout.stride + layout.t] as number;
    if (!Number.isFinite(t) || t < previous) {
      throw new SrpError('invalid_input', `samples.${k}.t must be finite and not before the previous sample; got ${t}`, {
        field: `samples.${k}.t`,
        value: t,
        limit: `>= ${previous}`,
      });
    }
    previous = t;
  }
}

/** Span covered by the history (s). */
export function historySpanSeconds(history: SampleHistory): number {
  const { layout, samples, sampleCount } = history;
  return (samples[(sampleCount - 1) * layout.stride + layout.t] as number) - (samples[layout.t] as number);
}

/**
 * Time statistics of x(k) = valueAt(offset of row k), trapezoid in time. With a single sample (or
 * a zero span) the mean and RMS are that of the samples, unweighted.
 */
export function timeStatistics(history: SampleHistory, valueAt: (rowOffset: number) => number): TimeStatistics {
  const { layout, samples, sampleCount } = history;
  const stride = layout.stride;
  let max = -Infinity;
  let integral = 0;
  let integralSq = 0;
  let sum = 0;
  let sumSq = 0;
  let xPrev = 0;
  let tPrev = 0;
  for (let k = 0; k < sampleCount; k += 1) {
    const o = k * stride;
    const x = valueAt(o);
    const t = samples[o + layout.t] as number;
    if (x > max) max = x;
    sum += x;
    sumSq += x * x;
    if (k > 0) {
      const dt = t - tPrev;
      integral += 0.5 * (x + xPrev) * dt;
      integralSq += 0.5 * (x * x + xPrev * xPrev) * dt;
    }
    xPrev = x;
    tPrev = t;
  }
  const span = historySpanSeconds(history);
  if (span > 0) return { mean: integral / span, max, rms: Math.sqrt(integralSq / span) };
  return { mean: sum / sampleCount, max, rms: Math.sqrt(sumSq / sampleCount) };
}

/** |(x, y, z)| of three consecutive columns starting at `column`, for `timeStatistics`. */
export function columnNorm(samples: Float64Array, column: number): (rowOffset: number) => number {
  return (o) => Math.hypot(samples[o + column] as number, samples[o + column + 1] as number, samples[o + column + 2] as number);
}
