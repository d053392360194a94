/**
 * Where SRP stands: statistics of |a_srp| and its ratio to every other force of the run.
 */
import type { SampleHistory, TimeStatistics } from './sample-history';
import { columnNorm, timeStatistics } from './sample-history';

/** One force of the run beside SRP. */
export interface PerturbationRow {
  /** Force name, as in the layout. */
  force: string;
  /** Time mean of the force's acceleration magnitude (m/s²). */
  meanAccel: number;
  /** Largest sampled acceleration magnitude (m/s²). */
  maxAccel: number;
  /** SRP mean / this force's mean (-); null when the force's mean is 0. */
  srpToMeanRatio: number | null;
  /** SRP max / this force's max (-); null when the force's max is 0. */
  srpToMaxRatio: number | null;
}

/**
 * Mean (time-weighted), maximum and RMS of |a_srp| (m/s²), from the inertial SRP columns.
 */
export function srpAccelerationStatistics(history: SampleHistory): TimeStatistics {
  return timeStatistics(history, columnNorm(history.samples, history.layout.srpAccelInertial));
}

/**
 * For every force column: mean and max acceleration magnitude (m/s²) and SRP's ratio to each.
 * @param srp SRP statistics from `srpAccelerationStatistics`
 */
export function perturbationTable(history: SampleHistory, srp: TimeStatistics): PerturbationRow[] {
  const { layout, samples } = history;
  return layout.forceNames.map((force, i) => {
    const column = layout.forceAccel + i;
    const s = timeStatistics(history, (o) => Math.abs(samples[o + column] as number));
    return {
      force,
      meanAccel: s.mean,
      maxAccel: s.max,
      srpToMeanRatio: s.mean > 0 ? srp.mean / s.mean : null,
      srpToMaxRatio: s.max > 0 ? srp.max / s.max : null,
    };
  });
}
